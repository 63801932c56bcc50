import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { covariance, leaveOneOut, ordinaryKriging, universalKriging, type Variogram } from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';

const V: Variogram = { model: 'exponential', nugget: 5, sill: 100, range: 3_000 };

function scatter(seed: number, n: number) {
  const random = mulberry32(seed);
  return Array.from({ length: n }, () => {
    const x = random() * 8_000;
    const y = random() * 6_000;
    return { x, y, value: 2_000 + 0.05 * x - 0.03 * y + 20 * (random() - 0.5) };
  });
}

/**
 * Universal kriging with drift 1, x, y written out as in Isaaks & Srivastava (1989, ch. 12 — from memory) and solved
 * by ml-matrix's general solver in raw metres: [C F; Fᵀ 0]·[w; μ] = [c0; f0], σ² = C(0) − wᵀc0 − μᵀf0.
 */
function referenceUk(points: { x: number; y: number; value: number }[], v: Variogram, t: { x: number; y: number }) {
  const n = points.length;
  const K = Matrix.zeros(n + 3, n + 3);
  const r = Matrix.zeros(n + 3, 1);
  points.forEach((p, i) => {
    points.forEach((q, j) => K.set(i, j, covariance(v, Math.hypot(p.x - q.x, p.y - q.y))));
    [1, p.x, p.y].forEach((f, k) => {
      K.set(i, n + k, f);
      K.set(n + k, i, f);
    });
    r.set(i, 0, covariance(v, Math.hypot(p.x - t.x, p.y - t.y)));
  });
  [1, t.x, t.y].forEach((f, k) => r.set(n + k, 0, f));
  const wm = solve(K, r).getColumn(0);
  const value = points.reduce((s, p, i) => s + wm[i] * p.value, 0);
  const variance = covariance(v, 0) - wm.reduce((s, w, i) => s + w * r.get(i, 0), 0);
  return { value, variance };
}

describe('universalKriging', () => {
  const points = scatter(7, 25);
  const targets = [
    { x: 4_000, y: 3_000 },
    { x: 100, y: 5_900 },
    { x: 12_000, y: -2_000 },
  ];

  it('agrees with the system solved independently by ml-matrix, all wells or a neighbourhood holding them all', () => {
    for (const t of targets) {
      const ref = referenceUk(points, V, t);
      for (const maxNeighbours of [undefined, 25]) {
        const [ours] = universalKriging(points, V, [t], { maxNeighbours });
        expect(Math.abs(ours.value - ref.value)).toBeLessThan(1e-7 * Math.abs(ref.value));
        expect(ours.variance / ref.variance).toBeCloseTo(1, 7);
      }
    }
  });

  it('reproduces a plane exactly and, far from the wells, is more uncertain than ordinary kriging of the residuals', () => {
    // a plane lies in the span of the drift, so the weights reproduce it wherever the target is (unbiasedness conditions)
    const plane = points.map((p) => ({ ...p, value: 100 + 0.2 * p.x + 0.1 * p.y }));
    const far = { x: 20_000, y: 15_000 };
    expect(universalKriging(plane, V, [far])[0].value).toBeCloseTo(100 + 0.2 * 20_000 + 0.1 * 15_000, 6);
    const uk = universalKriging(points, V, [far])[0].variance;
    const ok = ordinaryKriging(points, V, [far])[0].variance;
    // the drift's own estimation error: extrapolating the plane 10 km past the wells costs more than the sill
    expect(uk).toBeGreaterThan(ok);
    expect(uk).toBeGreaterThan(covariance(V, 0));
  });

  it('leave-one-out with the drift re-estimated in every fold equals a separate universal kriging per fold', () => {
    const fast = leaveOneOut(points, { kind: 'kriging', variogram: V, drift: 'linear' });
    points.forEach((p, i) => {
      const others = points.filter((_, j) => j !== i);
      const [direct] = universalKriging(others, V, [p]);
      expect(fast.residuals[i].predicted).toBeCloseTo(direct.value, 7);
      expect(fast.residuals[i].stdDev!).toBeCloseTo(Math.sqrt(direct.variance), 7);
    });
    const neighbours = leaveOneOut(points, { kind: 'kriging', variogram: V, drift: 'linear', maxNeighbours: 12 });
    points.forEach((p, i) => {
      const [direct] = universalKriging(
        points.filter((_, j) => j !== i),
        V,
        [p],
        { maxNeighbours: 12 },
      );
      expect(neighbours.residuals[i].predicted).toBeCloseTo(direct.value, 7);
    });
  });

  it('rejects too few wells, a neighbourhood too small for the plane, and wells on one line', () => {
    expect(() => universalKriging(points.slice(0, 3), V, targets)).toThrow(
      'Universal kriging with a planar drift needs at least 4 points, got 3',
    );
    expect(() => universalKriging(points, V, targets, { maxNeighbours: 3 })).toThrow(
      'maxNeighbours must be at least 4 with a planar drift, got 3',
    );
    const line = [0, 1, 2, 3, 4].map((k) => ({ x: 1_000 * k, y: 500 * k, value: k }));
    expect(() => universalKriging(line, V, targets)).toThrow('a planar drift needs wells that are not on one line');
  });
});
