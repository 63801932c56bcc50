import proj4 from 'proj4';
import { describe, expect, it } from 'vitest';
import { checkLonLat, toLonLat } from '../../shared/geo/crs';

describe('coordinate conversion to WGS 84', () => {
  it('puts the UTM false easting on the zone central meridian', () => {
    // UTM definition: zone 31 central meridian 3°E, false easting 500 000 m (NGA/USGS UTM convention, value recalled from memory)
    const p = toLonLat(500_000, 0, 32631);
    expect(p.lon).toBeCloseTo(3, 9);
    expect(p.lat).toBeCloseTo(0, 9);
  });

  it('agrees with proj4 itself for a southern-hemisphere UTM point', () => {
    const ref = proj4('+proj=utm +zone=33 +south +datum=WGS84 +units=m +no_defs', 'EPSG:4326', [412_345, 9_512_345]);
    const p = toLonLat(412_345, 9_512_345, 32733);
    expect(p.lon).toBeCloseTo(ref[0], 10);
    expect(p.lat).toBeCloseTo(ref[1], 10);
  });

  it('names an unsupported EPSG code and a point outside the world', () => {
    expect(() => toLonLat(1, 2, 27700)).toThrow(/^EPSG:27700 is not supported/);
    expect(() => toLonLat(200, 10, 4326)).toThrow(/outside the world/);
  });

  it('flags swapped and out-of-range lon/lat', () => {
    expect(checkLonLat(4.5, 52.1)).toBeNull();
    expect(checkLonLat(52.1, 104.5)).toMatch(/swapped/);
    expect(checkLonLat(190, 10)).toMatch(/outside −180..180/);
  });
});

describe('UTM points that cannot belong to their zone', () => {
  // The reference coordinates are proj4's own forward projection (proj4 npm package, the library the import uses).
  const utm33s = '+proj=utm +zone=33 +south +datum=WGS84 +units=m +no_defs';
  const utm31n = '+proj=utm +zone=31 +datum=WGS84 +units=m +no_defs';

  it('accepts a point inside its zone, and one just over the zone edge', () => {
    const [e, n] = proj4('EPSG:4326', utm33s, [14.2, -8.7]);
    const p = toLonLat(e, n, 32733);
    expect(p.lon).toBeCloseTo(14.2, 8);
    expect(p.lat).toBeCloseTo(-8.7, 8);
    // Zone 33 spans 12°E–18°E; 19°E is 4° from its 15°E central meridian: still accepted.
    const [e2, n2] = proj4('EPSG:4326', utm33s, [19, -8.7]);
    expect(toLonLat(e2, n2, 32733).lon).toBeCloseTo(19, 8);
  });

  it('flags easting and northing swapped, saying they may be swapped', () => {
    const [e, n] = proj4('EPSG:4326', utm33s, [14.2, -8.7]);
    expect(() => toLonLat(n, e, 32733)).toThrow(/from the zone 33 central meridian \(15°E\): are easting and northing swapped/);
  });

  it('flags a point far outside its zone', () => {
    // proj4 projects 25°E into zone 33 without complaint; it is 10° from the central meridian.
    const [e, n] = proj4('EPSG:4326', utm33s, [25, -8.7]);
    expect(() => toLonLat(e, n, 32733)).toThrow(/10\.0° from the zone 33 central meridian/);
  });

  it('flags the wrong hemisphere for an N or S zone', () => {
    // A swapped pair in zone 31N: proj4 gives a southern latitude for the negative "northing".
    const [e, n] = proj4('EPSG:4326', utm31n, [2.5, -12]);
    expect(proj4(utm31n, 'EPSG:4326', [e, n])[1]).toBeCloseTo(-12, 8);
    expect(() => toLonLat(e, n, 32631)).toThrow(/south of the equator, but zone 31N is for the northern hemisphere/);
    const [e2, n2] = proj4('EPSG:4326', utm33s, [14, 3]);
    expect(() => toLonLat(e2, n2, 32733)).toThrow(/north of the equator, but zone 33S is for the southern hemisphere/);
  });
});
