// A surface from well values: the steps in the order computeSurface runs them. Not re-exported from
// shared/interpolation's index, so the client (which uses that index) does not bundle turf and d3-contour.
export { computeSurface } from './computeSurface';
export { localFrame, type LocalFrame } from './localFrame';
export { mergeSameLocation, SAME_LOCATION_M, type MergedPoint } from './mergeSameLocation';
export { extentGrid, type ExtentGrid } from './extentGrid';
export { estimateCells, type CellEstimates } from './estimateCells';
export { removePlanarTrend } from './removePlanarTrend';
export { krigingVariogram, type KrigingVariogram } from './krigingVariogram';
export { crossValidate } from './crossValidate';
export { fillGrid, type FilledGrid } from './fillGrid';
export { contourBands, contourLevels, MAX_CONTOUR_LEVELS } from './contourBands';
export {
  SURFACE_COMPUTE_PHASES,
  SurfaceInputError,
  type CellEstimate,
  type SurfaceComputePhase,
  type SurfaceInput,
  type SurfaceInputPoint,
  type SurfaceParams,
  type SurfaceProgress,
  type SurfaceResult,
} from './types';
