import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { covariance, ordinaryKriging, type DataPoint, type Target, type Variogram } from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';
import { ISAAKS_SRIVASTAVA_POINTS, ISAAKS_SRIVASTAVA_TARGET, ISAAKS_SRIVASTAVA_VARIOGRAM } from './fixtures';

/**
 * Independent reference: the ordinary-kriging system [C 1; 1ᵀ 0]·[w; μ] = [c0; 1] solved by ml-matrix,
 * variance = C(0) − Σ w·c0 − μ (Isaaks & Srivastava 1989, ch. 12).
 */
function mlMatrixKriging(
  points: readonly DataPoint[],
  v: Variogram,
  target: Target,
): { value: number; variance: number; weights: number[]; mu: number } {
  const n = points.length;
  const A = new Matrix(n + 1, n + 1);
  const b = new Matrix(n + 1, 1);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) A.set(i, j, covariance(v, Math.hypot(points[i].x - points[j].x, points[i].y - points[j].y)));
    A.set(i, n, 1);
    A.set(n, i, 1);
    b.set(i, 0, covariance(v, Math.hypot(points[i].x - target.x, points[i].y - target.y)));
  }
  b.set(n, 0, 1);
  const x = solve(A, b).getColumn(0);
  const weights = x.slice(0, n);
  const mu = x[n];
  const value = weights.reduce((s, w, i) => s + w * points[i].value, 0);
  const variance = covariance(v, 0) - weights.reduce((s, w, i) => s + w * b.get(i, 0), 0) - mu;
  return { value, variance, weights, mu };
}

function randomPoints(n: number, seed: number, size = 1000): DataPoint[] {
  const random = mulberry32(seed);
  return Array.from({ length: n }, () => {
    const x = random() * size;
    const y = random() * size;
    return { x, y, value: 50 + 0.05 * x - 0.03 * y + 10 * Math.sin(x / 150) + 5 * random() };
  });
}

describe('ordinaryKriging: Isaaks & Srivastava (1989) ch. 12 worked example', () => {
  const [result] = ordinaryKriging(ISAAKS_SRIVASTAVA_POINTS, ISAAKS_SRIVASTAVA_VARIOGRAM, [ISAAKS_SRIVASTAVA_TARGET], {
    returnWeights: true,
  });

  it('gives the published estimate, weights and variance', () => {
    // Isaaks & Srivastava 1989, ch. 12: estimate 592.7 ppm, ordinary-kriging variance 8.96 ppm², weights
    // 0.173, 0.318, 0.129, 0.086, 0.151, 0.057, 0.086 (values recalled from memory)
    expect(result.value).toBeCloseTo(592.7, 1);
    expect(result.variance).toBeCloseTo(8.96, 2);
    const published = [0.173, 0.318, 0.129, 0.086, 0.151, 0.057, 0.086];
    result.weights!.forEach((w, i) => {
      expect(w.index).toBe(i);
      expect(Math.abs(w.weight - published[i])).toBeLessThan(0.0015);
    });
  });

  it('matches an independent ml-matrix solve of the same system: weights, Lagrange multiplier, variance', () => {
    const ref = mlMatrixKriging(ISAAKS_SRIVASTAVA_POINTS, ISAAKS_SRIVASTAVA_VARIOGRAM, ISAAKS_SRIVASTAVA_TARGET);
    result.weights!.forEach((w, i) => expect(w.weight).toBeCloseTo(ref.weights[i], 12));
    expect(result.lagrangeMultiplier).toBeCloseTo(ref.mu, 12);
    expect(result.value).toBeCloseTo(ref.value, 9);
    expect(result.variance).toBeCloseTo(ref.variance, 12);
    expect(result.weights!.reduce((s, w) => s + w.weight, 0)).toBeCloseTo(1, 14);
  });
});

describe('ordinaryKriging against ml-matrix on random data', () => {
  const points = randomPoints(40, 3);
  const targets = [...randomPoints(25, 4).map(({ x, y }) => ({ x, y })), { x: -300, y: 1500 }];
  const models: Variogram[] = [
    { model: 'exponential', nugget: 1, sill: 20, range: 400 },
    { model: 'spherical', nugget: 0, sill: 15, range: 350 },
    { model: 'gaussian', nugget: 0.5, sill: 15, range: 300 },
  ];

  it.each(models)('all points, $model: same estimates and variances, Σw = 1, variance ≥ 0', (v) => {
    const ours = ordinaryKriging(points, v, targets, { returnWeights: true });
    ours.forEach((r, t) => {
      const ref = mlMatrixKriging(points, v, targets[t]);
      expect(r.value).toBeCloseTo(ref.value, 7);
      expect(r.variance).toBeCloseTo(ref.variance, 7);
      expect(r.lagrangeMultiplier!).toBeCloseTo(ref.mu, 7);
      r.weights!.forEach((w) => expect(w.weight).toBeCloseTo(ref.weights[w.index], 8));
      expect(r.weights!.reduce((s, w) => s + w.weight, 0)).toBeCloseTo(1, 10);
      expect(r.variance).toBeGreaterThanOrEqual(0);
    });
  });

  it.each(models)('16 neighbours, $model: equals ml-matrix on the 16 nearest found by brute force', (v) => {
    const ours = ordinaryKriging(points, v, targets, { maxNeighbours: 16, returnWeights: true });
    ours.forEach((r, t) => {
      const nearest = points
        .map((p, i) => ({ p, i, d: Math.hypot(p.x - targets[t].x, p.y - targets[t].y) }))
        .sort((a, b) => a.d - b.d)
        .slice(0, 16);
      const ref = mlMatrixKriging(
        nearest.map((e) => e.p),
        v,
        targets[t],
      );
      expect(r.weights!.map((w) => w.index).sort((a, b) => a - b)).toEqual(nearest.map((e) => e.i).sort((a, b) => a - b));
      expect(r.value).toBeCloseTo(ref.value, 7);
      expect(r.variance).toBeCloseTo(ref.variance, 7);
      expect(r.variance).toBeGreaterThanOrEqual(0);
    });
  });

  it('honours the data with zero nugget: value = datum, variance 0 (both modes)', () => {
    const v: Variogram = { model: 'exponential', nugget: 0, sill: 20, range: 400 };
    for (const options of [{}, { maxNeighbours: 8 }]) {
      const r = ordinaryKriging(points, v, points, options);
      r.forEach((e, i) => {
        expect(e.value).toBeCloseTo(points[i].value, 8);
        expect(e.variance).toBeCloseTo(0, 8);
      });
    }
  });

  it('tends to the plain mean with a pure nugget model far from the data', () => {
    // pure nugget: every datum is uncorrelated, so OK weights are all 1/n (Isaaks & Srivastava 1989, ch. 12)
    const r = ordinaryKriging(points, { model: 'spherical', nugget: 3, sill: 0, range: 1 }, [{ x: 500.5, y: 500.5 }], {
      returnWeights: true,
    })[0];
    const mean = points.reduce((s, p) => s + p.value, 0) / points.length;
    expect(r.value).toBeCloseTo(mean, 10);
    r.weights!.forEach((w) => expect(w.weight).toBeCloseTo(1 / points.length, 12));
    expect(r.variance).toBeCloseTo(3 + 3 / points.length, 10);
  });
});

describe('ordinaryKriging input checks', () => {
  const v: Variogram = { model: 'exponential', nugget: 0, sill: 1, range: 10 };
  const pts = [
    { x: 0, y: 0, value: 1 },
    { x: 5, y: 0, value: 2 },
  ];
  it('rejects duplicates, too few points, bad targets and options', () => {
    expect(() => ordinaryKriging([...pts, { x: 5, y: 0, value: 7 }], v, [{ x: 1, y: 1 }])).toThrow('Duplicate location at (5, 0)');
    expect(() => ordinaryKriging([pts[0]], v, [{ x: 1, y: 1 }])).toThrow('Ordinary kriging needs at least 2 points, got 1');
    expect(() => ordinaryKriging(pts, v, [{ x: 1, y: Number.NaN }])).toThrow('Target 0: x and y must be finite numbers');
    expect(() => ordinaryKriging(pts, v, [{ x: 1, y: 1 }], { maxNeighbours: 0 })).toThrow('maxNeighbours must be an integer ≥ 1, got 0');
    expect(() => ordinaryKriging(pts, { ...v, range: Number.NaN }, [{ x: 1, y: 1 }])).toThrow(
      'variogram.range must be a finite number, got NaN',
    );
    expect(() => ordinaryKriging([{ x: 0, y: 0, value: Number.POSITIVE_INFINITY }, pts[1]], v, [])).toThrow(
      'Point 0: value must be a finite number, got Infinity',
    );
  });
});
