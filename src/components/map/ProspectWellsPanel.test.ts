// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import { errorReply, installFakeServer, jsonReply, TEAM_A, twoTeamSession } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import ProspectWellsPanel from './ProspectWellsPanel.vue';

const PROSPECT = {
  id: '7c1d2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f',
  name: 'Lantern Screen',
  areaKm2: 20,
  targetTopM: 2800,
  targetBaseM: 3500,
  notes: null,
  version: 1,
  updatedAt: '2026-11-30T10:00:00Z',
  geometry: { type: 'Polygon', coordinates: [] },
};
const well = (wellId: string, name: string, distanceKm: number, topTvdssM: number | null) => ({
  wellId,
  name,
  uwi: null,
  status: 'drilled',
  lon: -101,
  lat: -32.5,
  distanceKm,
  azimuthDeg: 90,
  waterDepthM: 100,
  waterDepthDiffM: null,
  tdTvdM: 3900,
  tdCoverage: 1.1,
  pressureCount: 12,
  logCount: 4,
  hasLot: true,
  hasSurvey: false,
  topTvdssM,
  inOffsetSet: false,
  score: 0.8,
});
const url = (km: number) => `GET /api/teams/${TEAM_A}/prospects/${PROSPECT.id}/offset-wells?bufferKm=${km}`;

describe('ProspectWellsPanel', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('lists the wells around the prospect with "inside" for distance 0 and links to their profiles', async () => {
    installFakeServer({
      'GET /api/auth/me': () => jsonReply(200, twoTeamSession),
      [url(10)]: () =>
        jsonReply(200, [
          well('3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b', 'NEAR-1', 0, 3120.4),
          well('9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d', 'MID-3', 4.26, null),
        ]),
    });
    const { wrapper } = await mountInApp(ProspectWellsPanel, { props: { prospect: PROSPECT }, path: '/map' });
    await flushPromises();
    await wrapper.get('[data-testid="prospect-wells-find"]').trigger('click');
    await flushPromises();
    const rows = wrapper.findAll('[data-testid="prospect-well-row"]').map((r) => r.findAll('td').map((c) => c.text()));
    expect(rows[0].slice(0, 3)).toEqual(['NEAR-1', 'inside', '3,120 m']);
    expect(rows[1].slice(0, 3)).toEqual(['MID-3', '4.3 km', '—']);
    expect(wrapper.get('[data-testid="prospect-well-row"] a').attributes('href')).toBe(
      '/wells/3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b/profile',
    );
    expect(wrapper.text()).toContain('2 wells inside the outline or within 10 km');
  });

  it("shows the server's refusal", async () => {
    installFakeServer({
      'GET /api/auth/me': () => jsonReply(200, twoTeamSession),
      [url(10)]: () => errorReply(404, 'not_found', 'That prospect was not found'),
    });
    const { wrapper } = await mountInApp(ProspectWellsPanel, { props: { prospect: PROSPECT }, path: '/map' });
    await flushPromises();
    await wrapper.get('[data-testid="prospect-wells-find"]').trigger('click');
    await flushPromises();
    expect(wrapper.get('[role="alert"]').text()).toContain('That prospect was not found');
  });
});
