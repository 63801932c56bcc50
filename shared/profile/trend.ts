import { fitNormalTrend, type NormalTrendModel } from '../pressure/normalTrend';
import type { NumericArray } from '../units/convert';

/** Which log the normal compaction trend is drawn on. */
export type TrendCurve = 'sonic' | 'resistivity';

/**
 * A normal compaction trend as the interpretation stores it. `params` are on depth below the mudline:
 * exponential Δt_n = matrix + (surface − matrix)·exp(−cPerM·z) (surface = the mudline value, µs/ft);
 * loglinear log10 R_n = a + b·z (ohm·m).
 */
export interface TrendSettings {
  curve: TrendCurve;
  model: NormalTrendModel;
  /** Top and base of the fitted interval, TVD below the rig datum, m. */
  fromM: number;
  toM: number;
  params: Record<string, number>;
  /** Samples with gamma ray below this (API) are sand and left out; null: no filter. */
  gammaCutoffApi: number | null;
}

export interface TrendSamples {
  /** TVD below the rig datum, ascending, m. */
  tvdM: NumericArray;
  mudlineTvdM: number;
  /** The log the trend is fitted to (µs/ft or ohm·m); NaN for gaps. */
  values: NumericArray;
  gammaApi?: NumericArray;
}

export interface TrendFit {
  params: Record<string, number>;
  r2: number;
  n: number;
}

const PARAM_NAMES: Record<NormalTrendModel, readonly string[]> = {
  exponential: ['matrix', 'surface', 'cPerM'],
  loglinear: ['a', 'b'],
};

function requireParams(fn: string, model: NormalTrendModel, params: Record<string, number>): void {
  for (const name of PARAM_NAMES[model]) {
    const v = params[name];
    if (typeof v !== 'number' || !Number.isFinite(v))
      throw new Error(`${fn}: ${model} trend parameter "${name}" must be a finite number (got ${String(v)})`);
  }
}

/**
 * The trend's value at one depth below the mudline.
 * @example trendAt('exponential', { matrix: 60, surface: 190, cPerM: 4.5e-4 }, 0); // 190
 */
export function trendAt(model: NormalTrendModel, params: Record<string, number>, belowMudlineM: number): number {
  if (model === 'exponential') return params.matrix + (params.surface - params.matrix) * Math.exp(-params.cPerM * belowMudlineM);
  return 10 ** (params.a + params.b * belowMudlineM);
}

/**
 * The trend on every sample, NaN above the mudline (no sediment there).
 * @example trendValues({ model: 'loglinear', params: { a: 0, b: 1e-4 } }, [50, 1100], 100); // Float64Array [NaN, 1.2589]
 */
export function trendValues(trend: Pick<TrendSettings, 'model' | 'params'>, tvdM: NumericArray, mudlineTvdM: number): Float64Array {
  requireParams('trendValues', trend.model, trend.params);
  const out = new Float64Array(tvdM.length);
  for (let i = 0; i < tvdM.length; i++) {
    const z = tvdM[i] - mudlineTvdM;
    out[i] = z < 0 ? NaN : trendAt(trend.model, trend.params, z);
  }
  return out;
}

/** The samples a trend is fitted on: in the interval, below the mudline, and shale when a gamma cut-off is set. */
function shaleSamples(samples: TrendSamples, gammaCutoffApi: number | null): Float64Array {
  const { values, gammaApi } = samples;
  const out = Float64Array.from(values as ArrayLike<number>);
  if (gammaCutoffApi === null) return out;
  if (!gammaApi) throw new Error('fitTrend: a gamma-ray cut-off needs a gamma-ray log');
  for (let i = 0; i < out.length; i++) if (!(gammaApi[i] >= gammaCutoffApi)) out[i] = NaN;
  return out;
}

/**
 * Least-squares normal compaction trend over [fromM, toM] (TVD below the rig datum) with `fitNormalTrend`,
 * fitted on depth below the mudline so that the exponential's `surface` is the mudline value.
 * @example
 * fitTrend({ tvdM, mudlineTvdM: 125, values: dt }, { model: 'exponential', fromM: 600, toM: 1800, gammaCutoffApi: null });
 * // { params: { matrix, surface, cPerM }, r2: 0.97, n: 1200 }
 */
export function fitTrend(
  samples: TrendSamples,
  settings: Pick<TrendSettings, 'model' | 'fromM' | 'toM' | 'gammaCutoffApi'> & {
    /** Exponential only: hold the matrix slowness Δt_m at this value (a short interval cannot resolve it). */
    matrixValue?: number | null;
  },
): TrendFit {
  const fn = 'fitTrend';
  if (samples.tvdM.length !== samples.values.length) {
    throw new Error(`${fn}: tvdM has length ${samples.tvdM.length} but values has length ${samples.values.length}`);
  }
  if (!(settings.fromM >= samples.mudlineTvdM)) {
    throw new Error(`${fn}: the trend interval must start at or below the mudline (${samples.mudlineTvdM} m; got ${settings.fromM} m)`);
  }
  const values = shaleSamples(samples, settings.gammaCutoffApi);
  const below = Float64Array.from(samples.tvdM as ArrayLike<number>, (z) => z - samples.mudlineTvdM);
  const fit = fitNormalTrend(below, values, {
    model: settings.model,
    fromM: settings.fromM - samples.mudlineTvdM,
    toM: settings.toM - samples.mudlineTvdM,
    ...(settings.model === 'exponential' && settings.matrixValue != null ? { matrixValue: settings.matrixValue } : {}),
  });
  const params: Record<string, number> =
    fit.model === 'exponential'
      ? { matrix: fit.params.matrix, surface: fit.params.surface, cPerM: fit.params.cPerM }
      : { a: fit.params.a, b: fit.params.b };
  return { params, r2: fit.r2, n: fit.n };
}

/**
 * How well a trend (fitted or edited by hand) matches its interval: r² in the space `fitNormalTrend` fits in
 * (slowness itself for exponential, log10 R for loglinear), so an unedited fit reports the fitter's own r².
 * NaN when fewer than 3 samples lie in the interval.
 * @example trendR2({ tvdM, mudlineTvdM, values }, trend); // 0.96
 */
export function trendR2(samples: TrendSamples, trend: TrendSettings): { r2: number; n: number } {
  requireParams('trendR2', trend.model, trend.params);
  const values = shaleSamples(samples, trend.gammaCutoffApi);
  const ys: number[] = [];
  const fs: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const z = samples.tvdM[i];
    const v = values[i];
    if (!(z >= trend.fromM && z <= trend.toM) || Number.isNaN(v) || z < samples.mudlineTvdM) continue;
    const model = trendAt(trend.model, trend.params, z - samples.mudlineTvdM);
    if (trend.model === 'loglinear') {
      if (!(v > 0)) continue;
      ys.push(Math.log10(v));
      fs.push(Math.log10(model));
    } else {
      ys.push(v);
      fs.push(model);
    }
  }
  if (ys.length < 3) return { r2: NaN, n: ys.length };
  const mean = ys.reduce((s, y) => s + y, 0) / ys.length;
  let sse = 0;
  let sst = 0;
  for (let i = 0; i < ys.length; i++) {
    sse += (ys[i] - fs[i]) ** 2;
    sst += (ys[i] - mean) ** 2;
  }
  return { r2: sst === 0 ? (sse === 0 ? 1 : 0) : 1 - sse / sst, n: ys.length };
}
