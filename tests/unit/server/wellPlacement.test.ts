import { describe, expect, it } from 'vitest';
import { offshoreFromWaterDepth, placeWell } from '../../../server/features/imports/wellPlacement';

describe('placeWell: where a CSV row or a LAS file puts its well', () => {
  it('converts UTM easting/northing to lon/lat', () => {
    // UTM zone 31N: the central meridian is 3°E and lies at false easting 500 000 m; northing 0 is the equator (NGA/USGS UTM convention, recalled from memory).
    const at = placeWell(500_000, 0, 32631);
    expect('lon' in at && at.lon).toBeCloseTo(3, 9);
    expect('lat' in at && at.lat).toBeCloseTo(0, 9);
  });

  it('keeps lon/lat as given and names the axis that is wrong', () => {
    expect(placeWell(-101, -32.5, 4326)).toEqual({ lon: -101, lat: -32.5 });
    expect(placeWell(-32.5, -101, 4326)).toEqual({
      axis: 'y',
      message: 'latitude -101 is outside −90..90: are longitude and latitude swapped?',
    });
    expect(placeWell(500_000, 4_000_000, 4326)).toMatchObject({ axis: 'y' });
    expect(placeWell(200, 10, 4326)).toMatchObject({ axis: 'x', message: expect.stringMatching(/^longitude 200 is outside/) });
  });

  it('refuses an unsupported EPSG code and a swapped UTM pair on the x column', () => {
    expect(placeWell(1, 2, 2154)).toMatchObject({ axis: 'x', message: expect.stringMatching(/^EPSG:2154 is not supported/) });
    // Northing 3 600 000 given as easting lands far outside zone 14's 6° band.
    expect(placeWell(3_600_000, 500_000, 32614)).toMatchObject({ axis: 'x' });
  });
});

describe('offshoreFromWaterDepth', () => {
  it('takes what the file states, else a positive water depth, else unknown', () => {
    expect(offshoreFromWaterDepth(120)).toBe(true);
    expect(offshoreFromWaterDepth(0)).toBe(false);
    expect(offshoreFromWaterDepth(null)).toBeNull();
    expect(offshoreFromWaterDepth(120, false)).toBe(false);
    expect(offshoreFromWaterDepth(null, true)).toBe(true);
  });
});
