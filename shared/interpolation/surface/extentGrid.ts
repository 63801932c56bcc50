import * as turf from '@turf/turf';
import type { Polygon } from 'geojson';
import { MAX_SURFACE_CELLS } from '../../schemas/surfaces';
import { grid, type Grid } from '../grid';
import type { Target } from '../types';
import type { LocalFrame } from './localFrame';
import { SurfaceInputError } from './types';

export interface ExtentGrid {
  /** The outline grown by the buffer, lon/lat. */
  extentLonLat: Polygon;
  grid: Grid;
  /** Per grid cell (row-major): whether its centre lies within the extent. */
  inside: boolean[];
  /** The centres of the cells inside, in grid order. */
  targets: Target[];
}

/**
 * The grid over the prospect outline grown by `bufferKm`, in the local frame, with the cells inside that extent.
 * @example extentGrid(outline, 5, 250, frame).targets.length // cells within 5 km of the outline
 */
export function extentGrid(outline: Polygon, bufferKm: number, cellSizeM: number, frame: LocalFrame): ExtentGrid {
  const extentLonLat = turf.buffer(turf.feature(outline), bufferKm, { units: 'kilometers' })!.geometry as Polygon;
  const extentM = turf.polygon([extentLonLat.coordinates[0].map(frame.forward)]);
  const [minX, minY, maxX, maxY] = turf.bbox(extentM);
  let g: Grid;
  try {
    g = grid([minX, minY, maxX, maxY], cellSizeM, { maxCells: MAX_SURFACE_CELLS });
  } catch (err) {
    throw new SurfaceInputError(`${(err as Error).message}: choose a larger cell size.`);
  }
  const inside = g.targets.map((t) => turf.booleanPointInPolygon([t.x, t.y], extentM));
  return { extentLonLat, grid: g, inside, targets: g.targets.filter((_, k) => inside[k]) };
}
