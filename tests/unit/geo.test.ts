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
