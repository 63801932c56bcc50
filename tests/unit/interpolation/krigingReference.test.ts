import { describe, expect, it } from 'vitest';
import { ordinaryKriging, type Variogram } from '@shared/interpolation/index';
import {
  predictAll,
  semivariogramParameters,
  shiftedCovarianceParameters,
  trainWithParameters,
} from '../../bench/reference/sakitamKriging';
import { mulberry32 } from '@shared/random/mulberry32';
import { ISAAKS_SRIVASTAVA_POINTS } from './fixtures';

/**
 * Reference: the npm package @sakitam-gis/kriging (v0.1.0). Its exponential and gaussian models use
 * exp(−h/(A·R)) with A = 1/3, i.e. exp(−3h/R): R is the practical range, as ours; its partial sill is
 * (S − N)/R. It predicts k₀ᵀK⁻¹t with K built from its variogram function and no Σw = 1 constraint, so it is
 * fed C(h) + L (see tests/bench/reference/sakitamKriging.ts): simple kriging with covariance C + L, which tends
 * to ordinary kriging as L grows, with an error O(1/L) (about 5e-3 here at L = 2e4·C(0)). One Richardson step
 * on L and 2L removes that term; the largest difference left is below 1e-6 (gaussian, the worst conditioned),
 * so the tolerance is 1e-5 absolute on values of a few hundred (≈ 2e-8 relative).
 */
describe('ordinaryKriging against @sakitam-gis/kriging', () => {
  const random = mulberry32(99);
  const extra = Array.from({ length: 30 }, () => ({ x: 50 + random() * 40, y: 115 + random() * 40, value: 200 + 600 * random() }));
  const points = [...ISAAKS_SRIVASTAVA_POINTS, ...extra];
  const targets = Array.from({ length: 60 }, () => ({ x: 45 + random() * 50, y: 110 + random() * 50 }));
  const t = points.map((p) => p.value);
  const x = points.map((p) => p.x);
  const y = points.map((p) => p.y);

  it.each([
    { model: 'exponential', nugget: 0, sill: 10, range: 10 },
    { model: 'exponential', nugget: 2, sill: 10, range: 25 },
    { model: 'spherical', nugget: 1, sill: 8, range: 30 },
    { model: 'gaussian', nugget: 0.5, sill: 9, range: 20 },
  ] as Variogram[])('agrees for $model (nugget $nugget, sill $sill, range $range)', (v) => {
    const ours = ordinaryKriging(points, v, targets).map((r) => r.value);
    // Richardson step on the O(1/L) error: 2·p(2L) − p(L) leaves O(1/L²), so a moderate L (little round-off) does
    const shift = 1e4 * (v.nugget + v.sill);
    const p1 = predictAll(trainWithParameters(t, x, y, shiftedCovarianceParameters(v, shift)), targets);
    const p2 = predictAll(trainWithParameters(t, x, y, shiftedCovarianceParameters(v, 2 * shift)), targets);
    let largest = 0;
    ours.forEach((value, i) => {
      largest = Math.max(largest, Math.abs(value - (2 * p2[i] - p1[i])));
    });
    expect(largest).toBeLessThan(1e-5);
  });

  it('as shipped (its semivariogram Gram matrix) it is not ordinary kriging: same at data, different between', () => {
    // with zero nugget both interpolate exactly; between data the reference misses the Σw = 1 constraint
    const v: Variogram = { model: 'exponential', nugget: 0, sill: 10, range: 10 };
    const shipped = trainWithParameters(t, x, y, semivariogramParameters(v));
    const atData = predictAll(shipped, points);
    atData.forEach((value, i) => expect(value).toBeCloseTo(points[i].value, 6));
    const ours = ordinaryKriging(points, v, targets).map((r) => r.value);
    const between = predictAll(shipped, targets);
    const largest = Math.max(...ours.map((value, i) => Math.abs(value - between[i])));
    expect(largest).toBeGreaterThan(1);
  });
});
