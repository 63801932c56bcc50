import type { Variogram, VariogramLag, VariogramModel } from './types';
import { modelShape, VARIOGRAM_MODELS } from './variogramModel';

export interface FitVariogramOptions {
  model: VariogramModel;
  /** Fixed nugget; when omitted it is fitted (≥ 0). */
  nugget?: number;
}

const GRID_STEPS = 80;
const GOLDEN_STEPS = 60;
const REWEIGHT_STEPS = 30;

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

/** Cressie (1985) criterion Σ N·(γ̂ − γ)²/γ². */
function cressie(b: Bins, shape: Float64Array, nugget: number, sill: number): number {
  let s = 0;
  for (let j = 0; j < shape.length; j++) {
    const m = nugget + sill * shape[j];
    const r = b.gamma[j] - m;
    if (m <= 0) {
      if (r !== 0) return Infinity;
      continue;
    }
    s += (b.pairs[j] * r * r) / (m * m);
  }
  return s;
}

/**
 * For a fixed range the model is linear in (nugget, sill): solve it by weighted least squares, re-weighting
 * with N/γ_model² until the weights settle (iteratively re-weighted form of Cressie 1985).
 */
function fitLinear(b: Bins, shape: Float64Array, fixedNugget: number | undefined, floor: number): { nugget: number; sill: number } {
  const n = shape.length;
  const w = new Float64Array(n);
  for (let j = 0; j < n; j++) w[j] = b.pairs[j] / Math.max(b.gamma[j] * b.gamma[j], floor);
  let nugget = fixedNugget ?? 0;
  let sill = 0;
  for (let iter = 0; iter < REWEIGHT_STEPS; iter++) {
    let sw = 0, sg = 0, sgg = 0, sz = 0, sgz = 0;
    for (let j = 0; j < n; j++) {
      sw += w[j];
      sg += w[j] * shape[j];
      sgg += w[j] * shape[j] * shape[j];
      sz += w[j] * b.gamma[j];
      sgz += w[j] * shape[j] * b.gamma[j];
    }
    let nextNugget: number;
    let nextSill: number;
    const sillGivenNugget = (c0: number): number => (sgg > 0 ? Math.max(0, (sgz - c0 * sg) / sgg) : 0);
    if (fixedNugget !== undefined) {
      nextNugget = fixedNugget;
      nextSill = sillGivenNugget(fixedNugget);
    } else {
      const det = sw * sgg - sg * sg;
      nextNugget = det > 0 ? (sgg * sz - sg * sgz) / det : 0;
      nextSill = det > 0 ? (sw * sgz - sg * sz) / det : 0;
      if (nextNugget < 0 || !(det > 0)) {
        nextNugget = 0;
        nextSill = sillGivenNugget(0);
      } else if (nextSill < 0) {
        nextSill = 0;
        nextNugget = sz / sw;
      }
    }
    const settled = Math.abs(nextNugget - nugget) + Math.abs(nextSill - sill) <= 1e-13 * (Math.abs(nextNugget) + Math.abs(nextSill));
    nugget = nextNugget;
    sill = nextSill;
    if (settled) break;
    for (let j = 0; j < n; j++) {
      const m = nugget + sill * shape[j];
      w[j] = b.pairs[j] / Math.max(m * m, floor);
    }
  }
  return { nugget, sill };
}

/**
 * Fits a variogram model to an experimental variogram by weighted least squares with Cressie's weights
 * N(h)/γ(h)² (Cressie 1985, Mathematical Geology 17(5), 563–586). GSLIB convention: `range` is the practical
 * range, `sill` the partial sill. Own fitter because no maintained npm package fits these models: the range is
 * searched on a log grid and refined by golden section, with nugget and sill solved exactly for each range.
 *
 * @example
 * const lags = [10, 20, 30, 40, 60].map((h) => ({ lagM: h, gamma: 2 + 8 * (1 - Math.exp(-3 * h / 50)), pairs: 30 }));
 * fitVariogram(lags, { model: 'exponential' }); // ≈ { model: 'exponential', nugget: 2, sill: 8, range: 50 }
 */
export function fitVariogram(experimental: readonly VariogramLag[], options: FitVariogramOptions): Variogram {
  const model = options?.model;
  if (!VARIOGRAM_MODELS.includes(model)) throw new Error(`Unknown variogram model: ${String(model)}`);
  const fixedNugget = options.nugget;
  if (fixedNugget !== undefined && (!Number.isFinite(fixedNugget) || fixedNugget < 0)) {
    throw new Error(`nugget must be a finite number ≥ 0, got ${String(fixedNugget)}`);
  }
  const bins = validateBins(experimental, fixedNugget === undefined ? 3 : 2);
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
  const floor = (maxGamma * 1e-9) ** 2;
  const shape = new Float64Array(bins.h.length);

  const evaluate = (logRange: number): { score: number; nugget: number; sill: number } => {
    const range = Math.exp(logRange);
    for (let j = 0; j < shape.length; j++) shape[j] = modelShape(model, bins.h[j], range);
    const { nugget, sill } = fitLinear(bins, shape, fixedNugget, floor);
    return { score: cressie(bins, shape, nugget, sill), nugget, sill };
  };

  const lo = Math.log(hMin / 4);
  const hi = Math.log(hMax * 4);
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
  // golden-section refinement between the grid neighbours of the best grid point
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
  const candidates = [lo + bestI * step, (a + b) / 2];
  let best = { logRange: candidates[0], ...evaluate(candidates[0]) };
  const refined = { logRange: candidates[1], ...evaluate(candidates[1]) };
  if (refined.score <= best.score) best = refined;
  return { model, nugget: best.nugget, sill: best.sill, range: Math.exp(best.logRange) };
}
