import { G } from '../units/constants';
import type { Profile } from './buildProfile';
import { isGoodPoreMeasurement, type ProfileObservation } from './calibration';
import { bridgeGaps, interpolateAt } from './interpolate';
import type { FractureSettings } from './methods';

/** What of a built profile the calibrations read. */
export type CalibrationProfile = Pick<
  Profile,
  'tvdM' | 'mudlineTvdM' | 'overburdenPa' | 'hydrostaticPa' | 'normalTrend' | 'poreLog' | 'poreFilledPa'
>;

/** A least-squares fit of a method's parameters to a well's measurements; `params` is null when nothing could be fitted. */
export interface CalibrationFit<P> {
  params: P | null;
  /** Measurements the fit used. */
  n: number;
  /** Measurements of the right kind left out: no log, trend or pore pressure at their depth. */
  skipped: number;
  /** RMS of model − measurement with the fitted parameters, Pa (NaN without a fit). */
  rmsPa: number;
  /** The same as equivalent mud weight from the rig datum, kg/m³. */
  rmsKgM3: number;
  /** Plain sentences: what constrains the fit poorly, or why there is none. */
  warnings: string[];
}

/**
 * A log ratio within 5 % of one leaves Eaton's pressure near hydrostatic for any exponent, so such a test does not
 * constrain it (common practice, no source).
 */
const CONSTRAINING_LOG_RATIO = 0.05;
/** Fewest constraining points before a fit is called well constrained (common practice, no source). */
const WELL_CONSTRAINED = 3;
const EXPONENT_RANGE = [0.2, 8] as const;

function rms(residualsPa: number[], tvdM: number[]): { rmsPa: number; rmsKgM3: number } {
  const n = residualsPa.length;
  if (n === 0) return { rmsPa: NaN, rmsKgM3: NaN };
  let sq = 0;
  let sqE = 0;
  residualsPa.forEach((r, i) => {
    sq += r * r;
    sqE += (r / (G * tvdM[i])) ** 2;
  });
  return { rmsPa: Math.sqrt(sq / n), rmsKgM3: Math.sqrt(sqE / n) };
}

/** Golden-section minimum of a unimodal function on [a, b] after a coarse scan (own code: one line of search). */
function minimise(f: (x: number) => number, a: number, b: number): number {
  const steps = 160;
  let best = a;
  let bestValue = Infinity;
  for (let i = 0; i <= steps; i++) {
    const x = a + ((b - a) * i) / steps;
    const v = f(x);
    if (v < bestValue) {
      bestValue = v;
      best = x;
    }
  }
  let lo = Math.max(a, best - (b - a) / steps);
  let hi = Math.min(b, best + (b - a) / steps);
  const g = (Math.sqrt(5) - 1) / 2;
  for (let i = 0; i < 60; i++) {
    const c = hi - g * (hi - lo);
    const d = lo + g * (hi - lo);
    if (f(c) <= f(d)) hi = d;
    else lo = c;
  }
  const refined = (lo + hi) / 2;
  return f(refined) <= bestValue ? refined : best;
}

/**
 * Eaton's exponent fitted to the well's good formation tests and DSTs: the n minimising Σ (P(n) − Pᵢ)² with
 * P = S − (S − Pₙ)·rⁿ, r = Δtₙ/Δt (sonic) or R/Rₙ (resistivity) read from the log as the method reads it (Eaton 1975,
 * SPE 5544). Tests are taken in sands, where a shale filter leaves the log empty: the shale log is bridged across such
 * gaps, so each test meets the shale beside it. The normal trend must be set first: the fit is of the exponent alone.
 * @example calibrateEatonExponent(profile, observations, 'eaton-sonic').params; // { exponent: 2.7 }
 */
export function calibrateEatonExponent(
  profile: CalibrationProfile,
  observations: readonly ProfileObservation[],
  method: 'eaton-sonic' | 'eaton-resistivity',
): CalibrationFit<{ exponent: number }> {
  const tests = observations.filter(isGoodPoreMeasurement);
  const empty = (warning: string, skipped = tests.length): CalibrationFit<{ exponent: number }> => ({
    params: null,
    n: 0,
    skipped,
    rmsPa: NaN,
    rmsKgM3: NaN,
    warnings: [warning],
  });
  if (!profile.poreLog || !profile.normalTrend)
    return empty('Set a normal trend and an Eaton method first: the exponent is fitted with them.');
  if (tests.length === 0) return empty('No good formation tests or DSTs on this well to calibrate against.', 0);
  const points: { tvdM: number; s: number; pn: number; ratio: number; measured: number }[] = [];
  const shaleLog = bridgeGaps(profile.tvdM, profile.poreLog);
  for (const t of tests) {
    const log = interpolateAt(profile.tvdM, shaleLog, t.tvdM);
    const trend = interpolateAt(profile.tvdM, profile.normalTrend, t.tvdM);
    const s = interpolateAt(profile.tvdM, profile.overburdenPa, t.tvdM);
    const pn = interpolateAt(profile.tvdM, profile.hydrostaticPa, t.tvdM);
    if (![log, trend, s, pn].every((v) => Number.isFinite(v) && v > 0)) continue;
    const ratio = method === 'eaton-sonic' ? trend / log : log / trend;
    points.push({ tvdM: t.tvdM, s, pn, ratio, measured: t.valueSi });
  }
  const skipped = tests.length - points.length;
  if (points.length === 0) return empty(`None of the ${tests.length} tests has a log reading at its depth.`);
  const constraining = points.filter((p) => Math.abs(Math.log(p.ratio)) > CONSTRAINING_LOG_RATIO).length;
  if (constraining === 0) {
    return empty(
      `All ${points.length} tests sit where the log is within 5 % of its normal trend: they say the pressure is near normal but not what the exponent is.`,
      skipped,
    );
  }
  const residuals = (n: number) => points.map((p) => p.s - (p.s - p.pn) * p.ratio ** n - p.measured);
  const exponent = minimise((n) => residuals(n).reduce((sum, r) => sum + r * r, 0), ...EXPONENT_RANGE);
  const warnings: string[] = [];
  if (constraining < WELL_CONSTRAINED)
    warnings.push(
      `Only ${constraining} of the ${points.length} tests sit where the log departs from its trend by more than 5 %: the exponent rests on ${constraining === 1 ? 'it' : 'them'} alone.`,
    );
  if (exponent - EXPONENT_RANGE[0] < 0.01 || EXPONENT_RANGE[1] - exponent < 0.01)
    warnings.push(
      `The exponent ended on the limit of its search (${EXPONENT_RANGE.join(' to ')}): the trend, not the exponent, is likely what misfits.`,
    );
  return {
    params: { exponent },
    n: points.length,
    skipped,
    ...rms(
      residuals(exponent),
      points.map((p) => p.tvdM),
    ),
    warnings,
  };
}

const POISSON_MAX = 0.499;
/** Below this spread of depths the tests cannot tell a gradient of Poisson's ratio from scatter (common practice, no source). */
const MIN_GRADIENT_SPAN_M = 300;

/**
 * The fracture model fitted to the well's leak-off tests (FITs are lower bounds, so they are not fitted), with the
 * pore pressure of the profile. Matthews & Kelly (1967): F = Kᵢ·(S − P) + P with one Kᵢ, solved in closed form.
 * Eaton (1969, SPE 2163): F = ν/(1 − ν)·(S − P) + P with ν = ν₀ + g·(depth below mudline, km), fitted by
 * Gauss–Newton in pressure from the exact ν of each test; with one test, or tests spanning less than 300 m, the
 * gradient is held at `current`'s (or 0) and only ν₀ is fitted.
 * @example calibrateFracture(profile, observations, 'matthews-kelly').params; // { method: 'matthews-kelly', ki: 0.74 }
 */
export function calibrateFracture(
  profile: CalibrationProfile,
  observations: readonly ProfileObservation[],
  method: FractureSettings['method'],
  current?: FractureSettings | null,
): CalibrationFit<FractureSettings> {
  const lots = observations.filter((o) => o.kind === 'lot');
  const fits = observations.filter((o) => o.kind === 'fit').length;
  const pore = profile.poreFilledPa ?? profile.hydrostaticPa;
  const points: { tvdM: number; zKm: number; s: number; p: number; measured: number }[] = [];
  for (const t of lots) {
    const s = interpolateAt(profile.tvdM, profile.overburdenPa, t.tvdM);
    const p = interpolateAt(profile.tvdM, pore, t.tvdM);
    if (!(Number.isFinite(s) && Number.isFinite(p) && s > p) || t.tvdM <= profile.mudlineTvdM) continue;
    points.push({ tvdM: t.tvdM, zKm: (t.tvdM - profile.mudlineTvdM) / 1000, s, p, measured: t.valueSi });
  }
  const warnings: string[] = [];
  if (!profile.poreFilledPa) warnings.push('No log-derived pore pressure: the fit assumes normal pore pressure at the tests.');
  if (fits > 0) warnings.push(`${fits} formation integrity test(s) are lower bounds and were not fitted.`);
  const skipped = lots.length - points.length;
  if (points.length === 0) {
    warnings.unshift(
      lots.length === 0
        ? 'No leak-off tests on this well to calibrate against.'
        : 'No leak-off test has an overburden and pore pressure at its depth.',
    );
    return { params: null, n: 0, skipped, rmsPa: NaN, rmsKgM3: NaN, warnings };
  }
  const depths = points.map((q) => q.tvdM);
  if (points.length < WELL_CONSTRAINED)
    warnings.push(`Only ${points.length} leak-off test(s): the fitted value has little redundancy behind it.`);

  if (method === 'matthews-kelly') {
    let num = 0;
    let den = 0;
    for (const q of points) {
      num += (q.s - q.p) * (q.measured - q.p);
      den += (q.s - q.p) ** 2;
    }
    const ki = Math.max(0, num / den);
    const residuals = points.map((q) => ki * (q.s - q.p) + q.p - q.measured);
    return { params: { method, ki }, n: points.length, skipped, ...rms(residuals, depths), warnings };
  }

  const span = Math.max(...depths) - Math.min(...depths);
  const fitGradient = points.length >= 2 && span >= MIN_GRADIENT_SPAN_M;
  const heldGradient = current?.method === 'eaton' ? current.poissonGradientPerKm : 0;
  if (!fitGradient)
    warnings.push(
      `The tests span ${Math.round(span)} m: too little to fit a gradient of Poisson's ratio, so it is held at ${heldGradient} per km.`,
    );
  const clampNu = (nu: number) => Math.min(POISSON_MAX, Math.max(0, nu));
  const model = (top: number, g: number, q: (typeof points)[number]) => {
    const nu = clampNu(top + g * q.zKm);
    return (nu / (1 - nu)) * (q.s - q.p) + q.p;
  };
  // start: each test's own ν, k = (F − P)/(S − P), ν = k/(1 + k), averaged (or regressed on depth)
  const nus = points.map((q) => {
    const k = Math.max(0, (q.measured - q.p) / (q.s - q.p));
    return clampNu(k / (1 + k));
  });
  let top: number;
  let g: number;
  if (fitGradient) {
    const zMean = points.reduce((a, q) => a + q.zKm, 0) / points.length;
    const nuMean = nus.reduce((a, v) => a + v, 0) / nus.length;
    let sxy = 0;
    let sxx = 0;
    points.forEach((q, i) => {
      sxy += (q.zKm - zMean) * (nus[i] - nuMean);
      sxx += (q.zKm - zMean) ** 2;
    });
    g = sxy / sxx;
    top = nuMean - g * zMean;
  } else {
    g = heldGradient;
    top = points.reduce((a, q, i) => a + nus[i] - g * q.zKm, 0) / points.length;
  }
  for (let iteration = 0; iteration < 20; iteration++) {
    // Gauss–Newton on F(ν) with dF/dν = (S − P)/(1 − ν)²
    let a11 = 0,
      a12 = 0,
      a22 = 0,
      b1 = 0,
      b2 = 0;
    for (const q of points) {
      const nu = clampNu(top + g * q.zKm);
      const d = (q.s - q.p) / (1 - nu) ** 2;
      const r = q.measured - model(top, g, q);
      a11 += d * d;
      a12 += d * d * q.zKm;
      a22 += d * d * q.zKm * q.zKm;
      b1 += d * r;
      b2 += d * r * q.zKm;
    }
    let dTop: number;
    let dG = 0;
    if (fitGradient) {
      const det = a11 * a22 - a12 * a12;
      if (!(Math.abs(det) > 0)) break;
      dTop = (a22 * b1 - a12 * b2) / det;
      dG = (a11 * b2 - a12 * b1) / det;
    } else dTop = b1 / a11;
    top += dTop;
    g += dG;
    if (Math.abs(dTop) + Math.abs(dG) < 1e-12) break;
  }
  if (points.some((q) => top + g * q.zKm >= POISSON_MAX || top + g * q.zKm < 0))
    warnings.push("Poisson's ratio reached its limit (0 or 0.5) at some tests: the pore pressure there may be what misfits.");
  const residuals = points.map((q) => model(top, g, q) - q.measured);
  return {
    params: { method: 'eaton', poissonTop: top, poissonGradientPerKm: g },
    n: points.length,
    skipped,
    ...rms(residuals, depths),
    warnings,
  };
}
