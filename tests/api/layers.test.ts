import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshTeamAgent, memberAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let team: Awaited<ReturnType<typeof freshTeamAgent>>;
let base: string;

const block = (lon: number, lat: number, name: string) => ({
  type: 'Feature',
  properties: { name },
  geometry: { type: 'Polygon', coordinates: [[[lon, lat], [lon + 0.1, lat], [lon + 0.1, lat + 0.1], [lon, lat + 0.1], [lon, lat]]] },
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
    expect(notJson.body.error.message).toMatch(/^x.geojson is not valid JSON/);
    const notFc = await upload('x.geojson', Buffer.from('{"type":"Feature"}'));
    expect(notFc.body.error.message).toMatch(/is not a GeoJSON FeatureCollection/);
    const outside = await upload('x.geojson', fc([block(-101, -32.6, 'ok'), block(200, 10, 'bad')]));
    expect(outside.body.error.message).toBe('Feature 2 has a position (200, 10) outside longitude −180..180 / latitude −90..90; GeoJSON is WGS 84 lon/lat.');
    const bow = { type: 'Feature', properties: {}, geometry: { type: 'Polygon', coordinates: [[[-101, -32.5], [-100.9, -32.4], [-100.9, -32.5], [-101, -32.4], [-101, -32.5]]] } };
    const invalid = await upload('x.geojson', fc([block(-101, -32.6, 'ok'), bow]));
    expect(invalid.status).toBe(400);
    expect(invalid.body.error.message).toMatch(/^Feature 2 is not a valid geometry: Self-intersection/);
    const badColour = await upload('x.geojson', fc([block(-101, -32.6, 'ok')]), { name: 'c', color: 'red' });
    expect(badColour.body.error.details[0]).toEqual({ path: 'color', message: 'must be a colour like #3a7bd5' });
    expect((await team.agent.get(`${base}/layers`)).body.length).toBe(before);
  });

  it('serves the layer as vector tiles, and only roles with the grant may upload', async () => {
    const layers = (await team.agent.get(`${base}/layers`)).body;
    const blocks = layers.find((l: { name: string }) => l.name === 'Lease blocks');
    // z8 tile holding −101°, −32.55° (OpenStreetMap slippy-map formula: x = 56, y = 152)
    const tile = await team.agent.get(`${base}/tiles/reference-${blocks.id}/8/56/152.mvt`);
    expect(tile.status).toBe(200);
    const planner = await memberAgent(ctx, team.teamId, 'planner');
    const refused = await planner.agent.post(`${base}/layers`).field('name', 'p').attach('file', fc([block(-101, -32.6, 'p')]), 'p.geojson');
    expect(refused.status).toBe(403);
  });
});
