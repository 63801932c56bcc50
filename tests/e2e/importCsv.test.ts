import { randomBytes } from 'node:crypto';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ARTIFACTS, foreignRequests, startE2e, type E2eContext } from './support/browser';

let e: E2eContext;
beforeAll(async () => {
  e = await startE2e();
});
afterAll(() => e?.close());

/**
 * A screenshot of the whole page. The shell scrolls inside its layout, not the document, so Playwright's
 * fullPage sees one screen; the viewport is stretched to the content for the shot instead.
 */
async function screenshot(name: string): Promise<void> {
  const { page } = e;
  const height = await page.evaluate(() =>
    Math.max(...Array.from(document.querySelectorAll('main.page'), (m) => m.scrollHeight + 140), 800),
  );
  await page.setViewportSize({ width: 1366, height: Math.min(height, 4000) });
  await page.waitForTimeout(150);
  await page.screenshot({ path: join(ARTIFACTS, name) });
  await page.setViewportSize({ width: 1366, height: 800 });
}

// Invented wells with a per-run prefix, so reruns on the same database never meet an earlier import.
const prefix = `E2E-${randomBytes(3).toString('hex').toUpperCase()}`;
const csv = [
  'Well Name,UWI,Operator,Longitude,Latitude,Water depth (ft),TD MD (m),Spud date,Status',
  `${prefix}-1,${prefix}-U1,Test Operator (synthetic),-101.02,-32.51,300,3200,2019-04-23,drilled`,
  `${prefix}-2,${prefix}-U2,Test Operator (synthetic),abc,-32.55,450,3350,2020-02-11,drilled`,
  `${prefix}-3,${prefix}-U3,Test Operator (synthetic),-101.10,-32.58,600,2900,2021-07-30,abandoned`,
].join('\n');

describe('importing well headers from a CSV file through the page', () => {
  it('previews with the mapping filled in, commits the valid rows, and the wells appear in the table and on their page', async () => {
    const { page, baseUrl } = e;
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('signin-email').locator('input').fill('geoscientist@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('porelith-demo');
    await page.getByTestId('signin-submit').click();
    await expect.poll(() => page.getByTestId('team-name').textContent(), { timeout: 15_000 }).toContain('Synthetic demo');

    await page.getByTestId('nav-import').click();
    await page.waitForURL(/\/import$/);
    await page.getByTestId('import-kind-wells').click();
    await page.locator('input[type="file"]').setInputFiles({ name: `${prefix}.csv`, mimeType: 'text/csv', buffer: Buffer.from(csv) });

    // The preview: columns mapped from the headers, the unit read from "(ft)", the bad line marked in place.
    const preview = page.getByTestId('import-preview');
    await preview.waitFor({ timeout: 20_000 });
    const fieldOf = (column: string) => page.locator(`[data-testid="mapping-row"][data-column="${column}"]`).getAttribute('data-field');
    expect(await fieldOf('Well Name')).toBe('name');
    expect(await fieldOf('Longitude')).toBe('x');
    expect(await fieldOf('Water depth (ft)')).toBe('waterDepth');
    expect(
      await page.locator('[data-testid="mapping-row"][data-column="Water depth (ft)"] [data-testid="mapping-unit"]').textContent(),
    ).toContain('ft');
    expect(await page.getByTestId('csv-delimiter').textContent()).toContain('comma');
    expect(await page.getByTestId('count-valid').textContent()).toBe('2');
    expect(await page.getByTestId('count-invalid').textContent()).toBe('1');
    const badRow = page.locator('[data-testid="preview-row"][data-line="3"]');
    expect(await badRow.getAttribute('data-valid')).toBe('false');
    expect(await badRow.textContent()).toContain("Longitude: 'abc' is not a number");
    expect(await page.getByTestId('import-problem').first().textContent()).toBe("line 3, column Longitude: 'abc' is not a number");
    // 300 ft of water is stored as 91.44 m (1 ft = 0.3048 m), shown here in metres.
    expect(await page.locator('[data-testid="preview-row"][data-line="2"]').textContent()).toContain('91.44');
    // Problems block the commit until the person chooses to skip the bad rows.
    expect(await page.getByTestId('import-commit').isDisabled()).toBe(true);
    await screenshot('import-preview.png');

    await page.getByTestId('import-skip-invalid').click();
    await expect.poll(() => page.getByTestId('import-commit').isEnabled()).toBe(true);
    await page.getByTestId('import-commit').click();
    await page.getByTestId('import-done').waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('import-outcome').textContent()).toBe('2 wells created, 0 updated · 1 line skipped.');
    await expect.poll(() => page.getByTestId('import-well-link').count()).toBe(2);
    // The upload history lists the file with its outcome.
    await expect.poll(() => page.locator(`[data-testid="upload-row"][data-file="${prefix}.csv"]`).count(), { timeout: 10_000 }).toBe(1);
    await screenshot('import-done.png');

    // Offset wells: search the invented prefix, find exactly the two imported wells.
    await page.getByTestId('nav-wells').click();
    await page.waitForURL(/\/wells/);
    await page.getByTestId('wells-search').locator('input').fill(prefix);
    await expect.poll(() => page.getByTestId('well-row').count(), { timeout: 10_000 }).toBe(2);
    expect(await page.getByTestId('well-row').evaluateAll((rows) => rows.map((r) => r.getAttribute('data-name')))).toEqual([
      `${prefix}-1`,
      `${prefix}-3`,
    ]);
    expect(page.url()).toContain(`q=${prefix}`);
    expect(await page.getByTestId('demo-data-tag').count()).toBe(1);
    await screenshot('wells-table.png');

    // The well's page: header facts in the chosen depth unit, then in feet as it was entered.
    await page.locator(`[data-testid="well-row"][data-name="${prefix}-1"] [data-testid="well-link"]`).click();
    await page.getByTestId('well-facts').waitFor();
    expect(await page.locator('h1').textContent()).toBe(`${prefix}-1`);
    expect(await page.getByTestId('well-water-depth').textContent()).toBe('91.4 m');
    await page.getByTestId('depth-unit').getByText('ft', { exact: true }).click();
    await expect.poll(() => page.getByTestId('well-water-depth').textContent()).toBe('300 ft');
    expect(await page.getByTestId('well-td').textContent()).toContain('10,498.7 ft MD'); // 3200 m / 0.3048
    expect(await page.getByTestId('pressure-caution').textContent()).toMatch(/verify with the responsible licensed engineer/);
    expect(await page.getByTestId('well-edit-open').count()).toBe(1); // geoscientists may edit
    await page.getByTestId('depth-unit').getByText('m', { exact: true }).click();
    await screenshot('well-detail.png');

    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });
});
