import { krigingNeighbours } from '../../schemas/surfaces';
import { idw } from '../idw';
import { ordinaryKriging, universalKriging } from '../ordinaryKriging';
import type { PlanarTrend } from '../planarTrend';
import type { DataPoint, Target } from '../types';
import { krigingVariogram, type KrigingVariogram } from './krigingVariogram';
import { removePlanarTrend } from './removePlanarTrend';
import type { CellEstimate, SurfaceParams, SurfaceProgress } from './types';

/** Cells estimated between two progress reports: often enough for a bar to move, rare enough to cost nothing. */
const PROGRESS_CHUNK = 2000;

/** Estimates the targets in chunks so the worker can report progress during the interpolation itself. */
function inChunks<T, R>(targets: readonly T[], estimate: (chunk: T[]) => R[], progress: SurfaceProgress): R[] {
  const out: R[] = [];
  for (let start = 0; start < targets.length; start += PROGRESS_CHUNK) {
    for (const e of estimate(targets.slice(start, start + PROGRESS_CHUNK))) out.push(e);
    progress('interpolating', Math.min(start + PROGRESS_CHUNK, targets.length), targets.length);
  }
  return out;
}

export interface CellEstimates {
  /** One per target, in the quantity's SI unit (variances in its square). */
  estimates: CellEstimate[];
  /** Kriging only; in the solved unit. */
  variogram: KrigingVariogram | null;
  /** The least-squares plane whose residuals gave the variogram, when a planar trend was asked for. */
  trend: PlanarTrend | null;
  /** The values the variogram was fitted to: the data, or their residuals from the plane. */
  krigData: DataPoint[];
  /** True when every well has the same value: the surface is that value everywhere. */
  flat: boolean;
  warnings: string[];
}

/**
 * The value (and, kriging, the variance) at every target from the wells' `data`, which are in the solved unit:
 * the quantity's SI unit divided by `scale`. Ordinary kriging, universal kriging with a planar drift (its variogram
 * fitted to the residuals of a least-squares plane; its variance includes the plane's own error), or inverse-distance
 * weighting, as `method` says.
 * @example estimateCells(data, targets, { kind: 'idw', power: 2 }, { scale: 1, unit: 'm' }).estimates.length === targets.length
 */
export function estimateCells(
  data: DataPoint[],
  targets: readonly Target[],
  method: SurfaceParams['method'],
  { scale, unit }: { scale: number; unit: string },
  progress: SurfaceProgress = () => {},
): CellEstimates {
  const values = data.map((d) => d.value);
  const none = { variogram: null, trend: null, krigData: data, warnings: [] as string[] };
  progress('interpolating', 0, targets.length);
  if (Math.max(...values) - Math.min(...values) === 0) {
    const value = values[0] * scale;
    return {
      ...none,
      flat: true,
      warnings: [`All ${data.length} wells have the same value (${value}): the surface is flat and its kriging variance is zero.`],
      estimates: targets.map(() => ({ value, variance: method.kind === 'kriging' ? 0 : null })),
    };
  }
  if (method.kind === 'idw') {
    const estimates = inChunks(
      targets,
      (chunk) => idw(data, chunk, { power: method.power }).map((value) => ({ value: value * scale, variance: null })),
      progress,
    );
    return { ...none, flat: false, estimates };
  }
  const detrended = method.trend === 'planar' ? removePlanarTrend(data, scale, unit) : null;
  const trend = detrended?.trend ?? null;
  const krigData = detrended?.residuals ?? data;
  const variogram = krigingVariogram(krigData, data, method, scale);
  // All wells up to ALL_WELLS_MAX: one factorisation for every cell and no seams where a neighbour set changes.
  const maxNeighbours = krigingNeighbours(method.maxNeighbours, data.length);
  const krige = trend
    ? (chunk: Target[]) =>
        universalKriging(data, variogram.variogram, chunk, { maxNeighbours: maxNeighbours && Math.max(4, maxNeighbours) })
    : (chunk: Target[]) => ordinaryKriging(data, variogram.variogram, chunk, { maxNeighbours });
  const estimates = inChunks(
    targets,
    (chunk) => krige(chunk).map((e) => ({ value: e.value * scale, variance: e.variance * scale ** 2 })),
    progress,
  );
  const warnings = [...(detrended ? [detrended.warning] : []), ...variogram.warnings];
  return { estimates, variogram, trend, krigData, flat: false, warnings };
}
