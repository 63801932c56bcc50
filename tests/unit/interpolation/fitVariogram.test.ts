import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import {
  covariance,
  experimentalVariogram,
  fitVariogram,
  variogramValue,
  type Variogram,
  type VariogramLag,
} from '@shared/interpolation/index';
import { mulberry32 } from '@shared/random/mulberry32';

function exactLags(v: Variogram, hs: number[]): VariogramLag[] {
  return hs.map((h, i) => ({ lagM: h, gamma: variogramValue(v, h), pairs: 20 + 7 * i }));
}

describe('fitVariogram', () => {
  const hs = [5, 10, 15, 20, 30, 40, 50, 65, 80, 100];
  it.each([
    { model: 'spherical', nugget: 0.5, sill: 3, range: 60 },
    { model: 'exponential', nugget: 2, sill: 8, range: 45 },
    { model: 'gaussian', nugget: 0.2, sill: 5, range: 50 },
    { model: 'exponential', nugget: 0, sill: 1, range: 70 },
  ] as Variogram[])('recovers $model (nugget $nugget, sill $sill, range $range) from exact model values', (truth) => {
    const fit = fitVariogram(exactLags(truth, hs), { model: truth.model });
    expect(fit.model).toBe(truth.model);
    expect(fit.nugget).toBeCloseTo(truth.nugget, 4);
    expect(fit.sill / truth.sill).toBeCloseTo(1, 4);
    expect(fit.range / truth.range).toBeCloseTo(1, 4);
  });

  it('keeps a given nugget fixed', () => {
    const truth: Variogram = { model: 'spherical', nugget: 1, sill: 2, range: 40 };
    const fit = fitVariogram(exactLags(truth, hs), { model: 'spherical', nugget: 1 });
    expect(fit.nugget).toBe(1);
    expect(fit.sill).toBeCloseTo(2, 5);
    expect(fit.range).toBeCloseTo(40, 3);
    const wrong = fitVariogram(exactLags(truth, hs), { model: 'spherical', nugget: 0 });
    expect(wrong.nugget).toBe(0);
  });

  it('recovers a known exponential model from simulated Gaussian fields (tolerance reflects sampling noise)', () => {
    // 300 random sites in 200 m × 200 m, z = L·ε with C = LLᵀ (ml-matrix Cholesky) of the known model;
    // experimental variograms pooled over 12 seeded realisations to tame the sampling noise.
    const truth: Variogram = { model: 'exponential', nugget: 0.5, sill: 4, range: 60 };
    const random = mulberry32(2024);
    const n = 300;
    const sites = Array.from({ length: n }, () => ({ x: random() * 200, y: random() * 200 }));
    const C = new Matrix(n, n);
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) C.set(i, j, covariance(truth, Math.hypot(sites[i].x - sites[j].x, sites[i].y - sites[j].y)));
    const L = new CholeskyDecomposition(C).lowerTriangularMatrix;
    const gaussian = (): number => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random()); // Box & Muller 1958
    const pooled = new Map<number, { h: number; g: number; n: number }>();
    for (let r = 0; r < 12; r++) {
      const eps = Matrix.columnVector(Array.from({ length: n }, gaussian));
      const z = L.mmul(eps).getColumn(0);
      const lags = experimentalVariogram(
        sites.map((s, i) => ({ ...s, value: z[i] })),
        { lags: 12, lagWidth: 10 },
      );
      lags.forEach((l, k) => {
        const p = pooled.get(k) ?? { h: 0, g: 0, n: 0 };
        pooled.set(k, { h: p.h + l.lagM * l.pairs, g: p.g + l.gamma * l.pairs, n: p.n + l.pairs });
      });
    }
    const experimental = [...pooled.values()].map((p) => ({ lagM: p.h / p.n, gamma: p.g / p.n, pairs: p.n }));
    const fit = fitVariogram(experimental, { model: 'exponential' });
    expect(Math.abs(fit.range / truth.range - 1)).toBeLessThan(0.3);
    expect(Math.abs((fit.nugget + fit.sill) / (truth.nugget + truth.sill) - 1)).toBeLessThan(0.25);
    expect(Math.abs(fit.nugget - truth.nugget)).toBeLessThan(0.5);
  });

  it('rejects bad input', () => {
    const lags = exactLags({ model: 'spherical', nugget: 0, sill: 1, range: 30 }, [5, 10, 20]);
    expect(() => fitVariogram(lags, { model: 'linear' as never })).toThrow('Unknown variogram model: linear');
    expect(() => fitVariogram(lags.slice(0, 2), { model: 'spherical' })).toThrow('fitVariogram needs at least 3 lag bins, got 2');
    expect(() => fitVariogram(lags.slice(0, 1), { model: 'spherical', nugget: 0 })).toThrow(
      'fitVariogram needs at least 2 lag bins, got 1',
    );
    expect(() => fitVariogram(lags, { model: 'spherical', nugget: -1 })).toThrow('nugget must be a finite number ≥ 0, got -1');
    expect(() => fitVariogram([...lags, { lagM: 4, gamma: Number.NaN, pairs: 3 }], { model: 'spherical' })).toThrow(
      'Lag 3: gamma must be a finite number ≥ 0, got NaN',
    );
    expect(() =>
      fitVariogram(
        lags.map((l) => ({ ...l, gamma: 0 })),
        { model: 'spherical' },
      ),
    ).toThrow('fitVariogram: every semivariance is zero, so there is nothing to fit');
  });
});
