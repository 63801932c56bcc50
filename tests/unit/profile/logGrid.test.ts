import { describe, expect, it } from 'vitest';
import { alignLogs, bridgeGaps, interpolateAt, wellDatums } from '@shared/profile';

describe('alignLogs', () => {
  it('a well without a survey is vertical: TVD = MD; g/cc becomes kg/m3 and null a gap', () => {
    const a = alignLogs(
      [
        { role: 'sonic', unit: 'us/ft', mdM: [1000, 1001, 1002], values: [120, null, 118] },
        { role: 'density', unit: 'g/cc', mdM: [1000, 1002], values: [2.3, 2.4] },
      ],
      [],
    );
    expect(Array.from(a.tvdM)).toEqual([1000, 1001, 1002]);
    expect(a.logs.sonicUsFt![1]).toBeNaN();
    // density resampled linearly onto the sonic's grid: 2.35 g/cc at 1001 m = 2350 kg/m3
    expect(a.logs.densityKgM3![1]).toBeCloseTo(2350, 9);
  });

  it('TVD by minimum curvature: a quarter circle of 300 m ends at TVD 600/π', () => {
    // 0° to 90° inclination over 300 m MD is a circular arc of radius 600/π ≈ 190.99 m (exact geometry).
    const stations = [
      { mdM: 0, incDeg: 0, aziDeg: 90 },
      { mdM: 300, incDeg: 90, aziDeg: 90 },
    ];
    const a = alignLogs([{ role: 'gamma', unit: 'gAPI', mdM: [150, 300], values: [80, 90] }], stations);
    expect(a.tvdM[1]).toBeCloseTo(600 / Math.PI, 6);
    // half-way along the arc: R·sin(45°)
    expect(a.tvdM[0]).toBeCloseTo((600 / Math.PI) * Math.SQRT1_2, 6);
  });

  it('converts µs/m sonic to µs/ft (1 ft = 0.3048 m) and drops non-positive readings', () => {
    const a = alignLogs([{ role: 'sonic', unit: 'us/m', mdM: [1, 2], values: [328.084, -999.25] }], []);
    expect(a.logs.sonicUsFt![0]).toBeCloseTo(100, 3);
    expect(a.logs.sonicUsFt![1]).toBeNaN();
  });

  it('rejects an unknown unit and a second curve of one role', () => {
    expect(() => alignLogs([{ role: 'density', unit: 'lb/ft3', mdM: [1], values: [1] }], [])).toThrow(
      'alignLogs: unknown density unit "lb/ft3" (expected one of g/cc, g/cm3, kg/m3)',
    );
    const c = { role: 'gamma' as const, unit: 'API', mdM: [1], values: [1] };
    expect(() => alignLogs([c, c], [])).toThrow('alignLogs: more than one gamma curve given; choose one');
  });
});

describe('interpolation helpers', () => {
  it('interpolates linearly and never across a gap', () => {
    expect(interpolateAt([0, 10, 20], [0, 100, NaN], 2.5)).toBe(25);
    expect(interpolateAt([0, 10, 20], [0, 100, NaN], 15)).toBeNaN();
    expect(interpolateAt([0, 10], [0, 100], 11)).toBeNaN();
  });
  it('bridges inner gaps only', () => {
    expect(Array.from(bridgeGaps([0, 1, 2, 3, 4], [NaN, 10, NaN, 30, NaN]))).toEqual([NaN, 10, 20, 30, NaN]);
  });
});

describe('wellDatums', () => {
  it('sea level is the datum elevation; the mudline adds air gap and water depth', () => {
    expect(wellDatums({ datumElevationM: 25, waterDepthM: 100, airGapM: 25 })).toEqual({ seaLevelTvdM: 25, mudlineTvdM: 125 });
    expect(() => wellDatums({ datumElevationM: 25, waterDepthM: -1, airGapM: 25 })).toThrow(
      'wellDatums: waterDepthM must be >= 0 (got -1)',
    );
  });
});
