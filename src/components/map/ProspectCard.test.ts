// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import { installFakeServer, jsonReply, twoTeamSession } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import { usePlanningStore } from '@/stores/planning';
import ProspectCard from './ProspectCard.vue';

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
const PLANNED = {
  id: '1e2d3c4b-5a69-4877-8695-a4b3c2d1e0f9',
  name: 'Lantern-1 (planned)',
  prospectId: PROSPECT.id,
  location: { type: 'Point', coordinates: [-101, -32.5] },
  datumElevationM: 25,
  waterDepthM: 110,
  waterDepthSource: 'nearest-wells',
  plannedTdM: 3725,
  notes: null,
  version: 1,
  updatedAt: '2026-01-01T00:00:00Z',
};

describe('ProspectCard', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it("links to the prospect's top-of-overpressure surface screen and gives the planned TD its datum", async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const { wrapper, router, pinia } = await mountInApp(ProspectCard, { props: { prospect: PROSPECT }, path: '/map' });
    usePlanningStore(pinia).plannedWells = [PLANNED as never];
    await flushPromises();
    const link = wrapper.get('[data-testid="prospect-surface-link"]');
    expect(link.text()).toContain('Top-of-overpressure surface');
    const href = link.attributes('href')!;
    expect(href).toBe(`/prospects/${PROSPECT.id}/surfaces`);
    // The link lands on the surfaces screen of the router, for this prospect.
    const target = router.resolve(href);
    expect(target.name).toBe('prospect-surfaces');
    expect(target.params.prospectId).toBe(PROSPECT.id);
    expect(wrapper.get('[data-testid="prospect-planned-td"]').text()).toBe('TD 3,725 m MD below RT');
  });
});
