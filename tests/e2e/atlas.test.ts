import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { ARTIFACTS, foreignRequests, startE2e, type E2eContext } from './support/browser';

let e: E2eContext;
let plannedWellId: string | null = null;
let referenceLayerId: string | null = null;

beforeAll(async () => {
  e = await startE2e();
});
afterAll(async () => {
  // The planned well this test placed goes again, so the demo team stays as seeded.
  if (plannedWellId && e) {
    const teamId = e.ctx.demoTeamId;
    await e.page
      .evaluate(({ t, id }) => fetch(`/api/teams/${t}/planned-wells/${id}`, { method: 'DELETE' }).then((r) => r.status), {
        t: teamId,
        id: plannedWellId,
      })
      .catch(() => null);
  }
  // Likewise a reference layer left behind by a failed run of the upload test.
  if (referenceLayerId && e) {
    await e.page
      .evaluate(({ t, id }) => fetch(`/api/teams/${t}/layers/${id}`, { method: 'DELETE' }).then((r) => r.status), {
        t: e.ctx.demoTeamId,
        id: referenceLayerId,
      })
      .catch(() => null);
  }
  await e?.close();
});

const map = (page: Page) => page.getByTestId('atlas-map');
const attr = async (page: Page, name: string) => (await map(page).getAttribute(name)) ?? '';

/** Waits until the map has its team layers, has stopped moving and has drawn its tiles. */
async function settled(page: Page, timeout = 60_000): Promise<void> {
  await expect.poll(() => attr(page, 'data-map-ready'), { timeout }).toBe('true');
  await expect.poll(() => attr(page, 'data-idle'), { timeout }).toBe('true');
}

async function centreOfMap(page: Page): Promise<{ x: number; y: number }> {
  const box = await map(page).boundingBox();
  if (!box) throw new Error('the map has no box');
  return { x: box.x + box.width / 2, y: box.y + box.height / 2 };
}

describe('the Atlas through the page', () => {
  it('shows the team wells, opens a well, places a planned well and saves two offsets that survive a reload', async () => {
    const { page, baseUrl } = e;
    const teamId = e.ctx.demoTeamId;
    await page.goto(`${baseUrl}/`);
    await page.waitForURL(/\/sign-in/);
    await page.getByTestId('signin-email').locator('input').fill('planner@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('porelith-demo');
    await page.getByTestId('signin-submit').click();
    await page.waitForURL(/\/map/);

    // The map frames the team's wells: every well is drawn, alone or inside a cluster count.
    await settled(page);
    const total = await page.evaluate(
      (t) =>
        fetch(`/api/teams/${t}/wells?limit=1`)
          .then((r) => r.json())
          .then((b) => b.total as number),
      teamId,
    );
    expect(total).toBeGreaterThan(10);
    await expect.poll(async () => Number(await attr(page, 'data-well-count')), { timeout: 20_000 }).toBe(total);
    expect(await page.getByTestId('demo-data-label').textContent()).toContain('Synthetic demo data');
    expect(await page.getByTestId('map-coordinates').count()).toBe(1);
    expect(await page.locator('.maplibregl-ctrl-scale').textContent()).toMatch(/\d+\s*(km|m)/);
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-wells.png') });
    // The planner may switch reference layers but not add them (shared/auth/permissions.ts).
    await page.getByTestId('reference-layers').waitFor();
    expect(await page.getByTestId('reference-add').count()).toBe(0);

    // Search a well by name: the map flies to it and its card opens.
    const first = await page.evaluate(
      (t) =>
        fetch(`/api/teams/${t}/wells?limit=1&sort=name`)
          .then((r) => r.json())
          .then((b) => b.items[0] as { id: string; name: string }),
      teamId,
    );
    await page.getByTestId('map-search-input').fill(first.name);
    const option = page.locator('.n-base-select-option', { hasText: first.name }).first();
    await option.waitFor({ timeout: 10_000 });
    await option.click();
    await expect.poll(() => page.getByTestId('well-card-name').textContent(), { timeout: 10_000 }).toBe(first.name);
    expect(await page.getByTestId('well-card-open').getAttribute('href')).toBe(`/wells/${first.id}`);
    expect(await page.getByTestId('well-card-profile').getAttribute('href')).toBe(`/wells/${first.id}/profile`);

    // Close the card and click the well itself, now at the centre of the map.
    await page.getByTestId('well-card-close').click();
    await expect.poll(() => page.getByTestId('well-card').count()).toBe(0);
    await expect.poll(async () => Number(await attr(page, 'data-zoom')), { timeout: 20_000 }).toBeGreaterThanOrEqual(12);
    await settled(page);
    const centre = await centreOfMap(page);
    await page.mouse.click(centre.x, centre.y);
    await expect.poll(() => page.getByTestId('well-card-name').textContent(), { timeout: 10_000 }).toBe(first.name);

    // Place a planned well a little east of that well.
    await page.getByTestId('tool-place-planned').click();
    await page.mouse.click(centre.x + 90, centre.y + 40);
    await page.getByTestId('planned-well-form').waitFor();
    expect(await page.getByTestId('planned-well-location').textContent()).toMatch(/-?\d+\.\d{5}, -?\d+\.\d{5}/);
    const name = `Atlas e2e-${Date.now().toString(36)}`;
    await page.getByTestId('planned-well-name').locator('input').fill(name);
    await page.getByTestId('planned-well-td').locator('input').fill('3200');
    await page.getByTestId('planned-well-save').click();
    await expect.poll(() => page.getByTestId('offset-panel-title').textContent(), { timeout: 15_000 }).toBe(name);
    plannedWellId = await page.getByTestId('offset-panel').getAttribute('data-planned-well-id');
    expect(plannedWellId).toMatch(/^[0-9a-f-]{36}$/);
    expect(page.url()).toContain(`plannedWell=${plannedWellId}`);

    // Search offsets within 30 km, tick the two best, give the first a reason, save.
    await page.getByTestId('offset-radius').locator('input').fill('30');
    await page.getByTestId('offset-search').click();
    await expect.poll(() => page.getByTestId('offset-row').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
    const rows = page.getByTestId('offset-row');
    const picked = [await rows.nth(0).getAttribute('data-well-id'), await rows.nth(1).getAttribute('data-well-id')];
    await rows.nth(0).getByTestId('offset-pick').click();
    await rows.nth(1).getByTestId('offset-pick').click();
    // A ticked well's reason sits on its own line under its row.
    await page.locator(`[data-testid="offset-reason"][data-well-id="${picked[0]}"]`).locator('input').fill('nearest, same water depth');
    expect(await page.getByTestId('offset-unsaved').count()).toBe(1);
    await page.getByTestId('offset-save').click();
    await expect.poll(() => page.getByTestId('offset-set-entry').count(), { timeout: 10_000 }).toBe(2);
    await expect.poll(() => page.getByTestId('offset-unsaved').count()).toBe(0);
    expect(await page.getByTestId('offset-set').textContent()).toContain('Added by Priya Okonjo (demo planner)');
    await settled(page);
    await page.getByTestId('atlas-side-panel').evaluate((el) => el.scrollTo(0, 0));
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-offsets.png') });

    // A reload opens the same planned well from the URL, with the saved set.
    await page.reload();
    await settled(page);
    await expect.poll(() => page.getByTestId('offset-panel-title').textContent(), { timeout: 15_000 }).toBe(name);
    await expect.poll(() => page.getByTestId('offset-set-entry').count(), { timeout: 15_000 }).toBe(2);
    const savedIds = await page.getByTestId('offset-set-entry').evaluateAll((els) => els.map((el) => el.getAttribute('data-well-id')));
    expect(new Set(savedIds)).toEqual(new Set(picked));
    expect(await page.getByTestId('offset-set').textContent()).toContain('nearest, same water depth');

    // The dark theme swaps the basemap and the team colours in place; the map keeps its layers and data.
    const countBefore = Number(await attr(page, 'data-well-count'));
    await page.getByTestId('theme-toggle').click();
    await expect.poll(() => page.evaluate(() => document.documentElement.dataset.theme)).toBe('dark');
    await settled(page);
    await expect.poll(async () => Number(await attr(page, 'data-well-count')), { timeout: 20_000 }).toBe(countBefore);
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-offsets-dark.png') });

    expect(e.requests.some((u) => u.includes(`/api/teams/${teamId}/tiles/wells/`))).toBe(true);
    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });

  it('draws a prospect with the polygon tool, lists it on the prospects page, opens it on the map and deletes it', async () => {
    const { page, baseUrl } = e;
    await page.goto(`${baseUrl}/map`);
    await settled(page);
    await page.getByTestId('tool-draw-prospect').click();
    await page.getByTestId('prospect-form').waitFor();
    const c = await centreOfMap(page);
    const corners = [
      [c.x - 60, c.y - 50],
      [c.x + 70, c.y - 40],
      [c.x + 60, c.y + 60],
      [c.x - 50, c.y + 50],
    ];
    for (const [x, y] of corners) {
      await page.mouse.click(x, y);
      await page.waitForTimeout(150);
    }
    // Clicking the first corner closes the outline; the form then shows its area.
    await page.mouse.click(corners[0][0], corners[0][1]);
    await expect.poll(() => page.getByTestId('prospect-save').isDisabled(), { timeout: 10_000 }).toBe(false);
    const areaText = (await page.getByTestId('prospect-area').textContent()) ?? '';
    expect(Number(/([\d.]+)\s*km²/.exec(areaText)?.[1])).toBeGreaterThan(0);
    const name = `Atlas e2e prospect ${Date.now().toString(36)}`;
    await page.getByTestId('prospect-name').locator('input').fill(name);
    await page.getByTestId('prospect-save').click();
    await page.getByTestId('prospect-card').waitFor({ timeout: 10_000 });
    expect(await page.getByTestId('prospect-card').textContent()).toContain(name);
    const prospectId = new URL(page.url()).searchParams.get('prospect') ?? '';
    expect(prospectId).toMatch(/^[0-9a-f-]{36}$/);
    // The saved outline comes back in the refreshed team tiles, not only in the drawing tool.
    await expect.poll(async () => (await attr(page, 'data-prospect-ids')).split(','), { timeout: 20_000 }).toContain(prospectId);
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-prospect.png') });

    // The prospects page lists it, and its link opens it on the map.
    await page.getByTestId('nav-prospects').click();
    const link = page.getByTestId('prospect-link').filter({ hasText: name });
    await link.waitFor({ timeout: 10_000 });
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-prospects-list.png') });
    await link.click();
    await page.waitForURL(/\/map\?prospect=/);
    await page.getByTestId('prospect-card').waitFor({ timeout: 15_000 });
    await settled(page);
    expect((await attr(page, 'data-prospect-ids')).split(',')).toContain(prospectId);

    await page.getByTestId('prospect-delete').click();
    const confirm = page.locator('.n-dialog').getByRole('button', { name: 'Delete' });
    await confirm.waitFor();
    await confirm.click();
    await expect.poll(() => page.locator('.n-dialog').count(), { timeout: 10_000 }).toBe(0);
    await expect.poll(async () => (await attr(page, 'data-prospect-ids')).split(','), { timeout: 20_000 }).not.toContain(prospectId);
    await expect.poll(() => page.getByTestId('prospect-card').count(), { timeout: 10_000 }).toBe(0);
    const left = await page.evaluate((t) => fetch(`/api/teams/${t}/prospects`).then((r) => r.json()), e.ctx.demoTeamId);
    expect((left as { name: string }[]).some((p) => p.name === name)).toBe(false);
    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });

  it('uploads a reference layer through the panel as the geoscientist, shows it switched on and drawn, and deletes it', async () => {
    const { page, baseUrl, context } = e;
    const teamId = e.ctx.demoTeamId;
    // The planner's planned well goes now: the geoscientist signed in below may not delete it.
    if (plannedWellId) {
      const status = await page.evaluate(
        ({ t, id }) => fetch(`/api/teams/${t}/planned-wells/${id}`, { method: 'DELETE' }).then((r) => r.status),
        { t: teamId, id: plannedWellId },
      );
      expect(status).toBe(204);
      plannedWellId = null;
    }
    await context.clearCookies();
    await page.goto(`${baseUrl}/`);
    await page.waitForURL(/\/sign-in/);
    await page.getByTestId('signin-email').locator('input').fill('geoscientist@porelith.example');
    await page.getByTestId('signin-password').locator('input').fill('porelith-demo');
    await page.getByTestId('signin-submit').click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
    await page.goto(`${baseUrl}/map`);
    await settled(page);

    // A block over the middle of the demo wells, so it sits where the map opens.
    const wells = await page.evaluate(
      (t) =>
        fetch(`/api/teams/${t}/wells?limit=500`)
          .then((r) => r.json())
          .then((b) => b.items as { lon: number; lat: number }[]),
      teamId,
    );
    const lons = wells.map((w) => w.lon);
    const lats = wells.map((w) => w.lat);
    const [cx, cy] = [(Math.min(...lons) + Math.max(...lons)) / 2, (Math.min(...lats) + Math.max(...lats)) / 2];
    const [hx, hy] = [(Math.max(...lons) - Math.min(...lons)) / 5, (Math.max(...lats) - Math.min(...lats)) / 5];
    const ring = [
      [cx - hx, cy - hy],
      [cx + hx, cy - hy],
      [cx + hx, cy + hy],
      [cx - hx, cy + hy],
      [cx - hx, cy - hy],
    ];
    const bowTie = [
      [cx - hx, cy - hy],
      [cx + hx, cy + hy],
      [cx + hx, cy - hy],
      [cx - hx, cy + hy],
      [cx - hx, cy - hy],
    ];
    const collection = (coordinates: number[][], name: string) =>
      Buffer.from(
        JSON.stringify({
          type: 'FeatureCollection',
          features: [{ type: 'Feature', properties: { name }, geometry: { type: 'Polygon', coordinates: [coordinates] } }],
        }),
      );

    await page.getByTestId('reference-add').click();
    const dialog = page.getByTestId('reference-upload');
    await dialog.waitFor();
    // Nothing chosen yet: the form names the missing file before asking the server.
    await page.getByTestId('reference-upload-submit').click();
    await expect.poll(() => dialog.textContent()).toContain('File is required');

    // A self-intersecting outline: the server's own words come back, naming the feature.
    await page
      .getByTestId('reference-file')
      .setInputFiles({ name: 'bad-blocks.geojson', mimeType: 'application/geo+json', buffer: collection(bowTie, 'Twisted') });
    const name = `E2E licence blocks, northern shelf ${Date.now().toString(36)}`;
    await page.getByTestId('reference-name').locator('input').fill(name);
    await page.getByTestId('reference-upload-submit').click();
    const error = page.getByTestId('reference-upload-error');
    await error.waitFor({ timeout: 10_000 });
    expect(await error.textContent()).toMatch(
      /Feature 1 \("Twisted"\) is not a valid geometry: its outline crosses itself near lon -?[\d.]+, lat -?[\d.]+\./,
    );
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-reference-error.png') });

    // The good file goes in, the dialog closes, and the layer is listed switched on.
    await page
      .getByTestId('reference-file')
      .setInputFiles({ name: 'blocks.geojson', mimeType: 'application/geo+json', buffer: collection(ring, 'Block E-7') });
    await page.getByTestId('reference-upload-submit').click();
    const row = page.getByTestId('reference-layer').filter({ hasText: name });
    await row.waitFor({ timeout: 15_000 });
    await expect.poll(() => dialog.count(), { timeout: 10_000 }).toBe(0);
    referenceLayerId = await row.getAttribute('data-layer-id');
    expect(referenceLayerId).toMatch(/^[0-9a-f-]{36}$/);
    const toggle = row.getByTestId('reference-toggle');
    expect(await toggle.getAttribute('aria-checked')).toBe('true');

    // Its own source and layers are in the map's style, and its tiles draw the block in view.
    await settled(page);
    await expect.poll(async () => (await attr(page, 'data-reference-ids')).split(','), { timeout: 20_000 }).toContain(referenceLayerId);
    expect(e.requests.some((u) => u.includes(`/api/teams/${teamId}/tiles/reference-${referenceLayerId}/`))).toBe(true);
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-reference-layer.png') });
    // Both themes: the layer keeps its own colour, the labels follow the theme.
    const theme = await page.evaluate(() => document.documentElement.dataset.theme);
    await page.getByTestId('theme-toggle').click();
    await expect.poll(() => page.evaluate(() => document.documentElement.dataset.theme)).not.toBe(theme);
    await settled(page);
    await expect.poll(async () => (await attr(page, 'data-reference-ids')).split(','), { timeout: 20_000 }).toContain(referenceLayerId);
    await page.screenshot({ path: join(ARTIFACTS, 'atlas-reference-layer-other-theme.png') });

    // Switched off it leaves the map, and the switch is remembered across a reload.
    await toggle.click();
    await expect.poll(() => toggle.getAttribute('aria-checked')).toBe('false');
    await settled(page);
    await expect.poll(async () => (await attr(page, 'data-reference-ids')).split(','), { timeout: 20_000 }).not.toContain(referenceLayerId);
    await page.reload();
    await settled(page);
    const reloaded = page.getByTestId('reference-layer').filter({ hasText: name });
    await reloaded.waitFor({ timeout: 15_000 });
    expect(await reloaded.getByTestId('reference-toggle').getAttribute('aria-checked')).toBe('false');
    await reloaded.getByTestId('reference-toggle').click();
    await settled(page);
    await expect.poll(async () => (await attr(page, 'data-reference-ids')).split(','), { timeout: 20_000 }).toContain(referenceLayerId);

    // Deleted through the panel, it is gone from the list, the map and the server.
    await reloaded.getByTestId('reference-delete').click();
    const confirm = page.locator('.n-dialog').getByRole('button', { name: 'Delete' });
    await confirm.waitFor();
    await confirm.click();
    await expect.poll(() => page.getByTestId('reference-layer').filter({ hasText: name }).count(), { timeout: 10_000 }).toBe(0);
    const left = await page.evaluate((t) => fetch(`/api/teams/${t}/layers`).then((r) => r.json()), teamId);
    expect((left as { id: string }[]).some((l) => l.id === referenceLayerId)).toBe(false);
    referenceLayerId = null;
    expect(foreignRequests(e.requests, baseUrl)).toEqual([]);
  });
});
