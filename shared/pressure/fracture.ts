import { G } from '../units/constants';
import type { Numeric, ResultOf } from '../units/convert';
import { commonLength, mapSamples, sampleAt } from './inputs';

/**
 * Fracture pressure (Pa, or any consistent unit, absolute or per depth) as minimum horizontal stress,
 * F = K·(S − P) + P, with K the ratio of horizontal to vertical effective stress of each method.
 */
function fractureFromK(fn: string, overburdenPa: Numeric, porePa: Numeric, kOf: (i: number) => number, n: number) {
  return mapSamples(n, (i) => {
    const s = sampleAt(fn, 'overburdenPa', overburdenPa, i, 'curve');
    const p = sampleAt(fn, 'porePa', porePa, i, 'curve');
    return kOf(i) * (s - p) + p;
  });
}

export interface FractureEatonInput {
  overburdenPa: Numeric;
  porePa: Numeric;
  /** Poisson's ratio, 0 <= ν < 0.5 (one value or a curve). */
  poisson: Numeric;
}

/**
 * Eaton (1969, JPT 21(10), 1353; SPE 2163): F = ν/(1 − ν)·(S − P) + P.
 * @example
 * // 12,000 ft, S/D 0.96 psi/ft, pore 12 ppg (0.6234 psi/ft), ν 0.47 → ≈ 0.922 psi/ft
 * fractureEaton({ overburdenPa: 0.96, porePa: 12 * 12 / 231, poisson: 0.47 }); // 0.9219
 */
export function fractureEaton<I extends FractureEatonInput>(input: I): ResultOf<I[keyof I]> {
  const fn = 'fractureEaton';
  const { overburdenPa, porePa, poisson } = input;
  const n = commonLength(fn, { overburdenPa, porePa, poisson });
  return fractureFromK(
    fn,
    overburdenPa,
    porePa,
    (i) => {
      const nu = sampleAt(fn, 'poisson', poisson, i, 'nonNegative');
      if (nu >= 0.5) throw new Error(`${fn}: poisson must be < 0.5 (got ${nu})`);
      return nu / (1 - nu);
    },
    n,
  ) as ResultOf<I[keyof I]>;
}

export interface FractureMatthewsKellyInput {
  overburdenPa: Numeric;
  porePa: Numeric;
  /** Matrix stress coefficient K_i (from the published depth chart, calibrated to leak-off tests). */
  ki: Numeric;
}

/**
 * Matthews & Kelly (1967, Oil & Gas Journal): F = K_i·(S − P) + P.
 * @example
 * fractureMatthewsKelly({ overburdenPa: 70e6, porePa: 40e6, ki: 0.7 }); // 61e6
 */
export function fractureMatthewsKelly<I extends FractureMatthewsKellyInput>(input: I): ResultOf<I[keyof I]> {
  const fn = 'fractureMatthewsKelly';
  const { overburdenPa, porePa, ki } = input;
  const n = commonLength(fn, { overburdenPa, porePa, ki });
  return fractureFromK(fn, overburdenPa, porePa, (i) => sampleAt(fn, 'ki', ki, i, 'nonNegative'), n) as ResultOf<I[keyof I]>;
}

export interface FractureHubbertWillisInput {
  overburdenPa: Numeric;
  porePa: Numeric;
  /** 'min': σ_h' = σ_v'/3; 'max': σ_h' = σ_v'/2 (the two bounds of Hubbert & Willis). */
  bound: 'min' | 'max';
}

/**
 * Hubbert & Willis (1957, Trans. AIME 210): F_min = (S − P)/3 + P, i.e. (S + 2P)/3; F_max = (S − P)/2 + P.
 * @example
 * fractureHubbertWillis({ overburdenPa: 1, porePa: 0.735, bound: 'min' }); // 0.8233 (psi/ft in, psi/ft out)
 */
export function fractureHubbertWillis<I extends FractureHubbertWillisInput>(input: I): ResultOf<I[keyof I]> {
  const fn = 'fractureHubbertWillis';
  const { overburdenPa, porePa, bound } = input;
  if (bound !== 'min' && bound !== 'max') throw new Error(`${fn}: bound must be "min" or "max" (got "${String(bound)}")`);
  const k = bound === 'min' ? 1 / 3 : 1 / 2;
  const n = commonLength(fn, { overburdenPa, porePa });
  return fractureFromK(fn, overburdenPa, porePa, () => k, n) as ResultOf<I[keyof I]>;
}

export interface MaxAllowableMudWeightInput {
  /** Mud density in the hole during the leak-off or formation-integrity test, kg/m3. */
  testMudKgM3: Numeric;
  /** Surface pressure at leak-off (or the FIT limit), Pa. */
  surfacePressurePa: Numeric;
  /** TVD of the casing shoe from the same datum as the mud column, m. */
  shoeTvdM: Numeric;
}

/**
 * Maximum allowable mud weight from a shoe test: MW_test + p_surface/(g·TVD_shoe), kg/m3
 * (in oilfield units MW_test + p_surface/(0.051948·TVD_shoe) ppg).
 * @example
 * // 10 ppg test mud, 800 psi at a 5000 ft shoe → 13.08 ppg
 * maxAllowableMudWeight({ testMudKgM3: 1198.26, surfacePressurePa: 5.516e6, shoeTvdM: 1524 }); // ≈ 1567 kg/m3
 */
export function maxAllowableMudWeight<I extends MaxAllowableMudWeightInput>(input: I): ResultOf<I[keyof I]> {
  const fn = 'maxAllowableMudWeight';
  const { testMudKgM3, surfacePressurePa, shoeTvdM } = input;
  const n = commonLength(fn, { testMudKgM3, surfacePressurePa, shoeTvdM });
  return mapSamples(n, (i) => {
    const rho = sampleAt(fn, 'testMudKgM3', testMudKgM3, i, 'positive');
    const p = sampleAt(fn, 'surfacePressurePa', surfacePressurePa, i, 'nonNegative');
    const z = sampleAt(fn, 'shoeTvdM', shoeTvdM, i, 'positive');
    return rho + p / (G * z);
  }) as ResultOf<I[keyof I]>;
}
