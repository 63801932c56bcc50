import { describe, expect, it } from 'vitest';
import { calibrateEatonExponent, calibrateFracture, type CalibrationProfile, type ProfileObservation } from '@shared/profile/index';
import { G, PSI_PA, FT_M, PPG_KGM3 } from '@shared/units/constants';
import { mulberry32 } from '@shared/random/mulberry32';

// A synthetic well in SI: overburden from a 2,300 kg/m³ column under 100 m of water, brine hydrostatic at 1,030 kg/m³,
// a sonic normal trend Δtₙ = 60 + 140·e^(−z/1500) µs/ft below the mudline and a log that departs from it below 2,500 m.
const MUDLINE_M = 100;
const tvdM = Float64Array.from({ length: 401 }, (_, i) => i * 10);
const overburdenPa = tvdM.map((z) => 1025 * G * Math.min(z, MUDLINE_M) + 2300 * G * Math.max(0, z - MUDLINE_M));
const hydrostaticPa = tvdM.map((z) => 1030 * G * z);
const normalTrend = tvdM.map((z) => (z < MUDLINE_M ? NaN : 60 + 140 * Math.exp(-(z - MUDLINE_M) / 1500)));
const sonic = tvdM.map((z, i) => normalTrend[i] * (1 + Math.max(0, (z - 2500) / 1500) * 0.35));

function profileWith(poreLog: Float64Array, poreFilledPa: Float64Array | null = null): CalibrationProfile {
  return { tvdM, mudlineTvdM: MUDLINE_M, overburdenPa, hydrostaticPa, normalTrend, poreLog, poreFilledPa };
}

/** Eaton (1975, SPE 5544): P = S − (S − Pₙ)·(Δtₙ/Δt)ⁿ, written out here to make the synthetic measurements. */
function eatonTruth(i: number, n: number): number {
  return overburdenPa[i] - (overburdenPa[i] - hydrostaticPa[i]) * (normalTrend[i] / sonic[i]) ** n;
}

const test = (tvd: number, valueSi: number, kind: ProfileObservation['kind'] = 'formation_test'): ProfileObservation => ({
  kind,
  quality: 'good',
  tvdM: tvd,
  valueSi,
});

describe('calibrateEatonExponent', () => {
  it('recovers the exponent of synthetic formation tests with noise', () => {
    const random = mulberry32(5);
    const depths = [1200, 1800, 2400, 2700, 2900, 3100, 3300, 3500, 3700, 3900];
    const tests = depths.map((z) => test(z, eatonTruth(z / 10, 3) + (random() - 0.5) * 0.6e6));
    const fit = calibrateEatonExponent(profileWith(sonic), tests, 'eaton-sonic');
    expect(fit.params!.exponent).toBeGreaterThan(2.85);
    expect(fit.params!.exponent).toBeLessThan(3.15);
    expect(fit.n).toBe(10);
    // uniform noise of ±0.3 MPa has an RMS of 0.3/√3 ≈ 0.17 MPa
    expect(fit.rmsPa).toBeLessThan(0.25e6);
    expect(fit.warnings).toEqual([]);
  });

  it('refuses tests that all sit on the normal trend, and warns when few constrain it', () => {
    const normal = [800, 1500, 2200].map((z) => test(z, hydrostaticPa[z / 10]));
    const none = calibrateEatonExponent(profileWith(sonic), normal, 'eaton-sonic');
    expect(none.params).toBeNull();
    expect(none.warnings[0]).toMatch(/within 5 % of its normal trend/);
    const one = calibrateEatonExponent(profileWith(sonic), [...normal, test(3600, eatonTruth(360, 2.5))], 'eaton-sonic');
    expect(one.params!.exponent).toBeCloseTo(2.5, 3);
    expect(one.warnings[0]).toBe(
      'Only 1 of the 4 tests sit where the log departs from its trend by more than 5 %: the exponent rests on it alone.',
    );
  });

  it('skips tests with no log at their depth and counts them', () => {
    const gappy = Float64Array.from(sonic, (v, i) => (i > 300 ? NaN : v));
    const fit = calibrateEatonExponent(profileWith(gappy), [test(2900, eatonTruth(290, 3)), test(3500, 1)], 'eaton-sonic');
    expect(fit.n).toBe(1);
    expect(fit.skipped).toBe(1);
    expect(fit.params!.exponent).toBeCloseTo(3, 3);
  });
});

describe('calibrateFracture', () => {
  it("gives back Eaton's Poisson's ratio from his worked example", () => {
    // Eaton 1969 (SPE 2163), as in shared/pressure/fracture.ts: 12,000 ft, S/D 0.96 psi/ft, pore 12 ppg, ν 0.47 → 0.9219 psi/ft
    const depthM = 12_000 * FT_M;
    const zs = Float64Array.from([0, depthM, depthM + 10]);
    const perM = (psiPerFt: number) => (psiPerFt * PSI_PA) / FT_M;
    const p = 12 * PPG_KGM3 * G;
    const profile: CalibrationProfile = {
      tvdM: zs,
      mudlineTvdM: 0,
      overburdenPa: zs.map((z) => perM(0.96) * z),
      hydrostaticPa: zs.map((z) => 1030 * G * z),
      normalTrend: null,
      poreLog: null,
      poreFilledPa: zs.map((z) => p * z),
    };
    const fit = calibrateFracture(profile, [test(depthM, perM(0.9219) * depthM, 'lot')], 'eaton');
    expect(fit.params).toMatchObject({ method: 'eaton', poissonGradientPerKm: 0 });
    expect((fit.params as { poissonTop: number }).poissonTop).toBeCloseTo(0.47, 3);
    expect(fit.warnings).toContain("The tests span 0 m: too little to fit a gradient of Poisson's ratio, so it is held at 0 per km.");
  });

  it("recovers a Poisson's ratio that rises with depth from noisy leak-off tests", () => {
    const random = mulberry32(8);
    const pore = hydrostaticPa;
    const depths = [800, 1300, 1900, 2400, 3000, 3600];
    const lots = depths.map((z) => {
      const i = z / 10;
      const nu = 0.35 + (0.04 * (z - MUDLINE_M)) / 1000;
      return test(z, (nu / (1 - nu)) * (overburdenPa[i] - pore[i]) + pore[i] + (random() - 0.5) * 0.2e6, 'lot');
    });
    const fit = calibrateFracture(profileWith(sonic, pore), [...lots, test(2000, 30e6, 'fit')], 'eaton');
    const params = fit.params as { poissonTop: number; poissonGradientPerKm: number };
    expect(params.poissonTop).toBeCloseTo(0.35, 2);
    expect(params.poissonGradientPerKm).toBeCloseTo(0.04, 2);
    expect(fit.n).toBe(6);
    expect(fit.warnings).toEqual(['1 formation integrity test(s) are lower bounds and were not fitted.']);
  });

  it('solves Matthews and Kelly’s Kᵢ in closed form', () => {
    // two tests by hand: S − P = 10 and 20 MPa, F − P = 7 and 15 MPa → Kᵢ = (10·7 + 20·15)/(10² + 20²) = 370/500 = 0.74
    const zs = Float64Array.from([0, 1000, 2000]);
    const profile: CalibrationProfile = {
      tvdM: zs,
      mudlineTvdM: 0,
      overburdenPa: Float64Array.from([0, 25e6, 45e6]),
      hydrostaticPa: Float64Array.from([0, 10e6, 20e6]),
      normalTrend: null,
      poreLog: null,
      poreFilledPa: Float64Array.from([0, 15e6, 25e6]),
    };
    const fit = calibrateFracture(profile, [test(1000, 22e6, 'lot'), test(2000, 40e6, 'lot')], 'matthews-kelly');
    expect((fit.params as { ki: number }).ki).toBeCloseTo(0.74, 12);
    // residuals 0.74·10 − 7 = 0.4 and 0.74·20 − 15 = −0.2 MPa → RMS √((0.16 + 0.04)/2) = 0.3162 MPa
    expect(fit.rmsPa).toBeCloseTo(Math.sqrt(0.1) * 1e6, 3);
  });

  it('says so when there is nothing to fit', () => {
    const fit = calibrateFracture(profileWith(sonic), [test(2000, 30e6, 'fit')], 'matthews-kelly');
    expect(fit.params).toBeNull();
    expect(fit.warnings[0]).toBe('No leak-off tests on this well to calibrate against.');
  });
});
