import { krigingNeighbours } from '../../schemas/surfaces';
import { leaveOneOut, type LeaveOneOutMethod, type LeaveOneOutResult } from '../leaveOneOut';
import type { DataPoint } from '../types';
import type { CellEstimates } from './estimateCells';
import type { SurfaceParams } from './types';

/** The grid's neighbour rule applied to leave-one-out, where each estimate has one datum fewer. */
function looNeighbours(maxNeighbours: number | null, wells: number): number | undefined {
  const k = krigingNeighbours(maxNeighbours, wells);
  return k === undefined ? undefined : Math.min(k, wells - 1);
}

/**
 * Leave-one-out cross-validation of the run, in the solved unit, on the wells' own values. With a planar trend the
 * run is universal kriging, so each fold re-estimates the plane without the well it leaves out.
 * @example crossValidate(data, cells, params.method).rmse
 */
export function crossValidate(data: readonly DataPoint[], cells: CellEstimates, method: SurfaceParams['method']): LeaveOneOutResult {
  if (cells.flat)
    return { rmse: 0, meanError: 0, residuals: data.map((d, index) => ({ index, observed: d.value, predicted: d.value, residual: 0 })) };
  const loo: LeaveOneOutMethod =
    method.kind === 'kriging' && cells.variogram
      ? {
          kind: 'kriging',
          variogram: cells.variogram.variogram,
          maxNeighbours: looNeighbours(method.maxNeighbours, data.length),
          drift: cells.trend ? 'linear' : 'constant',
        }
      : { kind: 'idw', power: method.kind === 'idw' ? method.power : 2 };
  return leaveOneOut(data, loo);
}
