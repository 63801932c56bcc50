import { describe, expect, it } from 'vitest';
import { Matrix, solve } from 'ml-matrix';
import { fitNormalTrend } from '@shared/pressure';

/** Deterministic noise (Park–Miller minimal standard generator, 1988) so the tests are repeatable. */
function noise(seed: number) {
  let state = seed;
  return () => {
    state = (state * 16807) % 2147483647;
    return state / 2147483647 - 0.5;
  };
}

const depths = Array.from({ length: 200 }, (_, i) => 500 + i * 15); // 500 … 3485 m below mudline
// Exponential normal trend with a matrix slowness of 55 us/ft, mudline 180 us/ft, c = 0.0006 /m.
const trueDt = (z: number) => 55 + (180 - 55) * Math.exp(-0.0006 * z);

describe('fitNormalTrend exponential', () => {
  it('recovers the parameters of noise-free data with the matrix fitted', () => {
    const fit = fitNormalTrend(depths, depths.map(trueDt), { model: 'exponential', fromM: 0, toM: 5000 });
    if (fit.model !== 'exponential') throw new Error('wrong model');
    expect(fit.params.matrix).toBeCloseTo(55, 4);
    expect(fit.params.surface).toBeCloseTo(180, 3);
    expect(fit.params.cPerM).toBeCloseTo(0.0006, 8);
    expect(fit.params.matrixFitted).toBe(true);
    expect(fit.r2).toBeCloseTo(1, 10);
    expect(fit.n).toBe(200);
    expect(fit.evaluate(4000)).toBeCloseTo(trueDt(4000), 4);
  });

  it('with a given matrix value fits only the mudline value and the decay', () => {
    const fit = fitNormalTrend(depths, depths.map(trueDt), { model: 'exponential', fromM: 0, toM: 5000, matrixValue: 55 });
    if (fit.model !== 'exponential') throw new Error('wrong model');
    expect(fit.params.matrix).toBe(55);
    expect(fit.params.matrixFitted).toBe(false);
    expect(fit.params.cPerM).toBeCloseTo(0.0006, 8);
    expect(fit.params.surface).toBeCloseTo(180, 4);
  });

  it('on noisy data does at least as well as the true curve (it is the least-squares optimum)', () => {
    const rand = noise(42);
    const values = depths.map((z) => trueDt(z) + 8 * rand());
    const fit = fitNormalTrend(depths, values, { model: 'exponential', fromM: 800, toM: 3000 });
    let sseFit = 0;
    let sseTrue = 0;
    depths.forEach((z, i) => {
      if (z < 800 || z > 3000) return;
      sseFit += (values[i] - (fit.evaluate(z) as number)) ** 2;
      sseTrue += (values[i] - trueDt(z)) ** 2;
    });
    expect(sseFit).toBeLessThanOrEqual(sseTrue);
    expect(fit.r2).toBeGreaterThan(0.8);
    expect(fit.r2).toBeLessThan(1);
  });

  it('skips NaN samples and evaluates curves', () => {
    const values = depths.map((z, i) => (i % 7 === 0 ? NaN : trueDt(z)));
    const fit = fitNormalTrend(depths, values, { model: 'exponential', fromM: 0, toM: 5000 });
    expect(fit.n).toBe(200 - Math.ceil(200 / 7));
    const curve = fit.evaluate(new Float64Array([1000, 2000]));
    expect(curve).toBeInstanceOf(Float64Array);
    expect(curve[1]).toBeCloseTo(trueDt(2000), 4);
  });
});

describe('fitNormalTrend loglinear', () => {
  it('recovers log10(R) = a + b·z exactly (Hottmann & Johnson 1965 form)', () => {
    const values = depths.map((z) => 10 ** (-0.1 + 0.00015 * z));
    const fit = fitNormalTrend(depths, values, { model: 'loglinear', fromM: 0, toM: 5000 });
    if (fit.model !== 'loglinear') throw new Error('wrong model');
    expect(fit.params.a).toBeCloseTo(-0.1, 10);
    expect(fit.params.b).toBeCloseTo(0.00015, 12);
    expect(fit.evaluate(3000)).toBeCloseTo(10 ** (-0.1 + 0.45), 9);
  });

  it('agrees with a QR least-squares solve from ml-matrix on noisy data', () => {
    const rand = noise(7);
    const inRange = depths.filter((z) => z >= 1000 && z <= 3000);
    const values = depths.map((z) => 10 ** (0.2 + 0.0001 * z + 0.05 * rand()));
    const fit = fitNormalTrend(depths, values, { model: 'loglinear', fromM: 1000, toM: 3000 });
    if (fit.model !== 'loglinear') throw new Error('wrong model');
    const X = new Matrix(inRange.map((z) => [1, z]));
    const y = Matrix.columnVector(inRange.map((z) => Math.log10(values[depths.indexOf(z)])));
    const reference = solve(X, y); // ml-matrix: least squares through QR for a tall matrix
    expect(fit.params.a).toBeCloseTo(reference.get(0, 0), 9);
    expect(fit.params.b).toBeCloseTo(reference.get(1, 0), 12);
    expect(fit.n).toBe(inRange.length);
  });
});

describe('fitNormalTrend errors', () => {
  it('throws exact messages', () => {
    expect(() => fitNormalTrend([1, 2, 3, 4], [1, 2, NaN, 4], { model: 'loglinear', fromM: 1.5, toM: 10 })).toThrow(
      new Error('fitNormalTrend: fewer than 3 valid points between 1.5 m and 10 m (found 2)'),
    );
    expect(() => fitNormalTrend([1, 2, 3], [1, 2, 3], { model: 'loglinear', fromM: 5, toM: 5 })).toThrow(
      new Error('fitNormalTrend: toM must be greater than fromM (got 5 and 5)'),
    );
    expect(() => fitNormalTrend([1, 2, 3], [1, 0, 3], { model: 'loglinear', fromM: 0, toM: 5 })).toThrow(
      new Error('fitNormalTrend: loglinear values must be > 0 (got 0 at 2 m)'),
    );
    expect(() => fitNormalTrend([1, 3, 2], [1, 2, 3], { model: 'loglinear', fromM: 0, toM: 5 })).toThrow(
      new Error('fitNormalTrend: depthM must be sorted ascending (depthM[2] = 2 after 3)'),
    );
    expect(() => fitNormalTrend([1, 2, 3], [1, 2, 3], { model: 'loglinear', fromM: -5, toM: 5 })).toThrow(
      new Error('fitNormalTrend: fromM must be >= 0 (got -5)'),
    );
    expect(() => fitNormalTrend([1, 2], [1, 2, 3], { model: 'loglinear', fromM: 0, toM: 5 })).toThrow(
      new Error('fitNormalTrend: values has length 3 but depthM has length 2'),
    );
    expect(() => fitNormalTrend([1, 2, 3], [1, 2, 3], { model: 'power' as 'loglinear', fromM: 0, toM: 5 })).toThrow(
      new Error('fitNormalTrend: model must be "exponential" or "loglinear" (got "power")'),
    );
    expect(() => fitNormalTrend([2, 2, 2], [1, 2, 3], { model: 'exponential', fromM: 0, toM: 5 })).toThrow(
      new Error('fitNormalTrend: all points in range are at the same depth'),
    );
  });
});
