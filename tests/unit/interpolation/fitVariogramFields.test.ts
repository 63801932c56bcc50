import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import {
  covariance,
  experimentalVariogram,
  fitPlanarTrend,
  fitVariogramDetailed,
  leaveOneOut,
  variogramValue,
  type DataPoint,
  type Variogram,
} from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';

// Gaussian random fields with a known variogram, simulated by z = L·ε with C = LLᵀ (ml-matrix Cholesky) and ε from
// Box & Muller (1958). If the fitted variogram is right, leave-one-out errors divided by their kriging σ are standard
// normal: about 68.3 % within 1σ and 95.4 % within 2σ (normal-distribution table).
const TRUTH: Variogram = { model: 'exponential', nugget: 2_000, sill: 40_000, range: 4_000 };
const SIDE_M = 10_000;
const SITES = 120;
const LAGS = 12;

function simulate(seed: number, trendPerM = 0): DataPoint[] {
  const random = mulberry32(seed);
  const sites = Array.from({ length: SITES }, () => ({ x: random() * SIDE_M, y: random() * SIDE_M }));
  const C = new Matrix(SITES, SITES);
  for (let i = 0; i < SITES; i++)
    for (let j = 0; j < SITES; j++) C.set(i, j, covariance(TRUTH, Math.hypot(sites[i].x - sites[j].x, sites[i].y - sites[j].y)));
  const L = new CholeskyDecomposition(C).lowerTriangularMatrix;
  const gaussian = (): number => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const z = L.mmul(Matrix.columnVector(Array.from({ length: SITES }, gaussian))).getColumn(0);
  return sites.map((s, i) => ({ ...s, value: 3_000 + z[i] + trendPerM * s.x }));
}

/** Lags up to half the largest separation, as the surface runs use them. */
function lagsOf(points: DataPoint[]) {
  let maxD = 0;
  for (let i = 0; i < points.length; i++)
    for (let j = i + 1; j < points.length; j++) maxD = Math.max(maxD, Math.hypot(points[i].x - points[j].x, points[i].y - points[j].y));
  return experimentalVariogram(points, { lags: LAGS, lagWidth: maxD / 2 / LAGS });
}

function coverage(zScores: number[]): { within1: number; within2: number; rms: number } {
  const n = zScores.length;
  return {
    within1: zScores.filter((z) => Math.abs(z) <= 1).length / n,
    within2: zScores.filter((z) => Math.abs(z) <= 2).length / n,
    rms: Math.sqrt(zScores.reduce((s, z) => s + z * z, 0) / n),
  };
}

const SEEDS = [11, 12, 13, 14, 15, 16];

describe('fitVariogramDetailed on simulated fields with a known variogram', () => {
  it('recovers the total sill and gives leave-one-out errors that match their σ', () => {
    const zScores: number[] = [];
    const totals: number[] = [];
    for (const seed of SEEDS) {
      const points = simulate(seed);
      const fit = fitVariogramDetailed(lagsOf(points), { model: 'exponential', weighting: 'model' });
      totals.push((fit.variogram.nugget + fit.variogram.sill) / (TRUTH.nugget + TRUTH.sill));
      for (const r of leaveOneOut(points, { kind: 'kriging', variogram: fit.variogram }).residuals) zScores.push(r.residual / r.stdDev!);
    }
    totals.sort((a, b) => a - b);
    const median = (totals[2] + totals[3]) / 2;
    // one realisation of 120 sites estimates the sill to tens of percent (sampling noise, no tighter bound is honest)
    expect(median).toBeGreaterThan(0.6);
    expect(median).toBeLessThan(1.5);
    const c = coverage(zScores);
    expect(c.within1).toBeGreaterThan(0.6);
    expect(c.within1).toBeLessThan(0.77);
    expect(c.within2).toBeGreaterThan(0.9);
    expect(c.within2).toBeLessThan(0.985);
    expect(c.rms).toBeGreaterThan(0.8);
    expect(c.rms).toBeLessThan(1.25);
  });

  it('says the range ended on the largest lag when a strong trend is left in; with the plane as a drift σ is right again', () => {
    // 0.1 m per m across 10 km adds ½·(0.1·h)² to γ̂ along x: far above the 42,000 m² sill at half the span
    const zScores: number[] = [];
    let upper = 0;
    for (const seed of SEEDS) {
      const points = simulate(seed, 0.1);
      if (fitVariogramDetailed(lagsOf(points), { model: 'exponential', weighting: 'model' }).rangeAtBound === 'upper') upper++;
      const plane = fitPlanarTrend(points);
      const residuals = points.map((p) => ({ ...p, value: p.value - plane.evaluate(p.x, p.y) }));
      // the variogram of the least-squares residuals, then universal kriging of the data, whose folds re-estimate the plane
      const fit = fitVariogramDetailed(lagsOf(residuals), { model: 'exponential', weighting: 'model' });
      for (const r of leaveOneOut(points, { kind: 'kriging', variogram: fit.variogram, drift: 'linear' }).residuals)
        zScores.push(r.residual / r.stdDev!);
    }
    expect(upper).toBeGreaterThanOrEqual(5);
    const c = coverage(zScores);
    expect(c.within1).toBeGreaterThan(0.58);
    expect(c.within1).toBeLessThan(0.78);
    expect(c.within2).toBeGreaterThan(0.88);
  });

  it('keeps the distant bins: a model fitted to a steadily rising γ̂ reaches the large lags', () => {
    // weights from γ̂ alone (N/γ̂²) let each distant bin cost at most N: they fitted a spherical sill of about 8,500,
    // under 2 % of the last bin; a spherical cannot bend upward, so the honest fit lands between the bins
    const hs = [400, 800, 1_200, 1_600, 2_000, 2_400, 2_800, 3_200];
    const gammas = [1_000, 3_000, 8_000, 30_000, 80_000, 200_000, 300_000, 550_000];
    const lags = hs.map((lagM, i) => ({ lagM, gamma: gammas[i], pairs: 12 + 3 * i }));
    const fit = fitVariogramDetailed(lags, { model: 'spherical', weighting: 'model' });
    expect(variogramValue(fit.variogram, 3_200)).toBeGreaterThan(0.3 * 550_000);
    expect(fit.rangeAtBound).toBe('upper');
  });

  it('merges bins of one or two pairs into their neighbours', () => {
    const lags = [
      { lagM: 100, gamma: 10, pairs: 1 },
      { lagM: 200, gamma: 30, pairs: 2 },
      { lagM: 300, gamma: 40, pairs: 10 },
      { lagM: 400, gamma: 50, pairs: 10 },
      { lagM: 500, gamma: 52, pairs: 10 },
      { lagM: 600, gamma: 5, pairs: 1 },
    ];
    const fit = fitVariogramDetailed(lags, { model: 'spherical', weighting: 'model' });
    // first three pool to 13 pairs at h = (100 + 400 + 3000)/13, γ = (10 + 60 + 400)/13; the last joins the bin before it
    expect(fit.bins.map((b) => b.pairs)).toEqual([13, 10, 11]);
    expect(fit.bins[0].lagM).toBeCloseTo(3500 / 13, 9);
    expect(fit.bins[0].gamma).toBeCloseTo(470 / 13, 9);
    expect(fit.bins[2].gamma).toBeCloseTo((520 + 5) / 11, 9);
  });
});
