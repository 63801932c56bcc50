import { contourIntervalOf, surfaceSiUnit, type Surface } from '../../schemas/surfaces';
import type { LeaveOneOutResult } from '../leaveOneOut';
import { sigmaCheck } from './sigmaCheck';
import type { DataPoint } from '../types';
import { contourBands, contourLevels } from './contourBands';
import { crossValidate } from './crossValidate';
import { estimateCells } from './estimateCells';
import { extentGrid, type ExtentGrid } from './extentGrid';
import { fillGrid, type FilledGrid } from './fillGrid';
import { localFrame, type LocalFrame } from './localFrame';
import { mergeSameLocation, type MergedPoint } from './mergeSameLocation';
import { SurfaceInputError, type SurfaceInput, type SurfaceInputPoint, type SurfaceProgress, type SurfaceResult } from './types';

/**
 * Pressures are solved in MPa: with sills of ~10¹³ Pa² beside the unit row of the kriging system, the LU's pivot
 * test (relative to the largest entry) would call a sound system singular. Results are scaled back at the end.
 */
const solvedScale = (unit: string) => (unit === 'Pa' ? 1e6 : 1);

/** The grid's frame, values, standard deviations and lon/lat corners. */
function gridOf(frame: LocalFrame, { grid: g }: ExtentGrid, filled: FilledGrid): Surface['grid'] {
  const x1 = g.x0 - g.cellSize / 2;
  const y1 = g.y0 - g.cellSize / 2;
  const x2 = x1 + g.nx * g.cellSize;
  const y2 = y1 + g.ny * g.cellSize;
  const corner = (x: number, y: number) => frame.inverse([x, y]);
  return {
    nx: g.nx,
    ny: g.ny,
    cellSizeM: g.cellSize,
    projection: frame.def,
    x0: g.x0,
    y0: g.y0,
    values: filled.values,
    stdDev: filled.stdDev,
    cornersLonLat: [corner(x1, y1), corner(x2, y1), corner(x2, y2), corner(x1, y2)],
    min: filled.min,
    max: filled.max,
  };
}

/** Every input well with its value and the leave-one-out result of its location (shared by wells at one location). */
function wellsOf(
  raw: readonly SurfaceInputPoint[],
  merged: readonly MergedPoint[],
  loo: LeaveOneOutResult,
  scale: number,
): Surface['wells'] {
  const byIndex = new Map(loo.residuals.map((r) => [r.index, r]));
  const at = (v: number | undefined) => (v === undefined ? null : v * scale);
  return merged.flatMap((m, index) =>
    raw
      .filter((p) => m.members.includes(p.name))
      .map((p) => ({
        wellId: p.wellId,
        name: p.name,
        lon: p.lon,
        lat: p.lat,
        value: p.value,
        interpretationVersion: p.interpretationVersion,
        ...(p.atDepth ? { atDepth: p.atDepth } : {}),
        residual: at(byIndex.get(index)?.residual),
        predicted: at(byIndex.get(index)?.predicted),
        looStdDev: at(byIndex.get(index)?.stdDev),
      })),
  );
}

/**
 * Interpolates well values (e.g. TOP depths) onto a grid over the prospect plus a buffer: ordinary kriging with a
 * fitted or given variogram, or inverse-distance weighting; leave-one-out cross-validation; contour bands from
 * d3-contour, all returned in lon/lat. Pure: the caller gathers the wells and stores the result.
 * @example const surface = computeSurface({ points, outline, params: surfaceRequestBody.parse({}) }); surface.grid.nx
 */
export function computeSurface({ points: raw, outline, params }: SurfaceInput, progress: SurfaceProgress = () => {}): SurfaceResult {
  const frame = localFrame(outline);
  const { merged, warnings: mergeWarnings } = mergeSameLocation(raw, frame);
  if (merged.length < 3) {
    throw new SurfaceInputError(`A surface needs at least 3 wells with a value at different locations; found ${merged.length}.`);
  }
  const unit = surfaceSiUnit(params.quantity);
  const scale = solvedScale(unit);
  const data: DataPoint[] = merged.map((m) => ({ x: m.x, y: m.y, value: m.value / scale }));
  const extent = extentGrid(outline, params.extentBufferKm, params.cellSizeM, frame);

  const cells = estimateCells(data, extent.targets, params.method, { scale, unit }, progress);
  progress('cross-validating', extent.targets.length, extent.targets.length);
  const loo = crossValidate(data, cells, params.method);
  const filled = fillGrid(extent, cells.estimates, params.method.kind === 'kriging');

  progress('contouring', 0, 1);
  const levels = contourLevels(filled.min, filled.max, contourIntervalOf(params), unit);
  const contours = contourBands(extent.grid, filled, frame, cells.flat ? [] : levels.thresholds, unit);

  const v = cells.variogram;
  return {
    grid: gridOf(frame, extent, filled),
    contours,
    extent: extent.extentLonLat as Surface['extent'],
    variogram: v
      ? {
          model: { ...v.variogram, nugget: v.variogram.nugget * scale ** 2, sill: v.variogram.sill * scale ** 2 },
          experimental: v.experimental.map((e) => ({ ...e, gamma: e.gamma * scale ** 2 })),
          fitted: v.fitted,
        }
      : null,
    crossValidation: {
      rmse: loo.rmse * scale,
      meanError: loo.meanError * scale,
      sigmaCheck: cells.flat ? null : sigmaCheck(loo.residuals),
    },
    wells: wellsOf(raw, merged, loo, scale),
    warnings: [...mergeWarnings, ...cells.warnings, ...levels.warnings],
  };
}
