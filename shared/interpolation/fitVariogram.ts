import type { Variogram, VariogramLag, VariogramModel } from './types';
import { modelShape, VARIOGRAM_MODELS } from './variogramModel';

export interface FitVariogramOptions {
  model: VariogramModel;
  /** Fixed nugget; when omitted it is fitted (≥ 0). */
  nugget?: number;
  /**
   * 'experimental' (default): one pass with weights N/γ̂²; 'model': Cressie's weights N/γ² from the fitted model,
   * iterated, with sparse bins merged. On stationary fields 'model' gives σ that matches the errors (the unit tests
   * on simulated fields); on a field that keeps rising past the largest lag it follows the distant bins and σ near
   * the wells comes out several times the errors, so the surfaces keep 'experimental' until a model without a sill
   * is available.
   */
  weighting?: 'experimental' | 'model';
}

const GRID_STEPS = 80;
const GOLDEN_STEPS = 60;

interface Bins {
  h: Float64Array;
  gamma: Float64Array;
  pairs: Float64Array;
}

function validateBins(experimental: readonly VariogramLag[], minimum: number): Bins {
  if (!Array.isArray(experimental)) throw new Error('experimental must be an array of { lagM, gamma, pairs }');
  const n = experimental.length;
  if (n < minimum) throw new Error(`fitVariogram needs at least ${minimum} lag bins, got ${n}`);
  const bins: Bins = { h: new Float64Array(n), gamma: new Float64Array(n), pairs: new Float64Array(n) };
  for (let i = 0; i < n; i++) {
    const { lagM, gamma, pairs } = experimental[i];
    if (!Number.isFinite(lagM) || lagM <= 0) throw new Error(`Lag ${i}: lagM must be a finite number > 0, got ${String(lagM)}`);
    if (!Number.isFinite(gamma) || gamma < 0) throw new Error(`Lag ${i}: gamma must be a finite number ≥ 0, got ${String(gamma)}`);
    if (!Number.isFinite(pairs) || pairs <= 0) throw new Error(`Lag ${i}: pairs must be a finite number > 0, got ${String(pairs)}`);
    bins.h[i] = lagM;
    bins.gamma[i] = gamma;
    bins.pairs[i] = pairs;
  }
  return bins;
}

/**
 * Weights N(h)/γ(h)² with γ a semivariance per bin (Cressie 1985): the model's, once there is a model, floored so
 * a zero bin stays finite.
 */
function weightsOf(pairs: Float64Array, gamma: ArrayLike<number>, floor: number): Float64Array {
  const w = new Float64Array(pairs.length);
  for (let j = 0; j < w.length; j++) w[j] = pairs[j] / Math.max(gamma[j] * gamma[j], floor);
  return w;
}

/**
 * Merges neighbouring bins until each holds at least `minPairs` pairs (pair-weighted mean lag and semivariance), so a
 * bin of one or two pairs cannot steer the fit; the threshold is halved while fewer than `minimum` bins would remain.
 */
function mergeSparse(b: Bins, minPairs: number, minimum: number): Bins {
  for (let threshold = minPairs; threshold > 1; threshold = Math.floor(threshold / 2)) {
    const h: number[] = [];
    const g: number[] = [];
    const p: number[] = [];
    let sh = 0,
      sg = 0,
      sp = 0;
    for (let j = 0; j < b.h.length; j++) {
      sh += b.h[j] * b.pairs[j];
      sg += b.gamma[j] * b.pairs[j];
      sp += b.pairs[j];
      if (sp >= threshold) {
        h.push(sh / sp);
        g.push(sg / sp);
        p.push(sp);
        sh = sg = sp = 0;
      }
    }
    if (sp > 0) {
      if (p.length === 0) {
        h.push(sh / sp);
        g.push(sg / sp);
        p.push(sp);
      } else {
        // the sparse tail joins the last full bin
        const k = p.length - 1;
        const total = p[k] + sp;
        h[k] = (h[k] * p[k] + sh) / total;
        g[k] = (g[k] * p[k] + sg) / total;
        p[k] = total;
      }
    }
    if (p.length >= minimum) return { h: Float64Array.from(h), gamma: Float64Array.from(g), pairs: Float64Array.from(p) };
  }
  return b;
}

/** Weighted residual sum of squares Σ wⱼ·(γ̂ⱼ − γⱼ)². */
function criterion(b: Bins, w: Float64Array, shape: Float64Array, nugget: number, sill: number): number {
  let s = 0;
  for (let j = 0; j < shape.length; j++) {
    const r = b.gamma[j] - (nugget + sill * shape[j]);
    s += w[j] * r * r;
  }
  return s;
}

/** For a fixed range the model is linear in (nugget, sill): solve the weighted least squares exactly, with nugget, sill ≥ 0. */
function fitLinear(b: Bins, w: Float64Array, shape: Float64Array, fixedNugget: number | undefined): { nugget: number; sill: number } {
  const n = shape.length;
  let sw = 0,
    sg = 0,
    sgg = 0,
    sz = 0,
    sgz = 0;
  for (let j = 0; j < n; j++) {
    sw += w[j];
    sg += w[j] * shape[j];
    sgg += w[j] * shape[j] * shape[j];
    sz += w[j] * b.gamma[j];
    sgz += w[j] * shape[j] * b.gamma[j];
  }
  const sillGivenNugget = (c0: number): number => (sgg > 0 ? Math.max(0, (sgz - c0 * sg) / sgg) : 0);
  if (fixedNugget !== undefined) return { nugget: fixedNugget, sill: sillGivenNugget(fixedNugget) };
  const det = sw * sgg - sg * sg;
  const nugget = det > 0 ? (sgg * sz - sg * sgz) / det : 0;
  const sill = det > 0 ? (sw * sgz - sg * sz) / det : 0;
  if (nugget < 0 || !(det > 0)) return { nugget: 0, sill: sillGivenNugget(0) };
  if (sill < 0) return { nugget: sz / sw, sill: 0 };
  return { nugget, sill };
}

/** Least share of the total sill a fitted gaussian keeps as nugget (common practice, no source). */
export const GAUSSIAN_NUGGET_SHARE = 0.01;

/** Fewest pairs a bin keeps before it is merged with its neighbour (common practice, no source). */
export const MIN_PAIRS_PER_BIN = 6;

const MAX_REWEIGHTS = 30;

export interface VariogramFit {
  variogram: Variogram;
  /**
   * Where the practical range ended: 'upper' on the largest lag (the semivariance still rises there, the sign of a
   * trend or of correlation longer than the data span), 'lower' on the shortest bound (in effect a pure nugget: no
   * correlation at the well spacing), null inside.
   */
  rangeAtBound: 'lower' | 'upper' | null;
  /** The bins fitted, after sparse ones were merged. */
  bins: VariogramLag[];
  /** Reweighting passes until the weights stopped moving. */
  iterations: number;
}

/**
 * Fits a variogram model to an experimental variogram by iteratively reweighted least squares with Cressie's weights
 * N(h)/γ(h)², pair count over the squared model semivariance (Cressie 1985, "Fitting variogram models by weighted
 * least squares", Mathematical Geology 17(5), 563–586 — volume and pages from memory). The weights start from the
 * experimental γ̂; with `weighting: 'model'` they are then recomputed from the last fit until they settle: the fixed point solves Cressie's
 * estimating equation Σ N·(γ̂ − γ)·∂γ/γ² = 0 without the upward pull of minimising his criterion with γ free in the
 * denominator, and — unlike weights from γ̂ alone — a distant bin whose γ̂ the model misses keeps its weight, so
 * the sill follows the large lags; bins with fewer than MIN_PAIRS_PER_BIN pairs are then merged with their neighbour.
 * The practical range is bounded by the largest lag given (choose lags up to about half the largest separation);
 * `rangeAtBound` says when the fit ends on a bound. GSLIB convention: `range` is the practical range, `sill` the
 * partial sill. Own fitter because no maintained npm package fits these models: the range is searched on a log grid
 * and refined by golden section, with nugget and sill solved exactly for each range.
 *
 * @example
 * const lags = [10, 20, 30, 40, 60].map((h) => ({ lagM: h, gamma: 2 + 8 * (1 - Math.exp(-3 * h / 50)), pairs: 30 }));
 * fitVariogramDetailed(lags, { model: 'exponential' }).variogram; // ≈ { model: 'exponential', nugget: 2, sill: 8, range: 50 }
 */
export function fitVariogramDetailed(experimental: readonly VariogramLag[], options: FitVariogramOptions): VariogramFit {
  const model = options?.model;
  if (!VARIOGRAM_MODELS.includes(model)) throw new Error(`Unknown variogram model: ${String(model)}`);
  const fixedNugget = options.nugget;
  if (fixedNugget !== undefined && (!Number.isFinite(fixedNugget) || fixedNugget < 0)) {
    throw new Error(`nugget must be a finite number ≥ 0, got ${String(fixedNugget)}`);
  }
  const minimum = fixedNugget === undefined ? 3 : 2;
  const iterate = options.weighting === 'model';
  const validated = validateBins(experimental, minimum);
  const bins = iterate ? mergeSparse(validated, MIN_PAIRS_PER_BIN, minimum) : validated;
  let maxGamma = 0;
  let hMin = Infinity;
  let hMax = 0;
  for (let j = 0; j < bins.h.length; j++) {
    maxGamma = Math.max(maxGamma, bins.gamma[j]);
    hMin = Math.min(hMin, bins.h[j]);
    hMax = Math.max(hMax, bins.h[j]);
  }
  if (maxGamma === 0) throw new Error('fitVariogram: every semivariance is zero, so there is nothing to fit');
  // keeps Cressie weights finite where a model (or a bin) is zero
  const floor = (maxGamma * (iterate ? 1e-6 : 1e-9)) ** 2;
  const lo = Math.log(hMin / 4);
  // Bounded by the largest lag used: past it the data say nothing about the range, and a longer range only
  // stretches the model's slope at short lags (common practice, no source).
  const hi = Math.log(hMax);
  const step = (hi - lo) / GRID_STEPS;

  let weights = weightsOf(bins.pairs, bins.gamma, floor);
  let best = fitWithWeights(bins, weights, model, fixedNugget, lo, hi);
  let iterations = 0;
  while (iterate && iterations < MAX_REWEIGHTS) {
    iterations++;
    const modelGamma = bins.h.map((h) => best.nugget + best.sill * modelShape(model, h, Math.exp(best.logRange)));
    weights = weightsOf(bins.pairs, modelGamma, floor);
    const next = fitWithWeights(bins, weights, model, fixedNugget, lo, hi);
    const moved =
      Math.abs(next.logRange - best.logRange) + Math.abs(next.nugget - best.nugget) / maxGamma + Math.abs(next.sill - best.sill) / maxGamma;
    best = next;
    if (moved < 1e-9) break;
  }
  const rangeAtBound = hi - best.logRange < step ? 'upper' : best.logRange - lo < step ? 'lower' : null;
  return {
    variogram: { model, nugget: best.nugget, sill: best.sill, range: Math.exp(best.logRange) },
    rangeAtBound,
    bins: Array.from(bins.h, (lagM, j) => ({ lagM, gamma: bins.gamma[j], pairs: bins.pairs[j] })),
    iterations,
  };
}

/**
 * The fitted model alone; see fitVariogramDetailed.
 * @example
 * const lags = [10, 20, 30, 40, 60].map((h) => ({ lagM: h, gamma: 2 + 8 * (1 - Math.exp(-3 * h / 50)), pairs: 30 }));
 * fitVariogram(lags, { model: 'exponential' }); // ≈ { model: 'exponential', nugget: 2, sill: 8, range: 50 }
 */
export function fitVariogram(experimental: readonly VariogramLag[], options: FitVariogramOptions): Variogram {
  return fitVariogramDetailed(experimental, options).variogram;
}

/** The best range for fixed weights: a log grid, then golden section between the best point's neighbours. */
function fitWithWeights(
  bins: Bins,
  weights: Float64Array,
  model: VariogramModel,
  fixedNugget: number | undefined,
  lo: number,
  hi: number,
): { logRange: number; score: number; nugget: number; sill: number } {
  const shape = new Float64Array(bins.h.length);
  const evaluate = (logRange: number): { logRange: number; score: number; nugget: number; sill: number } => {
    const range = Math.exp(logRange);
    for (let j = 0; j < shape.length; j++) shape[j] = modelShape(model, bins.h[j], range);
    const { nugget, sill } = fitLinear(bins, weights, shape, fixedNugget);
    if (model === 'gaussian' && fixedNugget === undefined && nugget < GAUSSIAN_NUGGET_SHARE * (nugget + sill)) {
      // The smooth gaussian without a nugget makes the kriging system nearly singular; a small nugget keeps it solvable.
      const held = fitLinear(bins, weights, shape, GAUSSIAN_NUGGET_SHARE * (nugget + sill));
      return { logRange, score: criterion(bins, weights, shape, held.nugget, held.sill), nugget: held.nugget, sill: held.sill };
    }
    return { logRange, score: criterion(bins, weights, shape, nugget, sill), nugget, sill };
  };
  const step = (hi - lo) / GRID_STEPS;
  let bestI = 0;
  let bestScore = Infinity;
  for (let i = 0; i <= GRID_STEPS; i++) {
    const score = evaluate(lo + i * step).score;
    if (score < bestScore) {
      bestScore = score;
      bestI = i;
    }
  }
  let a = lo + Math.max(0, bestI - 1) * step;
  let b = lo + Math.min(GRID_STEPS, bestI + 1) * step;
  const g = (Math.sqrt(5) - 1) / 2;
  let c = b - g * (b - a);
  let d = a + g * (b - a);
  let fc = evaluate(c).score;
  let fd = evaluate(d).score;
  for (let i = 0; i < GOLDEN_STEPS; i++) {
    if (fc <= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - g * (b - a);
      fc = evaluate(c).score;
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + g * (b - a);
      fd = evaluate(d).score;
    }
  }
  const grid = evaluate(lo + bestI * step);
  const refined = evaluate((a + b) / 2);
  return refined.score <= grid.score ? refined : grid;
}
