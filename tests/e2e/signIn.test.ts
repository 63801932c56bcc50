import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ARTIFACTS, foreignRequests, startE2e, type E2eContext } from './support/browser';

let e: E2eContext;
beforeAll(async () => {
  e = await startE2e();
});
afterAll(() => e?.close());

describe('sign-in through the page', () => {
  it('signs in as the planner, shows the shell with the team, signs out; nothing leaves the origin', async () => {
    const { page, baseUrl } = e;
    await page.goto(`${baseUrl}/`);
    await page.waitForURL(/\/sign-in/);
    await page.getByTestId('signin-email').locator('input').fill('planner@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('porelith-demo');
    await page.getByTestId('signin-submit').click();

    await expect.poll(() => page.getByTestId('team-name').textContent(), { timeout: 15_000 }).toContain('Synthetic demo');
    // The planner sees planning areas and not team administration.
    expect(await page.getByTestId('nav-prospects').count()).toBe(1);
    expect(await page.getByTestId('nav-team').count()).toBe(0);
    // The caution about predictions is on every signed-in page.
    expect(await page.textContent('body')).toMatch(/verify with the responsible licensed engineer/i);
    await page.screenshot({ path: join(ARTIFACTS, 'shell-planner.png') });

    await page.getByTestId('sign-out').click();
    await page.waitForURL(/\/sign-in/);
    const me = await page.evaluate(() => fetch('/api/auth/me').then((r) => r.status));
    expect(me).toBe(401);

    expect(e.requests.length).toBeGreaterThan(3);
    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });

  it('shows a readable message for a wrong password', async () => {
    const { page, baseUrl } = e;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('signin-email').locator('input').fill('planner@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('wrong-password');
    await page.getByTestId('signin-password').locator('input').press('Enter');
    await expect.poll(() => page.textContent('body'), { timeout: 10_000 }).toContain('The e-mail or password is not right.');
  });
});
