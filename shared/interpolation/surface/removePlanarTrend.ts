import { fitPlanarTrend, type PlanarTrend } from '../planarTrend';
import type { DataPoint } from '../types';
import { SurfaceInputError } from './types';

/**
 * Regression kriging's first step: a least-squares plane takes out the regional trend and the residuals are
 * kriged; the plane is added back afterwards (its own estimation error is not in the variance).
 * `scale` and `unit` only word the warning in the quantity's SI unit.
 * @example removePlanarTrend(data, 1, 'm').warning // 'A planar regional trend was removed … (rising 12.5 m per km toward 90°) …'
 */
export function removePlanarTrend(
  data: readonly DataPoint[],
  scale: number,
  unit: string,
): { trend: PlanarTrend; residuals: DataPoint[]; warning: string } {
  if (data.length < 4) throw new SurfaceInputError('Removing a planar trend needs at least 4 wells; krige without it, or add wells.');
  const trend = fitPlanarTrend(data);
  const residuals = data.map((d) => ({ ...d, value: d.value - trend.evaluate(d.x, d.y) }));
  const perKm = Math.hypot(trend.b, trend.c) * 1000 * scale;
  const towards = ((Math.atan2(trend.b, trend.c) * 180) / Math.PI + 360) % 360;
  const warning = `A planar regional trend was removed before kriging (rising ${Number(perKm.toPrecision(3))} ${unit} per km toward ${Math.round(towards)}°); the variogram is of the residuals.`;
  return { trend, residuals, warning };
}
