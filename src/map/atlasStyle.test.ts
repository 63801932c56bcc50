import { describe, expect, it } from 'vitest';
import { featureFilter, validateStyleMin, type LayerSpecification, type StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import { basemapStyle } from '../../tiles/style';
import { ATLAS_LAYERS, ATLAS_SOURCES, NO_SELECTION, type AtlasSelection } from './atlasLayers';
import { atlasStyle, DRAW_PREFIX, keepDrawLayers, type AtlasStyleInput } from './atlasStyle';
import { DEFAULT_TOGGLES } from './layerToggles';
import { EMPTY_OFFSETS, offsetFeatures } from './offsetFeatures';
import { prospectLabelPoints } from './prospectOutline';

const ORIGIN = 'http://127.0.0.1:8080';
const TEAM = '5d2c1a9b-7f1e-4c3a-8b2d-1e0f9a8b7c6d';
const W1 = '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10';

function input(overrides: Partial<AtlasStyleInput> = {}): AtlasStyleInput {
  return {
    base: basemapStyle(ORIGIN, { dark: overrides.theme === 'dark' }),
    theme: 'light',
    origin: ORIGIN,
    teamId: TEAM,
    tileVersion: 0,
    toggles: DEFAULT_TOGGLES,
    selection: NO_SELECTION,
    offsets: EMPTY_OFFSETS,
    prospectLabels: prospectLabelPoints([]),
    ...overrides,
  };
}

const layer = (style: StyleSpecification, id: string) => {
  const found = style.layers.find((l) => l.id === id);
  if (!found) throw new Error(`no layer ${id}`);
  return found as LayerSpecification & { filter?: unknown; layout?: Record<string, unknown> };
};

/** Runs a layer's filter the way MapLibre does, with the style-spec's own filter compiler. */
function passes(l: { filter?: unknown; id: string }, properties: Record<string, unknown>, type: 1 | 2 | 3 = 1, zoom = 10): boolean {
  const compiled = featureFilter(l.filter as never, `layers[${l.id}].filter`);
  return Boolean(compiled.filter({ zoom }, { type, properties }));
}

describe('atlasStyle', () => {
  // Reference: MapLibre's style-specification validator, the one the map itself runs at load.
  it.each(['light', 'dark'] as const)('passes the MapLibre style validator with offsets and a selection (%s)', (theme) => {
    const offsets = offsetFeatures([-101, -32.5], [{ wellId: W1, name: 'A-1', lon: -101.1, lat: -32.4, rank: 1, picked: true }]);
    const selection: AtlasSelection = { ...NO_SELECTION, wellId: W1, prospectId: W1, plannedWellId: W1, hoverWellId: W1 };
    const errors = validateStyleMin(atlasStyle(input({ theme, offsets, selection })));
    expect(errors.map((e) => e.message)).toEqual([]);
  });

  it('keeps the basemap under the team layers and drops its camera so a style change never moves the map', () => {
    const base = basemapStyle(ORIGIN);
    const style = atlasStyle(input());
    expect(style.layers.slice(0, base.layers.length).map((l) => l.id)).toEqual(base.layers.map((l) => l.id));
    expect(style.layers.length).toBe(base.layers.length + Object.keys(ATLAS_LAYERS).length);
    expect(style.center).toBeUndefined();
    expect(style.zoom).toBeUndefined();
    expect(style['font-faces']).toEqual(base['font-faces']);
  });

  it('labels only in faces the basemap declares, so no glyph server is ever asked', () => {
    const style = atlasStyle(input());
    const declared = Object.keys(style['font-faces'] ?? {});
    const used = new Set(
      style.layers.flatMap((l) => ((l.layout as Record<string, unknown> | undefined)?.['text-font'] as string[] | undefined) ?? []),
    );
    expect(used.size).toBeGreaterThan(0);
    for (const face of used) expect(declared).toContain(face);
    expect(style.glyphs).toBeUndefined();
  });

  it('fetches team tiles from the same origin with the version in the query', () => {
    const { sources } = atlasStyle(input({ tileVersion: 7 }));
    const templates = Object.fromEntries(Object.entries(sources).map(([id, s]) => [id, s.type === 'vector' ? s.tiles?.[0] : undefined]));
    expect(templates[ATLAS_SOURCES.wells]).toBe(`${ORIGIN}/api/teams/${TEAM}/tiles/wells/{z}/{x}/{y}.mvt?v=7`);
    expect(templates[ATLAS_SOURCES.prospects]).toBe(`${ORIGIN}/api/teams/${TEAM}/tiles/prospects/{z}/{x}/{y}.mvt?v=7`);
    expect(templates[ATLAS_SOURCES.plannedWells]).toBe(`${ORIGIN}/api/teams/${TEAM}/tiles/planned-wells/{z}/{x}/{y}.mvt?v=7`);
  });

  it('switches a whole group with visibility, leaving the other groups on', () => {
    const style = atlasStyle(input({ toggles: { ...DEFAULT_TOGGLES, wells: false } }));
    for (const id of [ATLAS_LAYERS.wells, ATLAS_LAYERS.clusters, ATLAS_LAYERS.clusterCount, ATLAS_LAYERS.pressureRing]) {
      expect(layer(style, id).layout?.visibility).toBe('none');
    }
    expect(layer(style, ATLAS_LAYERS.wellLabels).layout?.visibility).toBe('visible');
    expect(layer(style, ATLAS_LAYERS.prospectFill).layout?.visibility).toBe('visible');
  });
});

describe('well layer filters (evaluated with the style-spec filter compiler)', () => {
  const style = atlasStyle(input({ selection: { ...NO_SELECTION, wellId: W1, editingProspectId: 'p-edit' } }));
  const cluster = { cluster: true, count: 14 };
  const rich = { id: W1, name: 'A-1', status: 'drilled', pressures: 3, logs: 2, has_lot: true, has_survey: true };
  const bare = { id: 'w2', name: 'B-1', status: 'abandoned', pressures: 0, logs: 0, has_lot: false, has_survey: false };

  it('draws clusters only as clusters and wells only as wells', () => {
    expect(passes(layer(style, ATLAS_LAYERS.clusters), cluster)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.clusters), rich)).toBe(false);
    expect(passes(layer(style, ATLAS_LAYERS.wells), rich)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.wells), cluster)).toBe(false);
  });

  it('rings wells with pressures and marks logs and LOT only where present', () => {
    expect(passes(layer(style, ATLAS_LAYERS.pressureRing), rich)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.pressureRing), bare)).toBe(false);
    expect(passes(layer(style, ATLAS_LAYERS.logsMark), rich)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.logsMark), bare)).toBe(false);
    expect(passes(layer(style, ATLAS_LAYERS.lotMark), rich)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.lotMark), bare)).toBe(false);
  });

  it('highlights the selected well only, and hides the prospect being edited', () => {
    expect(passes(layer(style, ATLAS_LAYERS.wellSelected), rich)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.wellSelected), bare)).toBe(false);
    expect(passes(layer(style, ATLAS_LAYERS.prospectFill), { id: 'p-edit', name: 'X' }, 3)).toBe(false);
    expect(passes(layer(style, ATLAS_LAYERS.prospectFill), { id: 'p-other', name: 'Y' }, 3)).toBe(true);
  });

  it('matches nothing as selected when nothing is selected', () => {
    const plain = atlasStyle(input());
    expect(passes(layer(plain, ATLAS_LAYERS.wellSelected), rich)).toBe(false);
    expect(passes(layer(plain, ATLAS_LAYERS.plannedSelected), { id: W1 })).toBe(false);
  });

  it('splits offset lines into picked (solid) and not picked (dashed)', () => {
    expect(passes(layer(style, ATLAS_LAYERS.offsetLinesPicked), { kind: 'line', picked: true }, 2)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.offsetLines), { kind: 'line', picked: true }, 2)).toBe(false);
    expect(passes(layer(style, ATLAS_LAYERS.offsetLines), { kind: 'line', picked: false }, 2)).toBe(true);
    expect(passes(layer(style, ATLAS_LAYERS.offsetCandidates), { kind: 'line', picked: false }, 2)).toBe(false);
  });
});

describe('keepDrawLayers', () => {
  it("carries the drawing tool's sources and layers over, on top", () => {
    const next = atlasStyle(input());
    const previous: StyleSpecification = {
      ...next,
      sources: { ...next.sources, [`${DRAW_PREFIX}-polygon`]: { type: 'geojson', data: { type: 'FeatureCollection', features: [] } } },
      layers: [...next.layers, { id: `${DRAW_PREFIX}-polygon`, type: 'fill', source: `${DRAW_PREFIX}-polygon` }],
    };
    const merged = keepDrawLayers(previous, atlasStyle(input({ theme: 'dark' })));
    expect(merged.sources[`${DRAW_PREFIX}-polygon`]).toBeDefined();
    expect(merged.layers.at(-1)?.id).toBe(`${DRAW_PREFIX}-polygon`);
    expect(validateStyleMin(merged).map((e) => e.message)).toEqual([]);
  });

  it('returns the next style untouched when nothing was drawn', () => {
    const next = atlasStyle(input());
    expect(keepDrawLayers(next, next)).toBe(next);
    expect(keepDrawLayers(undefined, next)).toBe(next);
  });
});
