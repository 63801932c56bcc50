import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { fitPlanarTrend } from '@shared/interpolation';

describe('fitPlanarTrend', () => {
  it('recovers an exact plane', () => {
    const pts = [
      [0, 0],
      [5000, 0],
      [0, 8000],
      [7000, 9000],
      [-3000, 4000],
    ].map(([x, y]) => ({ x, y, value: 2500 + 0.012 * x - 0.02 * y }));
    const t = fitPlanarTrend(pts);
    expect(t.b).toBeCloseTo(0.012, 12);
    expect(t.c).toBeCloseTo(-0.02, 12);
    expect(t.evaluate(10_000, -2000)).toBeCloseTo(2500 + 120 + 40, 8);
  });

  it('agrees with the least-squares solution of ml-matrix on scattered noisy points', () => {
    // Reference: ml-matrix `solve` of the over-determined system [1 x y]·β = v (QR least squares).
    let seed = 7;
    const rand = () => (seed = (seed * 16807) % 2147483647) / 2147483647;
    const pts = Array.from({ length: 40 }, () => {
      const x = rand() * 80_000;
      const y = rand() * 60_000;
      return { x, y, value: 3000 - 0.01 * x + 0.004 * y + (rand() - 0.5) * 200 };
    });
    const beta = solve(new Matrix(pts.map((p) => [1, p.x, p.y])), Matrix.columnVector(pts.map((p) => p.value))).to1DArray();
    const t = fitPlanarTrend(pts);
    for (const p of pts.slice(0, 10)) expect(t.evaluate(p.x, p.y)).toBeCloseTo(beta[0] + beta[1] * p.x + beta[2] * p.y, 6);
  });

  it('refuses too few points and points on one line', () => {
    expect(() =>
      fitPlanarTrend([
        { x: 0, y: 0, value: 1 },
        { x: 1, y: 1, value: 2 },
      ]),
    ).toThrow('fitPlanarTrend: a plane needs at least 3 points, got 2');
    expect(() => fitPlanarTrend([0, 1, 2, 3].map((k) => ({ x: k * 1000, y: k * 1000, value: k })))).toThrow(
      'fitPlanarTrend: the points lie on one line, so no plane is defined',
    );
  });
});
