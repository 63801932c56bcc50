import type { Numeric, ResultOf } from '../units/convert';
import { commonLength, mapSamples, param, sampleAt } from './inputs';

/**
 * Eaton (1975, SPE 5544): P = S − (S − P_n)·ratio^n. The ratio is built so that it falls below 1
 * where the log departs from its normal trend towards undercompaction, which raises P above P_n.
 * Pressures in any consistent unit (absolute or per depth); the log pair in any one unit.
 */
function eaton(
  fn: string,
  overburdenPa: Numeric,
  normalPa: Numeric,
  ratioTop: { name: string; value: Numeric },
  ratioBottom: { name: string; value: Numeric },
  exponent: number,
): number | Float64Array {
  param(fn, 'exponent', exponent, { gt: 0 });
  const n = commonLength(fn, {
    overburdenPa,
    normalPa,
    [ratioTop.name]: ratioTop.value,
    [ratioBottom.name]: ratioBottom.value,
  });
  return mapSamples(n, (i) => {
    const s = sampleAt(fn, 'overburdenPa', overburdenPa, i, 'curve');
    const pn = sampleAt(fn, 'normalPa', normalPa, i, 'curve');
    const top = sampleAt(fn, ratioTop.name, ratioTop.value, i, 'positive');
    const bottom = sampleAt(fn, ratioBottom.name, ratioBottom.value, i, 'positive');
    return s - (s - pn) * (top / bottom) ** exponent;
  });
}

export interface EatonSonicInput {
  overburdenPa: Numeric;
  /** Normal (hydrostatic) pore pressure, Pa. */
  normalPa: Numeric;
  /** Normal-trend slowness Δt_n (same unit as observedSlowness). */
  normalSlowness: Numeric;
  observedSlowness: Numeric;
  /** Default 3 (Eaton 1975). */
  exponent?: number;
}

/**
 * Pore pressure from sonic slowness, P = S − (S − P_n)·(Δt_n/Δt)^n (Eaton 1975, SPE 5544).
 * @example
 * eatonSonic({ overburdenPa: 68.9e6, normalPa: 32.1e6, normalSlowness: 90, observedSlowness: 100 }); // ≈ 42.1e6
 */
export function eatonSonic<I extends EatonSonicInput>(input: I): ResultOf<I[keyof I]> {
  return eaton(
    'eatonSonic',
    input.overburdenPa,
    input.normalPa,
    { name: 'normalSlowness', value: input.normalSlowness },
    { name: 'observedSlowness', value: input.observedSlowness },
    input.exponent ?? 3,
  ) as ResultOf<I[keyof I]>;
}

export interface EatonResistivityInput {
  overburdenPa: Numeric;
  normalPa: Numeric;
  normalResistivity: Numeric;
  observedResistivity: Numeric;
  /** Default 1.2 (Eaton 1975). */
  exponent?: number;
}

/**
 * Pore pressure from shale resistivity, P = S − (S − P_n)·(R/R_n)^n (Eaton 1975, SPE 5544).
 * @example
 * eatonResistivity({ overburdenPa: 68.9e6, normalPa: 32.1e6, normalResistivity: 2, observedResistivity: 1 });
 */
export function eatonResistivity<I extends EatonResistivityInput>(input: I): ResultOf<I[keyof I]> {
  return eaton(
    'eatonResistivity',
    input.overburdenPa,
    input.normalPa,
    { name: 'observedResistivity', value: input.observedResistivity },
    { name: 'normalResistivity', value: input.normalResistivity },
    input.exponent ?? 1.2,
  ) as ResultOf<I[keyof I]>;
}

export interface EatonDexpInput {
  overburdenPa: Numeric;
  normalPa: Numeric;
  /** Normal-trend corrected d-exponent. */
  normalDexp: Numeric;
  /** Observed corrected d-exponent (dc). */
  observedDexp: Numeric;
  /** Default 1.2 (Eaton 1975). */
  exponent?: number;
}

/**
 * Pore pressure from the corrected drilling exponent, P = S − (S − P_n)·(dc/dc_n)^n (Eaton 1975).
 * @example
 * eatonDexp({ overburdenPa: 68.9e6, normalPa: 32.1e6, normalDexp: 1.6, observedDexp: 1.2 });
 */
export function eatonDexp<I extends EatonDexpInput>(input: I): ResultOf<I[keyof I]> {
  return eaton(
    'eatonDexp',
    input.overburdenPa,
    input.normalPa,
    { name: 'observedDexp', value: input.observedDexp },
    { name: 'normalDexp', value: input.normalDexp },
    input.exponent ?? 1.2,
  ) as ResultOf<I[keyof I]>;
}
