import { describe, expect, it } from 'vitest';
import { covariance, experimentalVariogram, variogramValue, type Variogram } from '@shared/interpolation/index';

describe('variogram models (GSLIB convention, Deutsch & Journel 1998)', () => {
  const base = { nugget: 1, sill: 4, range: 100 };
  it('reach 95 % of the partial sill at the practical range (exponential, gaussian) and the full sill (spherical)', () => {
    // exponential 1 − exp(−3h/a), gaussian 1 − exp(−3h²/a²): at h = a both give 1 − e^−3 = 0.950213
    expect(variogramValue({ model: 'exponential', ...base }, 100)).toBeCloseTo(1 + 4 * (1 - Math.exp(-3)), 12);
    expect(variogramValue({ model: 'gaussian', ...base }, 100)).toBeCloseTo(1 + 4 * (1 - Math.exp(-3)), 12);
    expect(variogramValue({ model: 'spherical', ...base }, 100)).toBe(5);
    expect(variogramValue({ model: 'spherical', ...base }, 250)).toBe(5);
    // spherical 1.5h/a − 0.5(h/a)³ at h = a/2: 0.6875
    expect(variogramValue({ model: 'spherical', ...base }, 50)).toBeCloseTo(1 + 4 * 0.6875, 12);
    // gaussian at h = a/2: 1 − e^−0.75
    expect(variogramValue({ model: 'gaussian', ...base }, 50)).toBeCloseTo(1 + 4 * (1 - Math.exp(-0.75)), 12);
  });

  it('has γ(0) = 0 with the nugget as a jump, and C(h) = nugget + sill − γ(h)', () => {
    const v: Variogram = { model: 'exponential', ...base };
    expect(variogramValue(v, 0)).toBe(0);
    expect(variogramValue(v, 1e-9)).toBeCloseTo(1, 6);
    expect(covariance(v, 0)).toBe(5);
    expect(covariance(v, 30)).toBeCloseTo(4 * Math.exp(-0.9), 12);
    // Isaaks & Srivastava 1989 ch. 12: C(h) = 10·e^(−0.3h) is sill 10, practical range 10
    expect(covariance({ model: 'exponential', nugget: 0, sill: 10, range: 10 }, 2.5)).toBeCloseTo(10 * Math.exp(-0.75), 12);
  });

  it('rejects bad variograms and distances', () => {
    expect(() => variogramValue({ model: 'cubic' as never, ...base }, 1)).toThrow('Unknown variogram model: cubic');
    expect(() => variogramValue({ model: 'spherical', ...base, range: 0 }, 1)).toThrow('variogram.range must be > 0, got 0');
    expect(() => variogramValue({ model: 'spherical', ...base, nugget: -1 }, 1)).toThrow('variogram.nugget must be ≥ 0, got -1');
    expect(() => variogramValue({ model: 'spherical', nugget: 0, sill: 0, range: 5 }, 1)).toThrow(
      'variogram total sill (nugget + sill) must be > 0',
    );
    expect(() => covariance({ model: 'spherical', ...base }, -1)).toThrow('h must be a finite distance ≥ 0, got -1');
  });
});

describe('experimentalVariogram', () => {
  it('averages ½(zi − zj)² over pairs in [k·w, (k+1)·w) bins (computed by hand)', () => {
    // unit square corners + centre; pairs: 4 sides (h = 1), 2 diagonals (h = √2), 4 centre spokes (h = √2/2)
    const pts = [
      { x: 0, y: 0, value: 1 },
      { x: 1, y: 0, value: 2 },
      { x: 1, y: 1, value: 4 },
      { x: 0, y: 1, value: 3 },
      { x: 0.5, y: 0.5, value: 2.5 },
    ];
    const lags = experimentalVariogram(pts, { lags: 3, lagWidth: 0.5 });
    // bin [0.5, 1): spokes, (1.5² + 0.5² + 1.5² + 0.5²)/(2·4) = 0.625
    // bin [1, 1.5): sides (1 + 4 + 1 + 4)/(2·4) = 1.25 and diagonals (9 + 1)/(2·2) = 2.5 → (10 + 10)/(2·6) = 5/3
    expect(lags).toHaveLength(2);
    expect(lags[0].pairs).toBe(4);
    expect(lags[0].lagM).toBeCloseTo(Math.SQRT1_2, 12);
    expect(lags[0].gamma).toBeCloseTo(0.625, 12);
    expect(lags[1].pairs).toBe(6);
    expect(lags[1].lagM).toBeCloseTo((4 + 2 * Math.SQRT2) / 6, 12);
    expect(lags[1].gamma).toBeCloseTo(5 / 3, 12);
  });

  it('rejects bad options and points', () => {
    const pts = [
      { x: 0, y: 0, value: 1 },
      { x: 1, y: 0, value: 2 },
    ];
    expect(() => experimentalVariogram(pts, { lags: 0, lagWidth: 1 })).toThrow('lags must be an integer ≥ 1, got 0');
    expect(() => experimentalVariogram(pts, { lags: 2, lagWidth: -1 })).toThrow('lagWidth must be a finite number > 0, got -1');
    expect(() => experimentalVariogram([pts[0]], { lags: 2, lagWidth: 1 })).toThrow(
      'An experimental variogram needs at least 2 points, got 1',
    );
    expect(() => experimentalVariogram([pts[0], { x: 0, y: 0, value: 5 }], { lags: 2, lagWidth: 1 })).toThrow(
      'Duplicate location at (0, 0)',
    );
    expect(() => experimentalVariogram([pts[0], { x: 1, y: Number.NaN, value: 5 }], { lags: 2, lagWidth: 1 })).toThrow(
      'Point 1: y must be a finite number, got NaN',
    );
  });
});
