import { FT_M } from '@shared/units';
import {
  AT_DEPTH_QUANTITIES,
  DEFAULT_CONTOUR_INTERVALS,
  SURFACE_QUANTITY_KINDS,
  type SurfaceQuantity,
  type SurfaceRequest,
} from '@shared/schemas/surfaces';
import { DEFAULT_UNITS, type DisplayDepthUnit, type UnitPreferences } from '@/stores/units';
import { surfaceDisplay } from './surfaceDisplay';

export type VariogramModelName = 'spherical' | 'exponential' | 'gaussian';

/** What the run form holds, in the units a person types: km for distances between wells, the depth unit for contours. */
export interface SurfaceRunForm {
  name: string;
  quantity: SurfaceQuantity;
  wellSource: 'prospect' | 'offset-set';
  bufferKm: number;
  plannedWellId: string | null;
  method: 'kriging' | 'idw';
  model: VariogramModelName;
  variogramByHand: boolean;
  /** Regression kriging: take a least-squares plane out first, krige the residuals, put the plane back. */
  removeTrend: boolean;
  /** For EMW and overpressure: the depth below sea level, in the display depth unit. */
  depth: number | null;
  /** In the square of the quantity's display unit (m², ft², sg², MPa²…). */
  nugget: number;
  sill: number;
  rangeKm: number;
  /** null: every well up to 100 wells (no seams), the nearest 16 above. */
  maxNeighbours: number | null;
  power: number;
  cellSizeM: number;
  extentBufferKm: number;
  /** In the quantity's display unit (depth unit, EMW unit or pressure unit). */
  contourInterval: number;
}

/**
 * Starting values. The 30 km well buffer reaches enough TOP picks in a sparse basin where the server's
 * 10 km default often finds fewer than three (common practice, no source); the rest follow the contract's defaults.
 */
export const DEFAULT_RUN_FORM: SurfaceRunForm = {
  name: '',
  quantity: 'top_tvdss',
  wellSource: 'prospect',
  bufferKm: 30,
  plannedWellId: null,
  method: 'kriging',
  model: 'spherical',
  variogramByHand: false,
  removeTrend: false,
  depth: null,
  nugget: 0,
  sill: 40_000,
  rangeKm: 15,
  maxNeighbours: null,
  power: 2,
  cellSizeM: 250,
  extentBufferKm: 5,
  contourInterval: 50,
};

/** A standard deviation per kind for a hand-set sill to start from: 200 m, 100 kg/m³, 3 MPa (common practice, no source). */
const DEFAULT_SILL_SD = { depth: 200, emw: 100, pressure: 3e6 } as const;

/**
 * The contour interval and hand-set sill to start from when the quantity changes, in the reader's units
 * (rounded to two significant figures so the field reads cleanly).
 * @example quantityDefaults('emw_at_depth', { depth: 'm', pressure: 'MPa', emw: 'sg' }) // { contourInterval: 0.02, sill: 0.01 }
 */
export function quantityDefaults(quantity: SurfaceQuantity, units: UnitPreferences): { contourInterval: number; sill: number } {
  const kind = SURFACE_QUANTITY_KINDS[quantity];
  const { factor } = surfaceDisplay(quantity, units);
  const round = (v: number) => Number(v.toPrecision(2));
  return { contourInterval: round(DEFAULT_CONTOUR_INTERVALS[kind] * factor), sill: round((DEFAULT_SILL_SD[kind] * factor) ** 2) };
}

/**
 * The request body for a form: distances to metres, the contour interval and a hand-set variogram from
 * the display depth unit to metres (a variance scales with the square of the length unit).
 * @example toSurfaceRequest({ ...DEFAULT_RUN_FORM, contourInterval: 100 }, 'ft').contourIntervalM // 30.48
 */
export function toSurfaceRequest(
  form: SurfaceRunForm,
  depthUnit: DisplayDepthUnit,
  units: Pick<UnitPreferences, 'pressure' | 'emw'> = DEFAULT_UNITS,
): SurfaceRequest {
  if (form.wellSource === 'offset-set' && !form.plannedWellId) throw new Error('Choose the planned well whose offset set to use.');
  const atDepth = AT_DEPTH_QUANTITIES.includes(form.quantity);
  if (atDepth && (form.depth === null || !Number.isFinite(form.depth) || form.depth < 0))
    throw new Error('Give the depth below sea level to read the pore pressure at.');
  const kind = SURFACE_QUANTITY_KINDS[form.quantity];
  // The display unit per SI unit of the quantity; a variance scales with its square.
  const toM = depthUnit === 'ft' ? FT_M : 1;
  const toSi = kind === 'depth' ? toM : 1 / surfaceDisplay(form.quantity, { depth: depthUnit, ...units }).factor;
  const wells: SurfaceRequest['wells'] =
    form.wellSource === 'prospect'
      ? { from: 'prospect', bufferKm: form.bufferKm }
      : { from: 'offset-set', plannedWellId: form.plannedWellId as string };
  const method: SurfaceRequest['method'] =
    form.method === 'idw'
      ? { kind: 'idw', power: form.power }
      : {
          kind: 'kriging',
          model: form.model,
          maxNeighbours: form.maxNeighbours,
          trend: form.removeTrend ? 'planar' : 'none',
          variogram: form.variogramByHand
            ? { model: form.model, nugget: form.nugget * toSi * toSi, sill: form.sill * toSi * toSi, range: form.rangeKm * 1000 }
            : null,
        };
  const body: SurfaceRequest = {
    quantity: form.quantity,
    wells,
    method,
    cellSizeM: form.cellSizeM,
    extentBufferKm: form.extentBufferKm,
  };
  // Contours are labelled in the unit the interval was typed in, so they read as round values.
  body.contourLabelUnit = kind === 'depth' ? depthUnit : surfaceDisplay(form.quantity, { depth: depthUnit, ...units }).unit;
  if (atDepth) body.depthUnit = depthUnit;
  if (kind === 'depth') body.contourIntervalM = form.contourInterval * toSi;
  else if (kind === 'emw') body.contourIntervalKgM3 = form.contourInterval * toSi;
  else body.contourIntervalPa = form.contourInterval * toSi;
  if (atDepth) body.depthTvdssM = (form.depth as number) * toM;
  const name = form.name.trim();
  if (name) body.name = name;
  return body;
}
