import { FT_M } from '../units/constants';
import type { Numeric, ResultOf } from '../units/convert';
import { commonLength, mapSamples, param, sampleAt } from './inputs';

/**
 * Gardner's coefficient for V in m/s, derived from the published 0.23·V[ft/s]^0.25 g/cc
 * (Gardner, Gardner & Gregory 1974, Geophysics 39, 770–780): 0.23·0.3048^−0.25 ≈ 0.3095.
 * The often-quoted 0.31 is this number rounded; pass `a: 0.31` to reproduce it.
 */
export const GARDNER_A_METRIC = 0.23 * FT_M ** -0.25;

export interface GardnerOptions {
  /** g/cc per (m/s)^b; default GARDNER_A_METRIC (≈ 0.3095). */
  a?: number;
  /** Exponent; default 0.25. */
  b?: number;
}

/**
 * Bulk density from P-wave velocity, ρ = a·V^b g/cc with V in m/s (Gardner et al. 1974), in kg/m3.
 * @example
 * gardnerDensity(3048); // ≈ 2300 kg/m3 (10,000 ft/s → 2.300 g/cc)
 */
export function gardnerDensity<V extends Numeric>(velocityMs: V, opts: GardnerOptions = {}): ResultOf<V> {
  const fn = 'gardnerDensity';
  const a = param(fn, 'a', opts.a ?? GARDNER_A_METRIC, { gt: 0 });
  const b = param(fn, 'b', opts.b ?? 0.25, { gt: 0 });
  const n = commonLength(fn, { velocityMs });
  return mapSamples(n, (i) => 1000 * a * sampleAt(fn, 'velocityMs', velocityMs, i, 'positive') ** b) as ResultOf<V>;
}

/**
 * Shale compaction constants of Sclater & Christie (1980), JGR 85: φ0 = 0.63, c = 0.51 /km;
 * grain density 2720 kg/m3 from the same paper (value recalled from memory).
 */
export const SHALE_COMPACTION = { phi0: 0.63, cPerM: 0.51e-3, grainKgM3: 2720 } as const;

/**
 * Athy (1930, AAPG Bulletin 14, 1–24) porosity trend φ = φ0·exp(−c·z), z below the mudline.
 * @example
 * athyPorosity(1000, 0.63, 0.51e-3); // ≈ 0.378
 */
export function athyPorosity<Z extends Numeric>(depthBelowMudlineM: Z, phi0: number, cPerM: number): ResultOf<Z> {
  const fn = 'athyPorosity';
  param(fn, 'phi0', phi0, { min: 0, max: 1 });
  param(fn, 'cPerM', cPerM, { min: 0 });
  const n = commonLength(fn, { depthBelowMudlineM });
  return mapSamples(n, (i) => phi0 * Math.exp(-cPerM * sampleAt(fn, 'depthBelowMudlineM', depthBelowMudlineM, i, 'depth'))) as ResultOf<Z>;
}

/**
 * Bulk density of a fluid-filled rock, ρ_b = φ·ρ_f + (1 − φ)·ρ_grain, kg/m3.
 * @example
 * bulkDensityFromPorosity(0.3, 2650, 1030); // 2164 kg/m3
 */
export function bulkDensityFromPorosity<P extends Numeric>(phi: P, grainKgM3: number, fluidKgM3: number): ResultOf<P> {
  const fn = 'bulkDensityFromPorosity';
  param(fn, 'grainKgM3', grainKgM3, { gt: 0 });
  param(fn, 'fluidKgM3', fluidKgM3, { min: 0 });
  const n = commonLength(fn, { phi });
  return mapSamples(n, (i) => {
    const p = sampleAt(fn, 'phi', phi, i, 'fraction');
    return p * fluidKgM3 + (1 - p) * grainKgM3;
  }) as ResultOf<P>;
}

export interface CompactionDensityOptions {
  phi0: number;
  cPerM: number;
  grainKgM3: number;
  fluidKgM3: number;
}

/**
 * Bulk density of a normally compacted column, Athy porosity mixed with grain and pore fluid.
 * Handy for synthetic wells: feed the result to `overburden`.
 * @example
 * compactionDensity([0, 1000, 3000], { ...SHALE_COMPACTION, fluidKgM3: 1030 }); // ≈ [1655, 2081, 2489]
 */
export function compactionDensity<Z extends Numeric>(depthBelowMudlineM: Z, opts: CompactionDensityOptions): ResultOf<Z> {
  const phi: Numeric = athyPorosity(depthBelowMudlineM as Numeric, opts.phi0, opts.cPerM);
  return bulkDensityFromPorosity(phi, opts.grainKgM3, opts.fluidKgM3) as ResultOf<Z>;
}
