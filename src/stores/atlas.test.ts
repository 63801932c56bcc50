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
import { ATLAS_REFERENCE_TOGGLES_KEY, useAtlasStore } from './atlas';

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

describe('useAtlasStore', () => {
  beforeEach(() => {
    localStorage.clear();
    setActivePinia(createPinia());
  });
  afterEach(() => vi.unstubAllGlobals());

  it('loads the team and starts the picks from the saved offset set', async () => {
    server();
    const atlas = useAtlasStore();
    await atlas.load(TEAM_A);
    expect(atlas.state).toBe('done');
    expect(atlas.wellsTotal).toBe(2);
    await atlas.selectPlannedWell(PW);
    expect(atlas.picks).toEqual([{ wellId: W2, name: 'B-2', reason: 'same block' }]);
    expect(atlas.offsetsDirty).toBe(false);
    // Saved offsets show before any search, placed from the known wells, with a line from the planned well.
    const kinds = atlas.offsetGeoJson.features.map((f) => `${f.properties.kind}:${f.properties.wellId}`);
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
    const atlas = useAtlasStore();
    await atlas.load(TEAM_A);
    await atlas.selectPlannedWell(PW);
    await atlas.searchOffsets({ radiusKm: 25 });
    expect(atlas.candidates.map((c) => c.wellId)).toEqual([W1, W2]);
    expect(atlas.offsetMarks.map((m) => [m.rank, m.picked])).toEqual([
      [1, false],
      [2, true],
    ]);

    atlas.setPicked(W1, 'A-1', true);
    atlas.setReason(W1, '  nearest ');
    expect(atlas.offsetsDirty).toBe(true);
    await atlas.saveOffsets();
    expect(sent).toEqual({
      wells: [
        { wellId: W2, reason: 'same block' },
        { wellId: W1, reason: 'nearest' },
      ],
    });
    expect(atlas.offsetsDirty).toBe(false);
    expect(atlas.candidates.every((c) => c.inOffsetSet)).toBe(true);
  });

  it('keeps the saved set when the server refuses, and reports the search error', async () => {
    server({
      [`GET ${base}/planned-wells/${PW}/offset-candidates?radiusKm=25`]: () =>
        errorReply(400, 'invalid_query', 'radiusKm: must be at most 500 km'),
    });
    const atlas = useAtlasStore();
    await atlas.load(TEAM_A);
    await atlas.selectPlannedWell(PW);
    await atlas.searchOffsets({ radiusKm: 25 });
    expect(atlas.candidatesState).toBe('error');
    expect(atlas.candidatesError).toBe('radiusKm: must be at most 500 km');
    expect(atlas.savedOffsets).toHaveLength(1);
  });

  it('bumps the tile version after an edit so the map refetches its tiles', async () => {
    server({ [`DELETE ${base}/prospects/${P1}`]: () => new Response(null, { status: 204 }) });
    const atlas = useAtlasStore();
    await atlas.load(TEAM_A);
    const before = atlas.tileVersion;
    await atlas.deleteProspect(P1);
    expect(atlas.tileVersion).toBe(before + 1);
    expect(atlas.prospects).toEqual([]);
    // The planned well stays, without its prospect (as the server's ON DELETE SET NULL does).
    expect(atlas.plannedWells[0].prospectId).toBeNull();
  });

  it('remembers the layer switches across visits', async () => {
    server();
    useAtlasStore().setToggle('wellNames', false);
    await Promise.resolve();
    setActivePinia(createPinia());
    expect(useAtlasStore().toggles.wellNames).toBe(false);
  });

  it('lists the reference layers, remembers their switches, and forgets a deleted one', async () => {
    server({
      [`GET ${base}/layers`]: () => jsonReply(200, [blocks]),
      [`DELETE ${base}/layers/${L1}`]: () => new Response(null, { status: 204 }),
    });
    const atlas = useAtlasStore();
    await atlas.load(TEAM_A);
    await vi.waitFor(() => expect(atlas.referenceState).toBe('done'));
    expect(atlas.referenceLayers.map((l) => l.name)).toEqual(['Blocks']);
    atlas.setReferenceToggle(L1, false);
    await Promise.resolve();
    expect(JSON.parse(localStorage.getItem(ATLAS_REFERENCE_TOGGLES_KEY) ?? '{}')).toEqual({ [L1]: false });
    setActivePinia(createPinia());
    const again = useAtlasStore();
    expect(again.referenceToggles[L1]).toBe(false);
    await again.load(TEAM_A);
    await again.deleteReferenceLayer(L1);
    expect(again.referenceLayers).toEqual([]);
    expect(again.referenceToggles).toEqual({});
  });

  it('keeps the map when the layer list fails, reporting it apart', async () => {
    server({ [`GET ${base}/layers`]: () => errorReply(500, 'internal', 'Something broke.') });
    const atlas = useAtlasStore();
    await atlas.load(TEAM_A);
    await vi.waitFor(() => expect(atlas.referenceState).toBe('error'));
    expect(atlas.state).toBe('done');
    expect(atlas.referenceError).toBe('Something broke.');
  });
});
