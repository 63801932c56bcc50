import { VectorTile } from '@mapbox/vector-tile';
import { booleanPointInPolygon, polygon } from '@turf/turf';
import { PbfReader } from 'pbf';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshTeamAgent, memberAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let team: Awaited<ReturnType<typeof freshTeamAgent>>;
let base: string;

const block = (lon: number, lat: number, name: string) => ({
  type: 'Feature',
  properties: { name },
  geometry: {
    type: 'Polygon',
    coordinates: [
      [
        [lon, lat],
        [lon + 0.1, lat],
        [lon + 0.1, lat + 0.1],
        [lon, lat + 0.1],
        [lon, lat],
      ],
    ],
  },
});
const fc = (features: unknown[]) => Buffer.from(JSON.stringify({ type: 'FeatureCollection', features }));

beforeAll(async () => {
  ctx = await startTestApp();
  team = await freshTeamAgent(ctx, 'Layer tests', 'geoscientist');
  base = `/api/teams/${team.teamId}`;
});
afterAll(() => ctx.close());

const upload = (name: string, bytes: Buffer, fields: Record<string, string> = { name: 'Lease blocks', kind: 'lease_blocks' }) => {
  let req = team.agent.post(`${base}/layers`);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req.attach('file', bytes, name);
};

describe('reference layers', () => {
  it('stores a GeoJSON layer and reports its features, types and extent', async () => {
    const res = await upload('blocks.geojson', fc([block(-101, -32.6, 'Q-17'), block(-100.9, -32.6, 'Q-18')]));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'Lease blocks', kind: 'lease_blocks', featureCount: 2, geometryTypes: ['POLYGON'] });
    expect(res.body.bbox[0]).toBeCloseTo(-101, 9);
    expect(res.body.bbox[2]).toBeCloseTo(-100.8, 9);
    const list = await team.agent.get(`${base}/layers`);
    expect(list.body.map((l: { id: string }) => l.id)).toContain(res.body.id);
  });

  it('reads KML placemarks', async () => {
    const kml = `<?xml version="1.0" encoding="UTF-8"?><kml xmlns="http://www.opengis.net/kml/2.2"><Document>
      <Placemark><name>Fault F1</name><LineString><coordinates>-101.0,-32.5,0 -100.9,-32.45,0 -100.8,-32.42,0</coordinates></LineString></Placemark>
    </Document></kml>`;
    const res = await upload('faults.kml', Buffer.from(kml), { name: 'Faults', kind: 'faults', color: '#aa3344' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ featureCount: 1, geometryTypes: ['LINESTRING'], color: '#aa3344' });
  });

  it('refuses bad files with a clear message and stores nothing', async () => {
    const before = (await team.agent.get(`${base}/layers`)).body.length;
    const notJson = await upload('x.geojson', Buffer.from('{"type": "FeatureCollection", '));
    expect(notJson.status).toBe(400);
    // The parser's offset becomes a line and column an editor can jump to.
    expect(notJson.body.error.message).toMatch(/^x\.geojson is not valid JSON at line 1, column 3\d: /);
    const notFc = await upload('x.geojson', Buffer.from('{"type":"Feature"}'));
    expect(notFc.body.error.message).toMatch(/is not a GeoJSON FeatureCollection/);
    const outside = await upload('x.geojson', fc([block(-101, -32.6, 'ok'), block(200, 10, 'bad')]));
    expect(outside.body.error.message).toBe(
      'Feature 2 has a position (200, 10) outside longitude −180..180 / latitude −90..90; GeoJSON is WGS 84 lon/lat.',
    );
    const bow = {
      type: 'Feature',
      properties: {},
      geometry: {
        type: 'Polygon',
        coordinates: [
          [
            [-101, -32.5],
            [-100.9, -32.4],
            [-100.9, -32.5],
            [-101, -32.4],
            [-101, -32.5],
          ],
        ],
      },
    };
    const invalid = await upload('x.geojson', fc([block(-101, -32.6, 'ok'), bow]));
    expect(invalid.status).toBe(400);
    // The two diagonals of the bow-tie cross at (−100.95, −32.45).
    expect(invalid.body.error.message).toBe('Feature 2 is not a valid geometry: its outline crosses itself near lon -100.95, lat -32.45.');
    const badColour = await upload('x.geojson', fc([block(-101, -32.6, 'ok')]), { name: 'c', color: 'red' });
    expect(badColour.body.error.details[0]).toEqual({ path: 'color', message: 'must be a colour like #3a7bd5' });
    expect((await team.agent.get(`${base}/layers`)).body.length).toBe(before);
  });

  it('refuses a file over the size limit and one with too many features, storing nothing', async () => {
    const before = (await team.agent.get(`${base}/layers`)).body.length;
    // 20 MB is MAX_LAYER_BYTES in server/features/layers/readLayerFile.ts; one byte more is refused by multer.
    const huge = Buffer.alloc(20 * 1024 * 1024 + 1, 0x20);
    const tooBig = await upload('huge.geojson', huge);
    expect(tooBig.status).toBe(413);
    expect(tooBig.body.error).toMatchObject({ code: 'file_too_large', message: 'The layer file is larger than the 20 MB limit.' });
    const point = { type: 'Feature', properties: {}, geometry: { type: 'Point', coordinates: [-101, -32.5] } };
    const many = await upload('many.geojson', fc(Array.from({ length: 50_001 }, () => point)));
    expect(many.status).toBe(400);
    expect(many.body.error.message).toBe('many.geojson has 50,001 features; the limit is 50,000.');
    const nameless = await upload('x.geojson', fc([block(-101, -32.6, 'ok')]), { name: '  ' });
    expect(nameless.body.error.details[0]).toEqual({ path: 'name', message: 'is required' });
    expect((await team.agent.get(`${base}/layers`)).body.length).toBe(before);
  });

  it('serves the layer as vector tiles holding the uploaded features, and only roles with the grant may upload', async () => {
    const layers = (await team.agent.get(`${base}/layers`)).body;
    const blocks = layers.find((l: { name: string }) => l.name === 'Lease blocks');
    // z8 tile holding −101°, −32.55° (OpenStreetMap slippy-map formula: x = 56, y = 152)
    const tile = await team.agent
      .get(`${base}/tiles/reference-${blocks.id}/8/56/152.mvt`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(tile.status).toBe(200);
    expect(tile.headers['content-type']).toBe('application/vnd.mapbox-vector-tile');
    // Decoded with @mapbox/vector-tile, the reader MapLibre itself uses.
    const decoded = new VectorTile(new PbfReader(tile.body as Buffer));
    const layer = decoded.layers.reference;
    expect(layer.length).toBe(2);
    const features = Array.from({ length: layer.length }, (_, i) => layer.feature(i));
    expect(features.map((f) => f.properties.name).sort()).toEqual(['Q-17', 'Q-18']);
    expect(features.every((f) => f.type === 3)).toBe(true);
    // Q-17 back in lon/lat: its corners within a z8 tile unit (~40 m) of where they were uploaded.
    const q17 = features.find((f) => f.properties.name === 'Q-17')!.toGeoJSON(56, 152, 8) as { geometry: { coordinates: number[][][] } };
    const lons = q17.geometry.coordinates[0].map((p) => p[0]);
    const lats = q17.geometry.coordinates[0].map((p) => p[1]);
    expect(Math.min(...lons)).toBeCloseTo(-101, 3);
    expect(Math.max(...lons)).toBeCloseTo(-100.9, 3);
    expect(Math.min(...lats)).toBeCloseTo(-32.6, 3);
    expect(Math.max(...lats)).toBeCloseTo(-32.5, 3);
    // One label point per named block, inside it (turf's point-in-polygon as the independent check).
    const labels = decoded.layers['reference-labels'];
    expect(labels.length).toBe(2);
    for (let i = 0; i < labels.length; i++) {
      const point = labels.feature(i).toGeoJSON(56, 152, 8) as { geometry: { coordinates: number[] } };
      const name = String(labels.feature(i).properties.name);
      const west = name === 'Q-17' ? -101 : -100.9;
      expect(booleanPointInPolygon(point.geometry.coordinates, polygon(block(west, -32.6, name).geometry.coordinates))).toBe(true);
    }
    // A tile away from the blocks holds nothing of them.
    expect((await team.agent.get(`${base}/tiles/reference-${blocks.id}/8/0/0.mvt`)).status).toBe(204);
    const planner = await memberAgent(ctx, team.teamId, 'planner');
    const refused = await planner.agent
      .post(`${base}/layers`)
      .field('name', 'p')
      .attach('file', fc([block(-101, -32.6, 'p')]), 'p.geojson');
    expect(refused.status).toBe(403);
  });
});
