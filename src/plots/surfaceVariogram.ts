import { scaleSqrt } from 'd3';
import { variogramValue } from '@shared/interpolation';
import type { Surface } from '@shared/schemas/surfaces';

export type SurfaceVariogram = NonNullable<Surface['variogram']>;

/** One point of a chart series: lag in km, semivariance in m². */
export interface LagPoint {
  lagKm: number;
  gammaM2: number;
}

/**
 * The model curve γ(h) from h = 0 to `maxLagM` in `samples` even steps, for the chart (lags in km).
 * The nugget shows as the jump between the first two points.
 * @example variogramCurve({ model: 'spherical', nugget: 0, sill: 100, range: 10_000 }, 20_000, 3) // [{0,0},{10,100},{20,100}]
 */
export function variogramCurve(model: SurfaceVariogram['model'], maxLagM: number, samples = 120): LagPoint[] {
  if (!Number.isFinite(maxLagM) || maxLagM <= 0) throw new Error(`maxLagM must be a positive distance, got ${maxLagM}`);
  if (!Number.isInteger(samples) || samples < 2) throw new Error(`samples must be an integer ≥ 2, got ${samples}`);
  const out: LagPoint[] = [];
  for (let k = 0; k < samples; k++) {
    const h = (maxLagM * k) / (samples - 1);
    out.push({ lagKm: h / 1000, gammaM2: variogramValue(model, h) });
  }
  return out;
}

/** An experimental lag as drawn: position and a radius whose AREA grows with the pair count. */
export interface ExperimentalMark extends LagPoint {
  pairs: number;
  radiusPx: number;
}

/**
 * Experimental semivariances as chart marks; circle area proportional to the number of pairs, so the
 * eye weighs the well-supported lags more.
 * @example experimentalMarks([{ lagM: 2000, gamma: 50, pairs: 40 }], [2, 8]) // [{ lagKm: 2, gammaM2: 50, pairs: 40, radiusPx: 8 }]
 */
export function experimentalMarks(lags: SurfaceVariogram['experimental'], radiusRangePx: [number, number] = [2.5, 9]): ExperimentalMark[] {
  const maxPairs = Math.max(1, ...lags.map((l) => l.pairs));
  const radius = scaleSqrt().domain([0, maxPairs]).range([0, radiusRangePx[1]]);
  return lags.map((l) => ({
    lagKm: l.lagM / 1000,
    gammaM2: l.gamma,
    pairs: l.pairs,
    radiusPx: Math.max(radiusRangePx[0], radius(l.pairs)),
  }));
}

/**
 * How far the chart's lag axis reaches, m: past the last experimental lag and the model range, but no further
 * than twice the last lag, so a fitted range far beyond the data does not squeeze the points into a corner.
 * @example variogramMaxLagM({ model: { model: 'spherical', nugget: 0, sill: 1, range: 9000 }, experimental: [{ lagM: 12000, gamma: 1, pairs: 3 }], fitted: true }) // 13200
 */
export function variogramMaxLagM(v: SurfaceVariogram): number {
  const lastLag = Math.max(0, ...v.experimental.map((l) => l.lagM));
  if (lastLag === 0) return v.model.range * 1.1;
  return Math.min(Math.max(lastLag, v.model.range), 2 * lastLag) * 1.1;
}

/**
 * Whether the experimental variogram keeps climbing well past the model's total sill — the mark of a regional trend
 * (the TOP deepening away from a depocentre), which no stationary model follows at long lags. The fit then follows the
 * short lags that govern the estimate between nearby wells, and the chart should say so. Read on the outer lags: those
 * beyond the range, or the outer third when the range reaches the last lag (the fit bounds it there); "well past" is
 * their mean above twice the total sill (common practice, no source).
 * @example risesPastSill({ model: { model: 'spherical', nugget: 0, sill: 10, range: 1000 }, experimental: [{ lagM: 2000, gamma: 50, pairs: 9 }], fitted: true }) // true
 */
export function risesPastSill(v: SurfaceVariogram): boolean {
  const lastLag = Math.max(0, ...v.experimental.map((l) => l.lagM));
  const from = Math.min(v.model.range, (2 / 3) * lastLag);
  const outer = v.experimental.filter((l) => l.lagM > from);
  if (outer.length === 0) return false;
  const mean = outer.reduce((a, l) => a + l.gamma, 0) / outer.length;
  return mean > 2 * (v.model.nugget + v.model.sill);
}
