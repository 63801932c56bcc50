import type { PressureKind, PressureQuality } from '../schemas/wells';
import { G } from '../units/constants';
import type { NumericArray } from '../units/convert';
import { interpolateAt } from './interpolate';

/** An observation as the profile needs it (the shape of the API's PressureObservation); valueSi is Pa. */
export interface ProfileObservation {
  kind: PressureKind;
  quality: PressureQuality;
  tvdM: number;
  valueSi: number;
}

export interface MisfitPoint {
  tvdM: number;
  measuredPa: number;
  modelPa: number;
}

/** Model minus measurement over the points that have a model value; means are NaN when none has. */
export interface Misfit {
  n: number;
  /** Points with no model value at their depth (outside the curve or in a gap). */
  outside: number;
  meanPa: number;
  rmsPa: number;
  /** The same differences as equivalent mud weight (each divided by g·TVD), kg/m³. */
  meanKgM3: number;
  rmsKgM3: number;
  points: MisfitPoint[];
}

/** Pressure kinds that measure formation pore pressure directly. */
export const PORE_MEASUREMENT_KINDS: readonly PressureKind[] = ['formation_test', 'dst'];

/**
 * Mean and RMS difference between a model curve and the observations chosen by `select`.
 * @example misfit(tvdM, porePa, pressures, (o) => o.kind === 'formation_test' && o.quality === 'good');
 */
export function misfit(
  tvdM: NumericArray,
  modelPa: NumericArray,
  observations: readonly ProfileObservation[],
  select: (o: ProfileObservation) => boolean,
): Misfit {
  const points: MisfitPoint[] = [];
  let outside = 0;
  for (const o of observations) {
    if (!select(o)) continue;
    const m = interpolateAt(tvdM, modelPa, o.tvdM);
    if (Number.isNaN(m)) outside++;
    else points.push({ tvdM: o.tvdM, measuredPa: o.valueSi, modelPa: m });
  }
  const n = points.length;
  let sum = 0;
  let sq = 0;
  let sumE = 0;
  let sqE = 0;
  for (const p of points) {
    const d = p.modelPa - p.measuredPa;
    const e = d / (G * p.tvdM);
    sum += d;
    sq += d * d;
    sumE += e;
    sqE += e * e;
  }
  return {
    n,
    outside,
    meanPa: n ? sum / n : NaN,
    rmsPa: n ? Math.sqrt(sq / n) : NaN,
    meanKgM3: n ? sumE / n : NaN,
    rmsKgM3: n ? Math.sqrt(sqE / n) : NaN,
    points,
  };
}

/** Good-quality formation tests and DSTs against the pore-pressure curve. */
export const isGoodPoreMeasurement = (o: ProfileObservation) => PORE_MEASUREMENT_KINDS.includes(o.kind) && o.quality === 'good';
