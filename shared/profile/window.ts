import type { NumericArray } from '../units/convert';
import { G } from '../units/constants';
import type { ProfileObservation } from './calibration';

/**
 * The mud-weight window as EMW (from the rig datum), kg/m³; NaN parts when there is nothing to read.
 * `widthKgM3` is the narrowest window met at one depth (one open-hole section), not the heaviest pore pressure
 * of the whole well against its weakest shallow formation, which casing separates.
 */
export interface DrillingWindow {
  maxPoreKgM3: number;
  maxPoreTvdM: number;
  minFractureKgM3: number;
  minFractureTvdM: number;
  /** Narrowest fracture-minus-pore margin, kg/m³ of EMW. */
  widthKgM3: number;
  /** Where that narrowest margin is, TVD below the rig datum, m. */
  widthTvdM: number;
}

const NONE: DrillingWindow = {
  maxPoreKgM3: NaN,
  maxPoreTvdM: NaN,
  minFractureKgM3: NaN,
  minFractureTvdM: NaN,
  widthKgM3: NaN,
  widthTvdM: NaN,
};

/**
 * The window from interpreted curves, read over the samples where both pore and fracture pressure exist (the
 * logged interval): heaviest pore EMW, weakest fracture EMW, and the narrowest margin F − P at one depth.
 * @example curveWindow(tvdM, porePa, fracturePa).widthKgM3; // 310
 */
export function curveWindow(tvdM: NumericArray, porePa: NumericArray, fracturePa: NumericArray): DrillingWindow {
  const out = { ...NONE };
  let maxPore = -Infinity;
  let minFrac = Infinity;
  let narrowest = Infinity;
  for (let i = 0; i < tvdM.length; i++) {
    const z = tvdM[i];
    if (!(z > 0) || Number.isNaN(porePa[i]) || Number.isNaN(fracturePa[i])) continue;
    const p = porePa[i] / (G * z);
    const f = fracturePa[i] / (G * z);
    if (p > maxPore) [maxPore, out.maxPoreKgM3, out.maxPoreTvdM] = [p, p, z];
    if (f < minFrac) [minFrac, out.minFractureKgM3, out.minFractureTvdM] = [f, f, z];
    if (f - p < narrowest) [narrowest, out.widthKgM3, out.widthTvdM] = [f - p, f - p, z];
  }
  return out;
}

/**
 * The window as drilled: each leak-off (or formation-integrity) test at a shoe against the heaviest mud weight used
 * below it until the next test, the narrowest of those sections; plus the heaviest mud and the weakest test overall.
 * The "pore" side here is the mud, which sat above pore pressure by the trip margin.
 * @example measuredWindow(pressures).widthKgM3; // 240
 */
export function measuredWindow(observations: readonly ProfileObservation[]): DrillingWindow {
  const emwOf = (o: ProfileObservation) => o.valueSi / (G * o.tvdM);
  const usable = observations.filter((o) => o.tvdM > 0);
  const tests = usable.filter((o) => o.kind === 'lot' || o.kind === 'fit').sort((a, b) => a.tvdM - b.tvdM);
  const muds = usable.filter((o) => o.kind === 'mud_weight');
  const out = { ...NONE };
  for (const m of muds) {
    const v = emwOf(m);
    if (!(v <= out.maxPoreKgM3)) [out.maxPoreKgM3, out.maxPoreTvdM] = [v, m.tvdM];
  }
  for (const t of tests) {
    const v = emwOf(t);
    if (!(v >= out.minFractureKgM3)) [out.minFractureKgM3, out.minFractureTvdM] = [v, t.tvdM];
  }
  tests.forEach((t, i) => {
    const next = tests[i + 1]?.tvdM ?? Infinity;
    const below = muds.filter((m) => m.tvdM > t.tvdM && m.tvdM <= next).map(emwOf);
    if (below.length === 0) return;
    const width = emwOf(t) - Math.max(...below);
    if (!(width >= out.widthKgM3)) [out.widthKgM3, out.widthTvdM] = [width, t.tvdM];
  });
  return out;
}
