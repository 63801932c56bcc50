import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ARTIFACTS, foreignRequests, startE2e, type E2eContext } from './support/browser';

let e: E2eContext;
beforeAll(async () => {
  e = await startE2e();
});
afterAll(() => e?.close());

const DEMO_PROSPECT = 'Ostrel Ridge Prospect';

describe('top-of-overpressure surface screen', () => {
  it('runs a kriging surface over the demo prospect and reads it on the map and the charts; nothing leaves the origin', async () => {
    const { page, baseUrl } = e;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('signin-email').locator('input').fill('geoscientist@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('porelith-demo');
    await page.getByTestId('signin-submit').click();
    await expect.poll(() => page.getByTestId('team-name').textContent(), { timeout: 15_000 }).toContain('Synthetic demo');

    const prospectId = await page.evaluate(async (name) => {
      const me = (await (await fetch('/api/auth/me')).json()) as { memberships: { teamId: string; teamName: string }[] };
      const team = me.memberships.find((m) => m.teamName === 'Synthetic demo')!;
      const prospects = (await (await fetch(`/api/teams/${team.teamId}/prospects`)).json()) as { id: string; name: string }[];
      return prospects.find((p) => p.name === name)?.id ?? null;
    }, DEMO_PROSPECT);
    expect(prospectId).not.toBeNull();

    await page.goto(`${baseUrl}/prospects/${prospectId}/surfaces`);
    await page.getByTestId('surface-run-form').waitFor({ timeout: 15_000 });
    await expect.poll(() => page.locator('h1').textContent(), { timeout: 10_000 }).toContain(DEMO_PROSPECT);
    const view = page.getByTestId('surface-view');
    const mapEl = page.getByTestId('surface-map');
    await expect.poll(() => view.getAttribute('data-load-state'), { timeout: 15_000 }).toBe('done');

    await page.getByTestId('surface-buffer').locator('input').fill('30');
    await page.getByTestId('surface-buffer').locator('input').press('Tab');
    await page.getByTestId('surface-run').click();
    // The run reports progress, then the new surface lands on the map and in the address.
    await page.getByTestId('surface-progress').waitFor({ timeout: 10_000 });
    await expect.poll(() => view.getAttribute('data-run-state'), { timeout: 90_000 }).toBe('done');
    await page.waitForURL(/\/surfaces\/[0-9a-f-]{36}$/, { timeout: 10_000 });
    const surfaceId = page.url().split('/').pop();
    expect(await mapEl.getAttribute('data-surface-id')).toBe(surfaceId);
    await expect.poll(() => mapEl.getAttribute('data-map-ready'), { timeout: 30_000 }).toBe('true');
    expect(await page.getByTestId('surface-progress').count()).toBe(0);
    expect(await page.getByTestId('surface-run-error').count()).toBe(0);
    expect(Number(await mapEl.getAttribute('data-contour-count'))).toBeGreaterThan(2);
    expect(page.url()).toMatch(new RegExp(`/prospects/${prospectId}/surfaces/[0-9a-f-]{36}$`));

    const legend = page.getByTestId('surface-legend');
    expect(await legend.isVisible()).toBe(true);
    expect(await legend.textContent()).toMatch(/Top of overpressure.*estimate/i);
    // Demo picks lie between about 2,100 and 3,800 m TVDSS (server/db/seed, Ardvane Basin).
    const min = Number((await page.getByTestId('surface-legend-min').textContent())!.replace(/[^\d.]/g, ''));
    const max = Number((await page.getByTestId('surface-legend-max').textContent())!.replace(/[^\d.]/g, ''));
    expect(min).toBeGreaterThan(1500);
    expect(max).toBeLessThan(4500);
    expect(max).toBeGreaterThan(min);

    // Click inside the grid: the camera frames the grid left of the legend, so its middle is left of the map's middle.
    const box = (await mapEl.boundingBox())!;
    await mapEl.click({ position: { x: (box.width - 300) / 2 + 15, y: box.height / 2 } });
    const readout = page.getByTestId('surface-click-value');
    await readout.waitFor({ timeout: 10_000 });
    expect(await readout.textContent()).toMatch(/\d{1,2},?\d{3} m ± \d+ m/);
    await expect.poll(() => mapEl.getAttribute('data-map-ready'), { timeout: 15_000 }).toBe('true');
    await page.getByTestId('surface-map-box').screenshot({ path: join(ARTIFACTS, 'surface-map.png') });

    // A tall window keeps the app's sticky header off the charts in the screenshot.
    await page.setViewportSize({ width: 1366, height: 1500 });
    const charts = page.getByTestId('surface-charts');
    await charts.scrollIntoViewIfNeeded();
    expect(await page.getByTestId('variogram-point').count()).toBeGreaterThan(3);
    expect(await page.getByTestId('variogram-model-curve').getAttribute('d')).toMatch(/^M/);
    expect(await page.getByTestId('cv-point').count()).toBeGreaterThan(5);
    expect(await page.getByTestId('cv-rmse').textContent()).toMatch(/RMSE \d+(\.\d)? m/);
    expect(await page.getByTestId('surface-planned-row').count()).toBeGreaterThan(0);
    expect(await page.getByTestId('surface-caution').textContent()).toContain('Predictions guide, they do not decide');
    await charts.screenshot({ path: join(ARTIFACTS, 'surface-charts.png') });

    // The standard deviation replaces the depth colours on demand.
    await page.getByTestId('surface-layer').getByText('Standard deviation').click();
    await expect.poll(() => mapEl.getAttribute('data-layer')).toBe('stdDev');
    await expect.poll(() => mapEl.getAttribute('data-map-ready'), { timeout: 15_000 }).toBe('true');
    expect(await legend.textContent()).toContain('Standard deviation');

    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });
});
