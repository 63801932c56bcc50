import { G } from '../units/constants';
import type { Numeric, NumericArray } from '../units/convert';
import { checkDepths, commonLength, param, sampleAt } from './inputs';

export interface OverburdenInput {
  /** Depths from the rig datum, sorted ascending, m. */
  depthM: NumericArray;
  /** Bulk density at each depth (or one value for all), kg/m3; NaN marks a missing sample. */
  densityKgM3: Numeric;
  /** Sea depth, m; 0 (default) for a land well. */
  waterDepthM?: number;
  /** Rig datum above sea level (or ground), m; this interval is air and adds no load. Default 0. */
  airGapM?: number;
  /** Default 1025 kg/m3 (seawater ≈ 1.025 sg, common practice, no source). */
  seawaterDensityKgM3?: number;
}

/** Defaults for `overburden`. */
export const OVERBURDEN_DEFAULTS = { waterDepthM: 0, airGapM: 0, seawaterDensityKgM3: 1025 } as const;

/**
 * Vertical stress S_v(z) = g ∫ ρ dz at each depth, Pa: nothing through the air gap, seawater down to
 * the mudline (airGap + waterDepth), then the sediment density samples by the trapezoid rule.
 * Above the first valid sample below the mudline the density is that sample's; below the last one,
 * the last one's; NaN samples are bridged linearly between their valid neighbours.
 * @example
 * overburden({ depthM: [0, 1000, 2000], densityKgM3: 2000, waterDepthM: 1000 });
 * // Float64Array [0, 10.05 MPa, 29.66 MPa]
 */
export function overburden(input: OverburdenInput): Float64Array {
  const fn = 'overburden';
  const { depthM, densityKgM3 } = input;
  const n = commonLength(fn, { depthM, densityKgM3 });
  if (typeof depthM === 'number' || n === -1) throw new Error(`${fn}: depthM must be an array of numbers`);
  checkDepths(fn, 'depthM', depthM);
  const waterDepthM = param(fn, 'waterDepthM', input.waterDepthM ?? OVERBURDEN_DEFAULTS.waterDepthM, { min: 0 });
  const airGapM = param(fn, 'airGapM', input.airGapM ?? OVERBURDEN_DEFAULTS.airGapM, { min: 0 });
  const rhoSea = param(fn, 'seawaterDensityKgM3', input.seawaterDensityKgM3 ?? OVERBURDEN_DEFAULTS.seawaterDensityKgM3, {
    gt: 0,
  });
  const mudlineM = airGapM + waterDepthM;
  const waterStressPa = rhoSea * G * waterDepthM;

  // Valid sediment samples below the mudline, and ∫ρ dz from the mudline down to each of them.
  const zs: number[] = [];
  const rhos: number[] = [];
  const integrals: number[] = [];
  for (let i = 0; i < n; i++) {
    const rho = sampleAt(fn, 'densityKgM3', densityKgM3, i, 'positive');
    const z = depthM[i];
    if (z < mudlineM || Number.isNaN(rho)) continue;
    const k = zs.length;
    integrals.push(k === 0 ? rho * (z - mudlineM) : integrals[k - 1] + ((rhos[k - 1] + rho) / 2) * (z - zs[k - 1]));
    zs.push(z);
    rhos.push(rho);
  }

  const out = new Float64Array(n);
  let k = 0; // last valid sample at or above the current depth; depths are sorted, so it only moves down
  for (let i = 0; i < n; i++) {
    const z = depthM[i];
    if (z <= airGapM) continue;
    if (z <= mudlineM) {
      out[i] = rhoSea * G * (z - airGapM);
      continue;
    }
    if (zs.length === 0) throw new Error(`${fn}: densityKgM3 has no valid sample below the mudline (${mudlineM} m)`);
    while (k + 1 < zs.length && zs[k + 1] <= z) k++;
    let integral: number;
    if (z <= zs[0]) integral = rhos[0] * (z - mudlineM);
    else if (k + 1 >= zs.length) integral = integrals[k] + rhos[k] * (z - zs[k]);
    else {
      const w = zs[k + 1] === zs[k] ? 0 : (z - zs[k]) / (zs[k + 1] - zs[k]);
      const rhoHere = rhos[k] + w * (rhos[k + 1] - rhos[k]);
      integral = integrals[k] + ((rhos[k] + rhoHere) / 2) * (z - zs[k]);
    }
    out[i] = waterStressPa + G * integral;
  }
  return out;
}
