import { G } from '../units/constants';
import type { Numeric, ResultOf } from '../units/convert';
import { commonLength, mapSamples, param, sampleAt } from './inputs';

/**
 * Equivalent mud weight: the density whose static column from the depth datum gives `pressurePa`
 * at `tvdM`, EMW = p / (g·TVD). At TVD 0 the EMW is undefined and comes back NaN, so a log that
 * starts at the datum still converts; a NaN pressure stays NaN.
 * @example
 * emw(34_473_786, 3048); // ≈ 1153.3 kg/m3 (5000 psi at 10,000 ft ≈ 9.62 ppg)
 */
export function emw<P extends Numeric, Z extends Numeric>(pressurePa: P, tvdM: Z): ResultOf<P | Z> {
  const fn = 'emw';
  const n = commonLength(fn, { pressurePa, tvdM });
  return mapSamples(n, (i) => {
    const p = sampleAt(fn, 'pressurePa', pressurePa, i, 'curve');
    const z = sampleAt(fn, 'tvdM', tvdM, i, 'depth');
    return z === 0 ? NaN : p / (G * z);
  }) as ResultOf<P | Z>;
}

export interface HydrostaticOptions {
  /**
   * Depth (same datum as `tvdM`) where the fluid pressure is zero, e.g. the air gap when depths are
   * from the rig floor but the open sea sets pressure zero at sea level. Default 0. Above it pressure is 0.
   */
  datumOffsetM?: number;
}

/**
 * Pressure of a static fluid column, p = ρ·g·(TVD − datumOffset), zero above the offset.
 * `fluidDensityKgM3` is one density or one per depth sample (a constant-density column either way).
 * @example
 * hydrostatic(1000, 1025);                          // 10,051,816 Pa (seawater, 1000 m)
 * hydrostatic([25, 1025], 1025, { datumOffsetM: 25 }); // Float64Array [0, 10,051,816]
 */
export function hydrostatic<Z extends Numeric, R extends Numeric>(
  tvdM: Z,
  fluidDensityKgM3: R,
  opts: HydrostaticOptions = {},
): ResultOf<Z | R> {
  const fn = 'hydrostatic';
  const offsetM = param(fn, 'datumOffsetM', opts.datumOffsetM ?? 0);
  const n = commonLength(fn, { tvdM, fluidDensityKgM3 });
  return mapSamples(n, (i) => {
    const z = sampleAt(fn, 'tvdM', tvdM, i, 'depth');
    const rho = sampleAt(fn, 'fluidDensityKgM3', fluidDensityKgM3, i, 'nonNegative');
    return rho * G * Math.max(0, z - offsetM);
  }) as ResultOf<Z | R>;
}
