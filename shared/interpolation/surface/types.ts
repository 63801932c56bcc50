import type { Polygon } from 'geojson';
import type { z } from 'zod';
import type { SurfaceJobPhase } from '../../schemas/jobs';
import type { Surface, surfaceRequestBody } from '../../schemas/surfaces';

export type SurfaceParams = z.output<typeof surfaceRequestBody>;

export interface SurfaceInputPoint {
  wellId: string;
  name: string;
  lon: number;
  lat: number;
  /** In the SI unit of the run's quantity (m, kg/m³ or Pa). */
  value: number;
  interpretationVersion: number | null;
  atDepth?: Surface['wells'][number]['atDepth'];
}

export interface SurfaceInput {
  points: SurfaceInputPoint[];
  /** The prospect outline, lon/lat. */
  outline: Polygon;
  params: SurfaceParams;
}

export type SurfaceResult = Pick<Surface, 'grid' | 'contours' | 'extent' | 'variogram' | 'crossValidation' | 'wells' | 'warnings'>;

/** A failure the caller should show as it is (bad input, not a bug). */
export class SurfaceInputError extends Error {}

/** The phases of the computation itself, in order: a subset of a surface job's phases. */
export const SURFACE_COMPUTE_PHASES = ['interpolating', 'cross-validating', 'contouring'] as const satisfies readonly SurfaceJobPhase[];
export type SurfaceComputePhase = (typeof SURFACE_COMPUTE_PHASES)[number];
export type SurfaceProgress = (phase: SurfaceComputePhase, done: number, total: number) => void;

/** A cell's estimate in the quantity's SI unit; the variance is null for inverse-distance weighting. */
export interface CellEstimate {
  value: number;
  variance: number | null;
}
