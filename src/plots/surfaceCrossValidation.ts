import type { Surface } from '@shared/schemas/surfaces';

/** One well in the predicted-vs-observed chart, both in the display unit. */
export interface CrossValidationPoint {
  name: string;
  observed: number;
  predicted: number;
  residual: number;
}

/**
 * Wells with a leave-one-out prediction, scaled to the display unit by `factor` (1 for metres).
 * Wells without a prediction (merged duplicates, flat input) are left out.
 * @example crossValidationPoints([{ name: 'A', value: 2000, predicted: 2010, … }], 1) // [{ name: 'A', observed: 2000, predicted: 2010, residual: 10 }]
 */
export function crossValidationPoints(wells: Surface['wells'], factor = 1): CrossValidationPoint[] {
  if (!Number.isFinite(factor) || factor <= 0) throw new Error(`factor must be a positive number, got ${factor}`);
  return wells
    .filter((w) => w.predicted !== null)
    .map((w) => ({
      name: w.name,
      observed: w.value * factor,
      predicted: (w.predicted as number) * factor,
      residual: ((w.predicted as number) - w.value) * factor,
    }));
}

/**
 * One domain for both axes so the 1:1 line is the diagonal, padded by `padFraction` of the span.
 * @example oneToOneDomain([{ observed: 2000, predicted: 2100 }, { observed: 2200, predicted: 2150 }], 0.05) // [1990, 2210]
 */
export function oneToOneDomain(
  points: readonly Pick<CrossValidationPoint, 'observed' | 'predicted'>[],
  padFraction = 0.05,
): [number, number] {
  if (points.length === 0) return [0, 1];
  const all = points.flatMap((p) => [p.observed, p.predicted]);
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const pad = (hi - lo || Math.abs(hi) || 1) * padFraction;
  return [lo - pad, hi + pad];
}

/**
 * Root-mean-square and mean of residuals, to show beside the chart in the display unit.
 * @example residualStats([3, -4]) // { rmse: 3.5355…, meanError: -0.5 }
 */
export function residualStats(residuals: readonly number[]): { rmse: number; meanError: number } {
  if (residuals.length === 0) throw new Error('residualStats needs at least one residual');
  const n = residuals.length;
  return {
    rmse: Math.sqrt(residuals.reduce((s, r) => s + r * r, 0) / n),
    meanError: residuals.reduce((s, r) => s + r, 0) / n,
  };
}
