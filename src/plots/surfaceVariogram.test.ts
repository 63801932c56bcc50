import { describe, expect, it } from 'vitest';
import { experimentalMarks, risesPastSill, variogramCurve, variogramMaxLagM } from './surfaceVariogram';

// Model formulas with practical range a (Deutsch & Journel 1998, GSLIB, 2nd ed., §II.3):
// spherical γ = c0 + c(1.5 h/a − 0.5 (h/a)³) for h < a; exponential γ = c0 + c(1 − e^(−3h/a)).
describe('variogramCurve', () => {
  it('samples the spherical model evenly in km, from zero to the sill', () => {
    const curve = variogramCurve({ model: 'spherical', nugget: 10, sill: 100, range: 10_000 }, 20_000, 5);
    expect(curve.map((p) => p.lagKm)).toEqual([0, 5, 10, 15, 20]);
    expect(curve[0].gammaM2).toBe(0); // γ(0) = 0, the nugget is a jump just after
    expect(curve[1].gammaM2).toBeCloseTo(10 + 100 * 0.6875, 10); // 1.5·0.5 − 0.5·0.125 = 0.6875
    expect(curve[2].gammaM2).toBeCloseTo(110, 10);
    expect(curve[4].gammaM2).toBeCloseTo(110, 10);
  });

  it('reaches 95 % of the sill at the practical range of the exponential model', () => {
    const curve = variogramCurve({ model: 'exponential', nugget: 0, sill: 100, range: 8000 }, 8000, 2);
    expect(curve[1].gammaM2).toBeCloseTo(100 * (1 - Math.exp(-3)), 8); // 95.02
  });

  it('refuses a non-positive lag span', () => {
    expect(() => variogramCurve({ model: 'gaussian', nugget: 0, sill: 1, range: 1 }, 0)).toThrow(
      'maxLagM must be a positive distance, got 0',
    );
  });
});

describe('experimentalMarks', () => {
  it('makes circle area proportional to the pair count', () => {
    const marks = experimentalMarks(
      [
        { lagM: 2000, gamma: 50, pairs: 100 },
        { lagM: 4000, gamma: 80, pairs: 25 },
      ],
      [1, 9],
    );
    expect(marks[0]).toMatchObject({ lagKm: 2, gammaM2: 50, pairs: 100 });
    expect(marks[0].radiusPx).toBeCloseTo(9, 10);
    // A quarter of the pairs → a quarter of the area → half the radius.
    expect(marks[1].radiusPx).toBeCloseTo(4.5, 10);
  });
});

describe('variogramMaxLagM', () => {
  it('stops at twice the last lag when the range lies far beyond the data', () => {
    expect(
      variogramMaxLagM({
        model: { model: 'spherical', nugget: 0, sill: 1, range: 100_000 },
        experimental: [{ lagM: 25_000, gamma: 1, pairs: 3 }],
        fitted: true,
      }),
    ).toBeCloseTo(55_000, 6);
  });

  it('reaches 10 % past the longer of the last lag and the range', () => {
    expect(
      variogramMaxLagM({
        model: { model: 'spherical', nugget: 0, sill: 1, range: 9000 },
        experimental: [{ lagM: 12_000, gamma: 1, pairs: 3 }],
        fitted: true,
      }),
    ).toBeCloseTo(13_200, 6);
  });
});

describe('risesPastSill', () => {
  const base = { model: { model: 'spherical' as const, nugget: 0, sill: 100, range: 10_000 }, fitted: true };
  it('flags experimental points well above the total sill past the range, and nothing else', () => {
    expect(
      risesPastSill({
        ...base,
        experimental: [
          { lagM: 5000, gamma: 80, pairs: 20 },
          { lagM: 15_000, gamma: 450, pairs: 30 },
        ],
      }),
    ).toBe(true);
    expect(
      risesPastSill({
        ...base,
        experimental: [
          { lagM: 5000, gamma: 80, pairs: 20 },
          { lagM: 15_000, gamma: 110, pairs: 30 },
        ],
      }),
    ).toBe(false);
    expect(risesPastSill({ ...base, experimental: [{ lagM: 5000, gamma: 90, pairs: 20 }] })).toBe(false);
    // The fit bounds the range at the last lag: then the outer third of the lags is read (an EMW run looked like this).
    const bounded = { ...base, model: { ...base.model, sill: 0.0116, range: 30_000 } };
    const lags = [3000, 9000, 15_000, 21_000, 27_000, 30_000].map((lagM, k) => ({ lagM, gamma: 0.004 + 0.02 * k, pairs: 20 }));
    expect(risesPastSill({ ...bounded, experimental: lags })).toBe(true);
  });
});
