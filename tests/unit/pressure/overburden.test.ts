import { describe, expect, it } from 'vitest';
import { convert, overburden } from '@shared/pressure';

const g = 9.80665; // standard gravity (3rd CGPM, 1901)

describe('overburden', () => {
  it('offshore: air gap adds nothing, seawater to the mudline, then constant sediment (analytic)', () => {
    // S_v = g ∫ ρ dz (docs/sources.md [overburden]): 25 m air, 1000 m of 1025 kg/m3 water,
    // then 2000 kg/m3: S(z) = 1025·g·1000 + 2000·g·(z − 1025) below the mudline at 1025 m.
    const depthM = [0, 25, 525, 1025, 1525, 3025];
    const s = overburden({ depthM, densityKgM3: 2000, waterDepthM: 1000, airGapM: 25 });
    const expected = [0, 0, 1025 * g * 500, 1025 * g * 1000, 1025 * g * 1000 + 2000 * g * 500, 1025 * g * 1000 + 2000 * g * 2000];
    expect(s).toBeInstanceOf(Float64Array);
    s.forEach((v, i) => expect(v).toBeCloseTo(expected[i], 4));
  });

  it('integrates a linear density ramp exactly (trapezoid rule is exact for linear ρ)', () => {
    // ρ(z) = 1800 + 0.5·z below a land surface: ∫0^z ρ = 1800 z + 0.25 z².
    const depthM = Array.from({ length: 31 }, (_, i) => i * 100);
    const densityKgM3 = depthM.map((z) => 1800 + 0.5 * z);
    const s = overburden({ depthM, densityKgM3 });
    depthM.forEach((z, i) => expect(s[i]).toBeCloseTo(g * (1800 * z + 0.25 * z * z), 3));
  });

  it('bridges NaN density samples linearly', () => {
    const depthM = [0, 1000, 2000, 3000];
    const full = overburden({ depthM, densityKgM3: [2000, 2200, 2400, 2600] });
    const gappy = overburden({ depthM, densityKgM3: [2000, NaN, NaN, 2600] });
    gappy.forEach((v, i) => expect(v).toBeCloseTo(full[i], 4));
  });

  it('uses the first sample below the mudline for the interval above it', () => {
    // Density log starts 500 m below a 1000 m mudline: 1025·g·1000 + 2100·g·500 there.
    const s = overburden({ depthM: [1200, 1500, 2000], densityKgM3: [NaN, 2100, 2300], waterDepthM: 1000 });
    expect(s[0]).toBeCloseTo(1025 * g * 1000 + 2100 * g * 200, 4);
    expect(s[1]).toBeCloseTo(1025 * g * 1000 + 2100 * g * 500, 4);
    expect(s[2]).toBeCloseTo(1025 * g * 1000 + 2100 * g * 500 + 2200 * g * 500, 4);
  });

  it('reproduces the 1.0 psi/ft rule of thumb for 2.31 g/cc', () => {
    // Rule of thumb 1.0 psi/ft ≈ 2.31 g/cc (common practice, no source; docs/sources.md [overburden]).
    const s = overburden({ depthM: [0, 3048], densityKgM3: 2310 });
    expect(convert(s[1], 'Pa', 'psi') / 10_000).toBeCloseTo(1.0, 2);
  });

  it('rejects bad input with exact messages', () => {
    expect(() => overburden({ depthM: [0, 200, 100], densityKgM3: 2000 })).toThrow(
      new Error('overburden: depthM must be sorted ascending (depthM[2] = 100 after 200)'),
    );
    expect(() => overburden({ depthM: [0, 100], densityKgM3: [2000] })).toThrow(
      new Error('overburden: densityKgM3 has length 1 but depthM has length 2'),
    );
    expect(() => overburden({ depthM: [500, 1500], densityKgM3: [2000, NaN], waterDepthM: 1000 })).toThrow(
      new Error('overburden: densityKgM3 has no valid sample below the mudline (1000 m)'),
    );
    expect(() => overburden({ depthM: [0, 100], densityKgM3: [2000, -1] })).toThrow(
      new Error('overburden: densityKgM3[1] must be > 0 (got -1)'),
    );
    expect(() => overburden({ depthM: [0, 100], densityKgM3: 2000, waterDepthM: -10 })).toThrow(
      new Error('overburden: waterDepthM must be >= 0 (got -10)'),
    );
  });
});
