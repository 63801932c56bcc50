import type { NumericArray } from '../units/convert';
import { checkDepths, commonLength, param, sampleAt } from './inputs';

export interface TopOfOverpressureInput {
  /** TVD of each sample, sorted ascending, m. */
  tvdM: NumericArray;
  /** Pore pressure at each sample, Pa; NaN samples are skipped. */
  porePa: NumericArray;
  /** Normal (hydrostatic) pressure gradient, Pa/m, e.g. 10,500 Pa/m for basin brine (0.465 psi/ft). */
  normalGradientPaM: number;
  /** Margin above normal, as a gradient on TVD, Pa/m (0.3–0.5 ppg ≈ 350–590 Pa/m is common practice, no source). */
  marginPaM: number;
  /** How thick a continuous run above the threshold must be to count, m. */
  minThicknessM: number;
  /** Depth where the normal pressure is zero (e.g. sea level below a rig floor datum), m; default 0. */
  datumOffsetM?: number;
}

export interface TopOfOverpressure {
  tvdM: number;
  /** Index of that sample in the input arrays. */
  index: number;
}

/**
 * Top of overpressure: the shallowest sample that starts a run of samples all above the threshold
 * normalGradient·(z − datumOffset) + margin·z (strictly above), where the run spans at least
 * minThicknessM from its first to its last sample. NaN samples are skipped and do not break a run;
 * any valid sample at or below the threshold ends it. A run cut off by the base of the log before it
 * reaches minThicknessM is not a top, so a single noisy spike never makes one. null when no run qualifies.
 * @example
 * topOfOverpressure({ tvdM, porePa, normalGradientPaM: 10_500, marginPaM: 470, minThicknessM: 50 });
 * // { tvdM: 2450, index: 245 }
 */
export function topOfOverpressure(input: TopOfOverpressureInput): TopOfOverpressure | null {
  const fn = 'topOfOverpressure';
  const { tvdM, porePa } = input;
  const n = commonLength(fn, { tvdM, porePa });
  if (n === -1 || typeof tvdM === 'number' || typeof porePa === 'number') {
    throw new Error(`${fn}: tvdM and porePa must be arrays`);
  }
  checkDepths(fn, 'tvdM', tvdM);
  const normal = param(fn, 'normalGradientPaM', input.normalGradientPaM, { gt: 0 });
  const margin = param(fn, 'marginPaM', input.marginPaM, { min: 0 });
  const minThicknessM = param(fn, 'minThicknessM', input.minThicknessM, { min: 0 });
  const offsetM = param(fn, 'datumOffsetM', input.datumOffsetM ?? 0);

  let runStart = -1;
  for (let i = 0; i < n; i++) {
    const p = sampleAt(fn, 'porePa', porePa, i, 'curve');
    if (Number.isNaN(p)) continue;
    const z = tvdM[i];
    const threshold = normal * Math.max(0, z - offsetM) + margin * z;
    if (p > threshold) {
      if (runStart === -1) runStart = i;
      if (z - tvdM[runStart] >= minThicknessM) return { tvdM: tvdM[runStart], index: runStart };
    } else {
      runStart = -1;
    }
  }
  return null;
}
