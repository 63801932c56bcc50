import { describe, expect, it } from 'vitest';
import type { Surface } from '@shared/schemas/surfaces';
import { crossValidationPoints, oneToOneDomain, residualStats } from './surfaceCrossValidation';

const well = (name: string, value: number, predicted: number | null): Surface['wells'][number] => ({
  wellId: '00000000-0000-4000-8000-000000000000',
  name,
  lon: 0,
  lat: 0,
  value,
  interpretationVersion: 1,
  residual: predicted === null ? null : predicted - value,
  predicted,
  looStdDev: null,
});

describe('crossValidationPoints', () => {
  it('pairs each pick with its leave-one-out prediction and drops wells without one', () => {
    const points = crossValidationPoints([well('A', 2000, 2010), well('B', 2500, null), well('C', 3000, 2950)]);
    expect(points).toEqual([
      { name: 'A', observed: 2000, predicted: 2010, residual: 10 },
      { name: 'C', observed: 3000, predicted: 2950, residual: -50 },
    ]);
  });

  it('scales to feet with the international foot (0.3048 m exactly, NIST SP 811 B.9)', () => {
    const [p] = crossValidationPoints([well('A', 3048, 3048 + 30.48)], 1 / 0.3048);
    expect(p.observed).toBeCloseTo(10_000, 8);
    expect(p.residual).toBeCloseTo(100, 8);
  });
});

describe('oneToOneDomain', () => {
  it('spans both axes with 5 % padding', () => {
    expect(
      oneToOneDomain([
        { observed: 2000, predicted: 2100 },
        { observed: 2200, predicted: 2150 },
      ]),
    ).toEqual([1990, 2210]);
  });
});

describe('residualStats', () => {
  it('gives the root mean square and the mean of the residuals', () => {
    // √((9 + 16)/2) = √12.5 = 3.5355…, mean (3 − 4)/2 = −0.5.
    const s = residualStats([3, -4]);
    expect(s.rmse).toBeCloseTo(Math.sqrt(12.5), 12);
    expect(s.meanError).toBe(-0.5);
  });

  it('refuses an empty list', () => {
    expect(() => residualStats([])).toThrow('residualStats needs at least one residual');
  });
});
