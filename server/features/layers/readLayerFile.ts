import { kml } from '@tmcw/togeojson';
import { DOMParser } from '@xmldom/xmldom';
import { z } from 'zod';
import { badRequest } from '../../lib/httpError';
import { jsonErrorAt } from './layerMessages';

export const MAX_LAYER_BYTES = 20 * 1024 * 1024;
export const MAX_LAYER_FEATURES = 50_000;

const position = z.array(z.number()).min(2);
const geometry: z.ZodType<{ type: string; coordinates?: unknown; geometries?: unknown[] }> = z.lazy(() =>
  z.union([
    z.object({ type: z.literal('Point'), coordinates: position }),
    z.object({ type: z.literal('MultiPoint'), coordinates: z.array(position) }),
    z.object({ type: z.literal('LineString'), coordinates: z.array(position).min(2) }),
    z.object({ type: z.literal('MultiLineString'), coordinates: z.array(z.array(position).min(2)) }),
    z.object({ type: z.literal('Polygon'), coordinates: z.array(z.array(position).min(4)) }),
    z.object({ type: z.literal('MultiPolygon'), coordinates: z.array(z.array(z.array(position).min(4))) }),
    z.object({ type: z.literal('GeometryCollection'), geometries: z.array(geometry) }),
  ]),
);
const feature = z.object({
  type: z.literal('Feature'),
  geometry: geometry.nullable(),
  properties: z.record(z.string(), z.unknown()).nullable().optional(),
});
const featureCollection = z.object({ type: z.literal('FeatureCollection'), features: z.array(z.unknown()) });

export interface LayerFeature {
  geometry: { type: string };
  properties: Record<string, unknown>;
}

function* positions(g: unknown): Generator<number[]> {
  if (Array.isArray(g) && typeof g[0] === 'number') yield g as number[];
  else if (Array.isArray(g)) for (const x of g) yield* positions(x);
}

/**
 * Reads a reference layer as GeoJSON (RFC 7946) or KML (converted with @tmcw/togeojson), naming the
 * first bad feature; features without geometry are skipped.
 */
export function readLayerFile(fileName: string, bytes: Buffer): LayerFeature[] {
  const text = bytes.toString('utf8');
  let data: unknown;
  if (/\.kml$/i.test(fileName) || /^\s*<\?xml|^\s*<kml/i.test(text)) {
    const doc = new DOMParser({ onError: () => {} }).parseFromString(text, 'text/xml');
    if (!doc || doc.getElementsByTagName('kml').length === 0) throw badRequest('invalid_layer', `${fileName} is not a KML document.`);
    data = kml(doc as unknown as Document);
  } else {
    try {
      data = JSON.parse(text);
    } catch (err) {
      throw badRequest('invalid_layer', `${fileName} is not valid JSON at ${jsonErrorAt(text, err as Error)}.`);
    }
  }
  const fc = featureCollection.safeParse(data);
  if (!fc.success)
    throw badRequest(
      'invalid_layer',
      `${fileName} is not a GeoJSON FeatureCollection (RFC 7946): it needs "type": "FeatureCollection" and a "features" array.`,
    );
  if (fc.data.features.length > MAX_LAYER_FEATURES) {
    throw badRequest(
      'layer_too_large',
      `${fileName} has ${fc.data.features.length.toLocaleString('en')} features; the limit is ${MAX_LAYER_FEATURES.toLocaleString('en')}.`,
    );
  }
  const out: LayerFeature[] = [];
  fc.data.features.forEach((raw, i) => {
    const f = feature.safeParse(raw);
    if (!f.success) {
      const issue = f.error.issues[0];
      throw badRequest('invalid_layer', `Feature ${i + 1} is not valid GeoJSON: ${issue.path.join('.') || 'feature'} ${issue.message}.`, {
        feature: i + 1,
      });
    }
    if (!f.data.geometry) return;
    for (const [lon, lat] of positions(
      f.data.geometry.coordinates ?? (f.data.geometry.geometries ?? []).map((g) => (g as { coordinates: unknown }).coordinates),
    )) {
      if (!(lon >= -180 && lon <= 180 && lat >= -90 && lat <= 90)) {
        throw badRequest(
          'invalid_layer',
          `Feature ${i + 1} has a position (${lon}, ${lat}) outside longitude −180..180 / latitude −90..90; GeoJSON is WGS 84 lon/lat.`,
          { feature: i + 1 },
        );
      }
    }
    out.push({ geometry: f.data.geometry, properties: f.data.properties ?? {} });
  });
  if (out.length === 0) throw badRequest('invalid_layer', `${fileName} holds no features with a geometry.`);
  return out;
}
