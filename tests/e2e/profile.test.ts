import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ARTIFACTS, foreignRequests, startE2e, type E2eContext } from './support/browser';

let e: E2eContext;
beforeAll(async () => {
  e = await startE2e();
});
afterAll(() => e?.close());

/** The whole page: the shell scrolls inside its layout, so the viewport is stretched to the content for the shot. */
async function screenshot(name: string): Promise<void> {
  const { page } = e;
  const height = await page.evaluate(() =>
    Math.max(...Array.from(document.querySelectorAll('main.page')).map((m) => m.scrollHeight + 140), 800),
  );
  await page.setViewportSize({ width: 1366, height: Math.min(height, 4000) });
  await page.waitForTimeout(250);
  await page.screenshot({ path: join(ARTIFACTS, name) });
  await page.setViewportSize({ width: 1366, height: 900 });
}

/** A tab of the interpretation card, by its name. */
const openTab = (name: string) => e.page.locator(`[data-testid="interpretation-card"] .n-tabs-tab[data-name="${name}"]`).click();

interface WellRow {
  id: string;
  name: string;
  logCount: number;
  waterDepthM: number | null;
}

describe('the well pressure-profile workspace', () => {
  it('fits a trend, switches to EMW, accepts the suggested top, saves, and finds it again after a reload', async () => {
    const { page, baseUrl } = e;
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.goto(`${baseUrl}/sign-in`);
    await page.getByTestId('signin-email').locator('input').fill('geoscientist@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('porelith-demo');
    await page.getByTestId('signin-submit').click();
    await expect.poll(() => page.getByTestId('team-name').textContent(), { timeout: 15_000 }).toContain('Synthetic demo');

    // A demo well with logs and many pressures, found through the API the page itself uses.
    const { teamId, wells } = await page.evaluate(async () => {
      const me = await (await fetch('/api/auth/me')).json();
      const team = me.memberships.find((m: { teamName: string }) => m.teamName === 'Synthetic demo');
      const list = await (await fetch(`/api/teams/${team.teamId}/wells?sort=pressureCount&order=desc&limit=20`)).json();
      return { teamId: team.teamId as string, wells: list.items as WellRow[] };
    });
    const logged = wells.filter((w) => w.logCount >= 4);
    expect(logged.length).toBeGreaterThan(1);
    const [well, other] = logged;
    const detail = await page.evaluate(async ([t, w]) => (await fetch(`/api/teams/${t}/wells/${w}`)).json(), [teamId, well.id]);
    const mudlineM = (detail.airGapM ?? detail.datumElevationM) + (detail.waterDepthM ?? 0);
    // A normally pressured interval: from 250 m below the mudline (logs start 200 m below it) to above the
    // shallowest hidden top of the demo basin (1,900 m TVDSS); a random shift makes each run a real change.
    const fromM = Math.round(mudlineM + 250 + Math.random() * 40);
    const toM = Math.min(fromM + 900, Math.round(1850 + detail.datumElevationM));

    await page.goto(`${baseUrl}/wells/${well.id}/profile`);
    await page.getByTestId('profile-figure').waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('value-axis-label').textContent()).toMatch(/^Pressure \((MPa|bar|psi|kPa)\)$/);
    expect(await page.getByTestId('depth-axis-label').textContent()).toMatch(/^TVD below rotary table \((m|ft)\)$/);
    expect(await page.getByTestId('figure-caution').textContent()).toContain('verify with the responsible licensed engineer');
    expect(await page.locator('[data-testid="observations"] path').count()).toBeGreaterThan(5);

    // Dragging on the sonic track marks an interval and fits it at once.
    const track = (await page.locator('[data-track="sonic"] rect').first().boundingBox())!;
    await page.mouse.move(track.x + track.width / 2, track.y + track.height * 0.22);
    await page.mouse.down();
    await page.mouse.move(track.x + track.width / 2, track.y + track.height * 0.3, { steps: 5 });
    await page.mouse.move(track.x + track.width / 2, track.y + track.height * 0.36, { steps: 5 });
    await page.mouse.up();
    await expect.poll(() => page.getByTestId('trend-r2').textContent(), { timeout: 10_000 }).toMatch(/^0\.\d{3}$|^1\.000$/);
    expect(await page.getByTestId('trend-range').count()).toBe(1);

    // Then fit a normal trend over a typed interval, shale samples only, matrix slowness held.
    await page.getByTestId('trend-from').locator('input').fill(String(fromM));
    await page.getByTestId('trend-from').locator('input').press('Enter');
    await page.getByTestId('trend-to').locator('input').fill(String(toM));
    await page.getByTestId('trend-to').locator('input').press('Enter');
    // Shale samples only (gamma-ray cut-off), so sands do not fake low pressures.
    const filter = page.getByTestId('trend-shale-filter');
    if (!(await filter.getAttribute('class'))?.includes('n-switch--active')) await filter.click();
    await page.getByTestId('trend-gamma-cutoff').waitFor();
    // The cut-off the panel holds (the opened version's, or the default for a new trend) is what gets saved.
    const cutoff = Number(await page.getByTestId('trend-gamma-cutoff').locator('input').inputValue());
    expect(cutoff).toBeGreaterThan(0);
    const hold = page.getByTestId('trend-fix-matrix');
    if (!(await hold.getAttribute('class'))?.includes('n-switch--active')) await hold.click();
    await page.getByTestId('trend-fit').click();
    await expect.poll(() => page.getByTestId('trend-r2').textContent(), { timeout: 10_000 }).toMatch(/^0\.\d{3}$|^1\.000$/);
    expect(await page.getByTestId('trend-line').count()).toBe(1);
    expect(await page.getByTestId('curve-pore').count()).toBe(1);
    expect(await page.getByTestId('pore-misfit').textContent()).toMatch(/RMS .* over \d+ points/);
    await screenshot('profile-pressure.png');
    // Hover shows the values in the chosen units.
    const box = (await page.getByTestId('pressure-plot').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height * 0.6);
    await page.mouse.move(box.x + box.width / 2 + 3, box.y + box.height * 0.6 + 3);
    await expect.poll(() => page.getByTestId('profile-hover').textContent(), { timeout: 5000 }).toMatch(/Overburden.*(MPa|bar|psi|kPa)/);
    // Wheel zooms in depth; "Full depth" undoes it.
    expect(await page.getByTestId('reset-zoom').isDisabled()).toBe(true);
    await page.mouse.wheel(0, -400);
    await expect.poll(() => page.getByTestId('reset-zoom').isDisabled()).toBe(false);
    await page.getByTestId('reset-zoom').click();
    await page.mouse.move(5, 5);

    // The EMW view.
    await page.getByTestId('view-emw').click();
    await expect.poll(() => page.getByTestId('value-axis-label').textContent()).toMatch(/from rotary table \((SG|ppg|kPa\/m|psi\/ft)\)$/);
    expect(await page.getByTestId('profile-figure').locator('svg').getAttribute('data-view')).toBe('emw');

    // Accept the suggested top.
    await openTab('top');
    await page.getByTestId('top-suggested').waitFor();
    await page.getByTestId('top-accept').click();
    await page.getByTestId('top-marker').waitFor();
    const topLabel = await page.getByTestId('top-marker').textContent();
    expect(topLabel).toMatch(/^TOP [\d,]+ (m|ft)$/);
    await screenshot('profile-emw.png');

    // Save as a new accepted version.
    await openTab('versions');
    const before = await page.getByTestId('version-row').count();
    await page.getByTestId('save-note').locator('input').fill('e2e: trend and top');
    await page.getByTestId('save-interpretation').click();
    await page.getByTestId('save-done').waitFor({ timeout: 15_000 });
    await expect.poll(() => page.getByTestId('version-row').count()).toBe(before + 1);
    const saved = await page.getByTestId('version-row').first().getAttribute('data-version');

    // Reload: the page opens the newest version, with its top drawn.
    await page.reload();
    await page.getByTestId('profile-figure').waitFor({ timeout: 30_000 });
    await page.getByTestId('top-marker').waitFor({ timeout: 10_000 });
    expect(await page.getByTestId('top-marker').textContent()).toBe(topLabel);
    expect(await page.getByTestId('profile-figure').locator('svg > text').first().textContent()).toContain(`interpretation v${saved}`);
    expect(await page.getByTestId('profile-figure').locator('svg').getAttribute('data-view')).toBe('emw'); // remembered
    await openTab('versions');
    expect(await page.getByTestId('version-row').first().textContent()).toContain('Tomas Brennick');
    const server = await page.evaluate(
      async ([t, w]) => (await fetch(`/api/teams/${t}/wells/${w}/interpretations/current`)).json(),
      [teamId, well.id],
    );
    expect(server.version).toBe(Number(saved));
    expect(server.top.method).toBe('auto');
    expect(server.trend.fromM).toBe(fromM);
    expect(server.trend.params.matrix).toBe(60);
    expect(server.trend.gammaCutoffApi).toBe(cutoff);

    // A stale edit gets the reload prompt: save from a base that someone else has moved past.
    await page.evaluate(
      async ([t, w, v]) => {
        const cur = await (await fetch(`/api/teams/${t}/wells/${w}/interpretations/current`)).json();
        await fetch(`/api/teams/${t}/wells/${w}/interpretations`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify({
            normalDensityKgM3: cur.normalDensityKgM3,
            trend: cur.trend,
            pore: cur.pore,
            fracture: cur.fracture,
            top: cur.top,
            baseVersion: v,
            status: 'draft',
            note: 'someone else',
          }),
        });
      },
      [teamId, well.id, Number(saved)] as const,
    );
    await openTab('pore');
    await page.getByTestId('pore-exponent').locator('input').fill('2.8');
    await page.getByTestId('pore-exponent').locator('input').press('Enter');
    await openTab('versions');
    await page.getByTestId('save-interpretation').click();
    await page.getByTestId('stale-prompt').waitFor({ timeout: 10_000 });
    await page.getByTestId('stale-reload').click();
    await expect.poll(() => page.getByTestId('stale-prompt').count()).toBe(0);

    // The compaction screen for the well.
    const card = page.getByTestId('compaction-card');
    await card.scrollIntoViewIfNeeded();
    expect(await page.getByTestId('cs-reading').textContent()).toMatch(/drains in ~.* buried over ~/);
    await card.screenshot({ path: join(ARTIFACTS, 'compaction.png') });

    // Two wells compared.
    await page.goto(`${baseUrl}/compare?wells=${well.id},${other.id}`);
    await page.getByTestId('compare-figure').waitFor({ timeout: 30_000 });
    await expect.poll(() => page.getByTestId('compare-row').count(), { timeout: 30_000 }).toBe(2);
    expect(
      await page.locator(`[data-testid="compare-row"][data-well="${well.name}"] [data-testid="compare-top-depth"]`).textContent(),
    ).toMatch(/^[\d,]+/);
    expect(await page.getByTestId('compare-top').count()).toBeGreaterThanOrEqual(1);
    await screenshot('compare.png');

    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });
});
