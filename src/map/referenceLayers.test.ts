import { describe, expect, it } from 'vitest';
import { featureFilter, validateStyleMin, type LayerSpecification } from '@maplibre/maplibre-gl-style-spec';
import { basemapStyle } from '../../tiles/style';
import { DARK_PALETTE, LIGHT_PALETTE } from './atlasPalette';
import { ATLAS_LAYERS, NO_SELECTION } from './atlasLayers';
import { atlasStyle } from './atlasStyle';
import { DEFAULT_TOGGLES } from './layerToggles';
import { EMPTY_OFFSETS } from './offsetFeatures';
import { prospectLabelPoints } from './prospectOutline';
import { geometryFamilies, REFERENCE_KIND_COLOURS, referenceLayerIds, referenceLayerSpecs, referenceSourceId } from './referenceLayers';

const ORIGIN = 'http://127.0.0.1:8080';
const TEAM = '5d2c1a9b-7f1e-4c3a-8b2d-1e0f9a8b7c6d';
const BLOCKS = {
  id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10',
  kind: 'lease_blocks' as const,
  color: '#A0782C',
  geometryTypes: ['POLYGON', 'MULTIPOLYGON'],
};
const FAULTS = { id: '7c1d2e3f-4a5b-4c6d-8e9f-0a1b2c3d4e5f', kind: 'faults' as const, color: '#A8461F', geometryTypes: ['LINESTRING'] };
const WELLS = { id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d', kind: 'other' as const, color: '#6B7F99', geometryTypes: ['POINT'] };

type Spec = LayerSpecification & { filter?: unknown; layout?: Record<string, unknown>; paint?: Record<string, unknown> };
const byId = (specs: LayerSpecification[], id: string) => specs.find((l) => l.id === id) as Spec;

/** Runs a layer's filter the way MapLibre does, with the style-spec's own filter compiler. */
function passes(l: Spec, type: 1 | 2 | 3 | string, properties: Record<string, unknown> = {}): boolean {
  const compiled = featureFilter(l.filter as never, `layers[${l.id}].filter`);
  return Boolean(compiled.filter({ zoom: 10 }, { type, properties } as never));
}

describe('geometryFamilies', () => {
  it('maps the PostGIS GeometryType names to what the map draws, areas first', () => {
    expect(geometryFamilies(['POINT', 'MULTIPOLYGON'])).toEqual(['polygon', 'point']);
    expect(geometryFamilies(['MULTILINESTRING', 'LINESTRING'])).toEqual(['line']);
    expect(geometryFamilies(['GEOMETRYCOLLECTION'])).toEqual(['polygon', 'line', 'point']);
    expect(geometryFamilies([])).toEqual([]);
  });
});

describe('referenceLayerSpecs', () => {
  it('draws polygons as fill and outline in the layer colour, with a name label', () => {
    const specs = referenceLayerSpecs(BLOCKS, LIGHT_PALETTE, true);
    const ids = referenceLayerIds(BLOCKS.id);
    expect(specs.map((l) => `${l.id}:${l.type}`)).toEqual([`${ids.fill}:fill`, `${ids.outline}:line`, `${ids.label}:symbol`]);
    const fill = byId(specs, ids.fill);
    expect(fill.paint?.['fill-color']).toBe(BLOCKS.color);
    expect(byId(specs, ids.outline).paint?.['line-color']).toBe(BLOCKS.color);
    const sources = specs.map((l) => l as unknown as { source: string; 'source-layer': string });
    expect(sources.every((l) => l.source === referenceSourceId(BLOCKS.id))).toBe(true);
    expect(sources.map((l) => l['source-layer'])).toEqual(['reference', 'reference', 'reference-labels']);
    expect(byId(specs, ids.label).layout?.['text-field']).toEqual(['coalesce', ['get', 'name'], '']);
  });

  it('keeps each drawing to its own geometry (simple and Multi* type names alike)', () => {
    const ids = referenceLayerIds(BLOCKS.id);
    const fill = byId(referenceLayerSpecs(BLOCKS, LIGHT_PALETTE, true), ids.fill);
    expect(passes(fill, 3)).toBe(true);
    expect(passes(fill, 'MultiPolygon')).toBe(true);
    expect(passes(fill, 2)).toBe(false);
    expect(passes(fill, 1)).toBe(false);
    const line = byId(referenceLayerSpecs(FAULTS, LIGHT_PALETTE, true), referenceLayerIds(FAULTS.id).line);
    expect(passes(line, 2)).toBe(true);
    expect(passes(line, 3)).toBe(false);
    // Circle layers would otherwise put a dot on every vertex of a line or polygon.
    const point = byId(referenceLayerSpecs(WELLS, LIGHT_PALETTE, true), referenceLayerIds(WELLS.id).point);
    expect(point.type).toBe('circle');
    expect(passes(point, 1)).toBe(true);
    expect(passes(point, 2)).toBe(false);
    expect(passes(point, 3)).toBe(false);
    expect(referenceLayerSpecs(WELLS, LIGHT_PALETTE, true).map((l) => l.id)).toEqual([
      referenceLayerIds(WELLS.id).point,
      referenceLayerIds(WELLS.id).pointLabel,
    ]);
  });

  it('labels lines along the line, and draws only the families the layer holds', () => {
    const specs = referenceLayerSpecs(FAULTS, LIGHT_PALETTE, true);
    const ids = referenceLayerIds(FAULTS.id);
    expect(specs.map((l) => l.id)).toEqual([ids.line, ids.lineLabel]);
    expect(byId(specs, ids.lineLabel).layout?.['symbol-placement']).toBe('line');
  });

  it('hides a switched-off layer with visibility, keeping it in the style', () => {
    const off = referenceLayerSpecs(BLOCKS, DARK_PALETTE, false);
    expect(off.length).toBe(3);
    expect(off.every((l) => (l as Spec).layout?.visibility === 'none')).toBe(true);
  });

  it('suggests a distinct colour per kind', () => {
    const colours = Object.values(REFERENCE_KIND_COLOURS);
    expect(new Set(colours).size).toBe(colours.length);
    for (const c of colours) expect(c).toMatch(/^#[0-9A-F]{6}$/);
  });
});

describe('atlasStyle with reference layers', () => {
  const input = (theme: 'light' | 'dark', referenceToggles = {}) => ({
    base: basemapStyle(ORIGIN, { dark: theme === 'dark' }),
    theme,
    origin: ORIGIN,
    teamId: TEAM,
    tileVersion: 12,
    toggles: DEFAULT_TOGGLES,
    selection: NO_SELECTION,
    offsets: EMPTY_OFFSETS,
    prospectLabels: prospectLabelPoints([]),
    referenceLayers: [BLOCKS, FAULTS, WELLS],
    referenceToggles,
  });

  // Reference: MapLibre's style-specification validator, the one the map itself runs at load.
  it.each(['light', 'dark'] as const)('passes the MapLibre style validator (%s)', (theme) => {
    expect(validateStyleMin(atlasStyle(input(theme))).map((e) => e.message)).toEqual([]);
  });

  it('adds one team tile source per layer and draws them over the basemap, under the team layers', () => {
    const style = atlasStyle(input('light', { [FAULTS.id]: false }));
    const source = style.sources[referenceSourceId(BLOCKS.id)];
    expect(source.type === 'vector' && source.tiles?.[0]).toBe(
      `${ORIGIN}/api/teams/${TEAM}/tiles/reference-${BLOCKS.id}/{z}/{x}/{y}.mvt?v=0`,
    );
    const order = style.layers.map((l) => l.id);
    expect(order.indexOf(referenceLayerIds(BLOCKS.id).fill)).toBeLessThan(order.indexOf(ATLAS_LAYERS.prospectFill));
    expect(order.indexOf(referenceLayerIds(BLOCKS.id).fill)).toBeGreaterThan(order.indexOf(basemapStyle(ORIGIN).layers.at(-1)!.id));
    const faultLine = style.layers.find((l) => l.id === referenceLayerIds(FAULTS.id).line) as Spec;
    expect(faultLine.layout?.visibility).toBe('none');
    const blockFill = style.layers.find((l) => l.id === referenceLayerIds(BLOCKS.id).fill) as Spec;
    expect(blockFill.layout?.visibility).toBe('visible');
  });
});
