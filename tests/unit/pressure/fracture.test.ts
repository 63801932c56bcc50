import { describe, expect, it } from 'vitest';
import { convert, fractureEaton, fractureHubbertWillis, fractureMatthewsKelly, maxAllowableMudWeight } from '@shared/pressure';

const PSI_FT_PER_PPG = 12 / 231; // 0.051948 psi/ft per ppg, exact from 1 US gal = 231 in³ (US customary definition)

describe('fractureEaton', () => {
  it('reproduces the handbook example: 12,000 ft, 12 ppg pore, S/D 0.96, ν 0.47 → 0.92 psi/ft, 17.7 ppg', () => {
    // Eaton 1969, JPT 21(10) (SPE 2163): the worked example as drilling-engineering handbooks reproduce it
    // (values recalled from memory, not checked against a copy here); tolerance 0.5 %.
    const depthFt = 12_000;
    const S = convert(0.96 * depthFt, 'psi', 'Pa');
    const P = convert(12 * PSI_FT_PER_PPG * depthFt, 'psi', 'Pa');
    const F = fractureEaton({ overburdenPa: S, porePa: P, poisson: 0.47 });
    const gradient = convert(F, 'Pa', 'psi') / depthFt;
    expect(Math.abs(gradient / 0.92 - 1)).toBeLessThan(0.005);
    expect(Math.abs(gradient / PSI_FT_PER_PPG / 17.7 - 1)).toBeLessThan(0.005);
  });

  it('works on curves and rejects ν >= 0.5', () => {
    const F = fractureEaton({ overburdenPa: [1, 1], porePa: [0.465, 0.465], poisson: [0, 0.25] });
    expect(F[0]).toBeCloseTo(0.465, 12); // ν = 0: no horizontal load from the matrix
    expect(F[1]).toBeCloseTo(0.465 + (0.25 / 0.75) * 0.535, 12);
    expect(() => fractureEaton({ overburdenPa: 1, porePa: 0.5, poisson: 0.5 })).toThrow(
      new Error('fractureEaton: poisson must be < 0.5 (got 0.5)'),
    );
  });
});

describe('fractureHubbertWillis', () => {
  it('F_min at P/D = 0.735 psi/ft and S/D = 1 psi/ft is 0.8233 psi/ft', () => {
    // Hubbert & Willis 1957, Trans. AIME 210: F_min = (1 + 2P/D)/3 = (1 + 1.47)/3 = 0.82333 psi/ft.
    expect(fractureHubbertWillis({ overburdenPa: 1, porePa: 0.735, bound: 'min' })).toBeCloseTo(0.8233, 4);
  });

  it('F_max = (S − P)/2 + P', () => {
    // Hubbert & Willis 1957 upper bound: (1 − 0.735)/2 + 0.735 = 0.8675 psi/ft.
    expect(fractureHubbertWillis({ overburdenPa: 1, porePa: 0.735, bound: 'max' })).toBeCloseTo(0.8675, 12);
    expect(() => fractureHubbertWillis({ overburdenPa: 1, porePa: 0.7, bound: 'mid' as 'min' })).toThrow(
      new Error('fractureHubbertWillis: bound must be "min" or "max" (got "mid")'),
    );
  });
});

describe('fractureMatthewsKelly', () => {
  it('hand-computed: K_i = 0.6, S/D 1.0, P/D 0.465 → 0.786 psi/ft', () => {
    // Matthews & Kelly 1967: F/D = K_i (S − P)/D + P/D = 0.6 × 0.535 + 0.465 = 0.786.
    const depthFt = 8000;
    const F = fractureMatthewsKelly({
      overburdenPa: convert(depthFt, 'psi', 'Pa'),
      porePa: convert(0.465 * depthFt, 'psi', 'Pa'),
      ki: 0.6,
    });
    expect(convert(F, 'Pa', 'psi') / depthFt).toBeCloseTo(0.786, 9);
  });
});

describe('maxAllowableMudWeight', () => {
  it('10 ppg test mud, 800 psi at a 5000 ft shoe → 13.08 ppg', () => {
    // Leak-off test arithmetic as field practice states it (common practice, no single source): MW_max = MW_test + p_surface/(0.051948 × TVD_shoe) = 10 + 800/(0.051948 × 5000) = 13.080 ppg.
    const rho = maxAllowableMudWeight({
      testMudKgM3: convert(10, 'ppg', 'kg/m3'),
      surfacePressurePa: convert(800, 'psi', 'Pa'),
      shoeTvdM: convert(5000, 'ft', 'm'),
    });
    expect(convert(rho, 'kg/m3', 'ppg')).toBeCloseTo(10 + 800 / (PSI_FT_PER_PPG * 5000), 9);
    expect(convert(rho, 'kg/m3', 'ppg')).toBeCloseTo(13.08, 2);
  });

  it('rejects a zero shoe depth', () => {
    expect(() => maxAllowableMudWeight({ testMudKgM3: 1200, surfacePressurePa: 5e6, shoeTvdM: 0 })).toThrow(
      new Error('maxAllowableMudWeight: shoeTvdM must be > 0 (got 0)'),
    );
  });
});
