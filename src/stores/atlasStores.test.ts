// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import {
  offsetCandidateSchema,
  offsetSetEntrySchema,
  plannedWellSchema,
  prospectSchema,
  referenceLayerSchema,
  type OffsetCandidate,
  type OffsetSetEntry,
  type PlannedWell,
  type Prospect,
} from '@shared/schemas/planning';
import { wellSummarySchema, type WellSummary } from '@shared/schemas/wells';
import { errorReply, installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import { useOffsetMarks } from '@/composables/useOffsetMarks';
import { useAtlasViewStore } from './atlasView';
import { useOffsetPickingStore } from './offsetPicking';
import { usePlanningStore } from './planning';
import { ATLAS_REFERENCE_TOGGLES_KEY, useReferenceLayersStore } from './referenceLayers';

// Fixtures are parsed with the shared contract schemas, so they have the shape the server sends.
const PW = '11111111-1111-4111-8111-111111111111';
const W1 = '22222222-2222-4222-8222-222222222222';
const W2 = '33333333-3333-4333-8333-333333333333';
const P1 = '44444444-4444-4444-8444-444444444444';

const well = (id: string, name: string, lon: number, lat: number): WellSummary =>
  wellSummarySchema.parse({
    id,
    name,
    uwi: null,
    operator: null,
    lon,
    lat,
    status: 'drilled',
    offshore: true,
    waterDepthM: 100,
    tdMdM: 3000,
    tdTvdM: 3000,
    spudDate: null,
    pressureCount: 2,
    logCount: 1,
    hasSurvey: false,
    hasLot: false,
    updatedAt: '2026-01-01T00:00:00Z',
  });
const planned: PlannedWell = plannedWellSchema.parse({
  id: PW,
  name: 'Ostrel-3',
  location: { type: 'Point', coordinates: [-101, -32.5] },
  prospectId: P1,
  datumElevationM: 25,
  waterDepthM: 110,
  waterDepthSource: 'nearest-wells',
  plannedTdM: 3200,
  notes: null,
  version: 1,
  updatedAt: '2026-01-01T00:00:00Z',
});
const prospect: Prospect = prospectSchema.parse({
  id: P1,
  name: 'Ostrel Ridge',
  geometry: {
    type: 'Polygon',
    coordinates: [
      [
        [-101.1, -32.6],
        [-100.9, -32.6],
        [-100.9, -32.4],
        [-101.1, -32.6],
      ],
    ],
  },
  areaKm2: 200,
  targetTopM: 2300,
  targetBaseM: 3100,
  notes: null,
  version: 1,
  createdBy: null,
  updatedAt: '2026-01-01T00:00:00Z',
});
const candidate = (w: WellSummary, score: number): OffsetCandidate =>
  offsetCandidateSchema.parse({
    wellId: w.id,
    name: w.name,
    uwi: null,
    status: 'drilled',
    lon: w.lon,
    lat: w.lat,
    distanceKm: 5,
    azimuthDeg: 45,
    waterDepthM: 100,
    waterDepthDiffM: -10,
    tdTvdM: 3000,
    tdCoverage: 0.94,
    pressureCount: 2,
    logCount: 1,
    hasLot: false,
    hasSurvey: false,
    topTvdssM: null,
    inOffsetSet: false,
    score,
  });
const entry = (w: WellSummary, reason: string | null): OffsetSetEntry =>
  offsetSetEntrySchema.parse({ wellId: w.id, name: w.name, reason, addedBy: null, addedByName: 'Priya', addedAt: '2026-01-02T00:00:00Z' });

const L1 = '55555555-5555-4555-8555-555555555555';
const blocks = referenceLayerSchema.parse({
  id: L1,
  name: 'Blocks',
  kind: 'lease_blocks',
  color: '#A0782C',
  featureCount: 2,
  geometryTypes: ['POLYGON'],
  bbox: [-101, -32.6, -100.8, -32.5],
  createdAt: '2026-01-01T00:00:00.000Z',
});

const w1 = well(W1, 'A-1', -101.05, -32.45);
const w2 = well(W2, 'B-2', -100.95, -32.55);
const base = `/api/teams/${TEAM_A}`;

function server(extra: Record<string, (body: unknown) => Response> = {}) {
  return installFakeServer({
    [`GET ${base}/prospects`]: () => jsonReply(200, [prospect]),
    [`GET ${base}/planned-wells`]: () => jsonReply(200, [planned]),
    [`GET ${base}/wells?limit=500`]: () => jsonReply(200, { total: 2, items: [w1, w2] }),
    [`GET ${base}/planned-wells/${PW}/offsets`]: () => jsonReply(200, [entry(w2, 'same block')]),
    [`GET ${base}/planned-wells/${PW}/offset-candidates?radiusKm=25`]: () => jsonReply(200, [candidate(w1, 0.9), candidate(w2, 0.8)]),
    ...extra,
  });
}

describe('the Atlas stores', () => {
  beforeEach(() => {
    localStorage.clear();
    setActivePinia(createPinia());
  });
  afterEach(() => vi.unstubAllGlobals());

  it('loads the team and starts the picks from the saved offset set', async () => {
    server();
    const plan = usePlanningStore();
    const offsets = useOffsetPickingStore();
    const { offsetGeoJson } = useOffsetMarks();
    await plan.load(TEAM_A);
    expect(plan.state).toBe('done');
    expect(plan.wellsTotal).toBe(2);
    await offsets.selectPlannedWell(PW);
    expect(offsets.picks).toEqual([{ wellId: W2, name: 'B-2', reason: 'same block' }]);
    expect(offsets.dirty).toBe(false);
    // Saved offsets show before any search, placed from the known wells, with a line from the planned well.
    const kinds = offsetGeoJson.value.features.map((f) => `${f.properties.kind}:${f.properties.wellId}`);
    expect(kinds).toEqual([`line:${W2}`, `candidate:${W2}`]);
  });

  it('ranks a search, tracks ticks as unsaved, and saves them as the new set', async () => {
    let sent: unknown = null;
    server({
      [`PUT ${base}/planned-wells/${PW}/offsets`]: (body) => {
        sent = body;
        return jsonReply(200, [entry(w2, 'same block'), entry(w1, 'nearest')]);
      },
    });
    const offsets = useOffsetPickingStore();
    const { offsetMarks } = useOffsetMarks();
    await usePlanningStore().load(TEAM_A);
    await offsets.selectPlannedWell(PW);
    await offsets.search({ radiusKm: 25 });
    expect(offsets.candidates.map((c) => c.wellId)).toEqual([W1, W2]);
    expect(offsetMarks.value.map((m) => [m.rank, m.picked])).toEqual([
      [1, false],
      [2, true],
    ]);

    offsets.setPicked(W1, 'A-1', true);
    offsets.setReason(W1, '  nearest ');
    expect(offsets.dirty).toBe(true);
    await offsets.save();
    expect(sent).toEqual({
      wells: [
        { wellId: W2, reason: 'same block' },
        { wellId: W1, reason: 'nearest' },
      ],
    });
    expect(offsets.dirty).toBe(false);
    expect(offsets.candidates.every((c) => c.inOffsetSet)).toBe(true);
  });

  it('keeps the saved set when the server refuses, and reports the search error', async () => {
    server({
      [`GET ${base}/planned-wells/${PW}/offset-candidates?radiusKm=25`]: () =>
        errorReply(400, 'invalid_query', 'radiusKm: must be at most 500 km'),
    });
    const offsets = useOffsetPickingStore();
    await usePlanningStore().load(TEAM_A);
    await offsets.selectPlannedWell(PW);
    await offsets.search({ radiusKm: 25 });
    expect(offsets.candidatesState).toBe('error');
    expect(offsets.candidatesError).toBe('radiusKm: must be at most 500 km');
    expect(offsets.saved).toHaveLength(1);
  });

  it('bumps the tile version after an edit so the map refetches its tiles', async () => {
    server({ [`DELETE ${base}/prospects/${P1}`]: () => new Response(null, { status: 204 }) });
    const plan = usePlanningStore();
    await plan.load(TEAM_A);
    const before = plan.tileVersion;
    await plan.deleteProspect(P1);
    expect(plan.tileVersion).toBe(before + 1);
    expect(plan.prospects).toEqual([]);
    // The planned well stays, without its prospect (as the server's ON DELETE SET NULL does).
    expect(plan.plannedWells[0].prospectId).toBeNull();
  });

  it('remembers the layer switches across visits', async () => {
    server();
    useAtlasViewStore().setToggle('wellNames', false);
    await Promise.resolve();
    setActivePinia(createPinia());
    expect(useAtlasViewStore().toggles.wellNames).toBe(false);
  });

  it('lists the reference layers, remembers their switches, and forgets a deleted one', async () => {
    server({
      [`GET ${base}/layers`]: () => jsonReply(200, [blocks]),
      [`DELETE ${base}/layers/${L1}`]: () => new Response(null, { status: 204 }),
    });
    const references = useReferenceLayersStore();
    await usePlanningStore().load(TEAM_A);
    await references.load(TEAM_A);
    expect(references.state).toBe('done');
    expect(references.layers.map((l) => l.name)).toEqual(['Blocks']);
    references.setToggle(L1, false);
    await Promise.resolve();
    expect(JSON.parse(localStorage.getItem(ATLAS_REFERENCE_TOGGLES_KEY) ?? '{}')).toEqual({ [L1]: false });
    setActivePinia(createPinia());
    const again = useReferenceLayersStore();
    expect(again.toggles[L1]).toBe(false);
    await usePlanningStore().load(TEAM_A);
    await again.load(TEAM_A);
    await again.remove(L1);
    expect(again.layers).toEqual([]);
    expect(again.toggles).toEqual({});
  });

  it('keeps the map when the layer list fails, reporting it apart', async () => {
    server({ [`GET ${base}/layers`]: () => errorReply(500, 'internal', 'Something broke.') });
    const plan = usePlanningStore();
    const references = useReferenceLayersStore();
    await Promise.all([plan.load(TEAM_A), references.load(TEAM_A)]);
    expect(references.state).toBe('error');
    expect(plan.state).toBe('done');
    expect(references.error).toBe('Something broke.');
  });

  it('drops the offset set of a planned well deselected before it arrived', async () => {
    server();
    const offsets = useOffsetPickingStore();
    await usePlanningStore().load(TEAM_A);
    const pending = offsets.selectPlannedWell(PW);
    await offsets.selectPlannedWell(null);
    await pending;
    expect(offsets.picks).toEqual([]);
    expect(offsets.savedState).toBe('idle');
  });

  it('opens a new team with nothing selected', async () => {
    server();
    const view = useAtlasViewStore();
    view.select({ prospectId: P1 });
    await usePlanningStore().load(TEAM_A);
    expect(view.selection.prospectId).toBeNull();
    expect(view.teamId).toBe(TEAM_A);
  });
});
