import { FT_M } from '@shared/units';
import type { SurfaceQuantity, SurfaceRequest } from '@shared/schemas/surfaces';
import type { DisplayDepthUnit } from '@/stores/units';

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
  /** m² (or ft² when depths read in feet). */
  nugget: number;
  sill: number;
  rangeKm: number;
  maxNeighbours: number;
  power: number;
  cellSizeM: number;
  extentBufferKm: number;
  /** In the display depth unit. */
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
  nugget: 0,
  sill: 40_000,
  rangeKm: 15,
  maxNeighbours: 16,
  power: 2,
  cellSizeM: 250,
  extentBufferKm: 5,
  contourInterval: 50,
};

/**
 * The request body for a form: distances to metres, the contour interval and a hand-set variogram from
 * the display depth unit to metres (a variance scales with the square of the length unit).
 * @example toSurfaceRequest({ ...DEFAULT_RUN_FORM, contourInterval: 100 }, 'ft').contourIntervalM // 30.48
 */
export function toSurfaceRequest(form: SurfaceRunForm, depthUnit: DisplayDepthUnit): SurfaceRequest {
  if (form.wellSource === 'offset-set' && !form.plannedWellId) throw new Error('Choose the planned well whose offset set to use.');
  const toM = depthUnit === 'ft' ? FT_M : 1;
  const wells: SurfaceRequest['wells'] =
    form.wellSource === 'prospect' ? { from: 'prospect', bufferKm: form.bufferKm } : { from: 'offset-set', plannedWellId: form.plannedWellId as string };
  const method: SurfaceRequest['method'] =
    form.method === 'idw'
      ? { kind: 'idw', power: form.power }
      : {
          kind: 'kriging',
          model: form.model,
          maxNeighbours: form.maxNeighbours,
          variogram: form.variogramByHand ? { model: form.model, nugget: form.nugget * toM * toM, sill: form.sill * toM * toM, range: form.rangeKm * 1000 } : null,
        };
  const body: SurfaceRequest = {
    quantity: form.quantity,
    wells,
    method,
    cellSizeM: form.cellSizeM,
    extentBufferKm: form.extentBufferKm,
    contourIntervalM: form.contourInterval * toM,
  };
  const name = form.name.trim();
  if (name) body.name = name;
  return body;
}
