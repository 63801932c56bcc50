import { describe, expect, it } from 'vitest';
import { validateStyleMin } from '@maplibre/maplibre-gl-style-spec';
import { BASEMAP_FONTS } from '../../../tiles/fonts';
import { BASEMAP_ATTRIBUTION, vectorLayers } from '../../../tiles/layers';
import { basemapStyle } from '../../../tiles/style';

const ORIGIN = 'http://maps.porelith.test:8080';

/** Every string anywhere in a JSON value. */
function strings(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  if (Array.isArray(value)) return value.flatMap(strings);
  if (value && typeof value === 'object') return Object.values(value).flatMap(strings);
  return [];
}

describe('basemapStyle', () => {
  // Reference: MapLibre's own style-specification validator, the one the map runs at load.
  it.each([false, true])('passes the MapLibre style validator (dark: %s)', (dark) => {
    const errors = validateStyleMin(basemapStyle(ORIGIN, { dark }));
    expect(errors.map((e) => e.message)).toEqual([]);
  });

  it('loads nothing from outside the origin it is given', () => {
    const urls = strings(basemapStyle(ORIGIN)).filter((s) => /^[a-z]+:\/\//i.test(s));
    expect(urls.length).toBeGreaterThan(3); // tiles and fonts at least
    for (const url of urls) expect(url.startsWith(`${ORIGIN}/tiles/`)).toBe(true);
    const style = basemapStyle(ORIGIN);
    expect(style.glyphs).toBeUndefined();
    expect(style.sprite).toBeUndefined();
  });

  it('names the Natural Earth attribution on its tile source', () => {
    const source = basemapStyle(ORIGIN).sources.basemap;
    expect(source).toMatchObject({ type: 'vector', attribution: BASEMAP_ATTRIBUTION });
    expect(BASEMAP_ATTRIBUTION).toContain('Natural Earth');
  });

  it('draws only source layers the archive declares, in fonts the style ships', () => {
    const style = basemapStyle(ORIGIN);
    const declared = new Set<string>(vectorLayers().map((l) => l.id));
    const faces = new Set(Object.keys(style['font-faces'] ?? {}));
    for (const layer of style.layers) {
      if ('source-layer' in layer && layer['source-layer']) expect(declared.has(layer['source-layer'])).toBe(true);
      if (layer.type === 'symbol') for (const font of layer.layout?.['text-font'] as string[]) expect(faces.has(font)).toBe(true);
    }
    for (const f of Object.values(BASEMAP_FONTS)) expect(style['font-faces']?.[f.stack]).toBe(`${ORIGIN}/tiles/fonts/${f.file}`);
  });

  it('differs between light and dark only in paint, not in structure', () => {
    const light = basemapStyle(ORIGIN);
    const dark = basemapStyle(ORIGIN, { dark: true });
    expect(dark.layers.map((l) => l.id)).toEqual(light.layers.map((l) => l.id));
    const sea = (s: typeof light) => (s.layers[0].paint as Record<string, string>)['background-color'];
    expect(sea(dark)).not.toBe(sea(light));
  });

  it('follows a different mount path and drops a trailing slash on the origin', () => {
    const style = basemapStyle('https://porelith.example/', { mountPath: '/map-tiles' });
    expect(style.sources.basemap).toMatchObject({ tiles: ['https://porelith.example/map-tiles/basemap/{z}/{x}/{y}.mvt'] });
  });

  it('rejects an origin that is not scheme and host', () => {
    expect(() => basemapStyle('maps.porelith.test')).toThrow(
      'basemapStyle: origin must look like http://host:port, got "maps.porelith.test".',
    );
    expect(() => basemapStyle('http://a.test/x')).toThrow('basemapStyle: origin must look like http://host:port, got "http://a.test/x".');
  });
});
