import { z } from 'zod';
import {
  logCurveDataSchema,
  logCurveSummarySchema,
  pressureObservationSchema,
  surveyStationSchema,
  wellDetailSchema,
  wellListSchema,
  type LogCurveData,
  type LogCurveSummary,
  type PressureObservation,
  type SurveyStation,
  type WellDetail,
  type WellList,
  type WellPatchBody,
  type WellStatus,
  WELL_SORTS,
} from '@shared/schemas/wells';
import { api, type ApiClient } from './client';

export type WellSort = (typeof WELL_SORTS)[number];

/** The list query as the page holds it (typed), before it becomes `?q=…&status=a,b`. */
export interface WellListParams {
  q?: string;
  status?: readonly WellStatus[];
  hasPressures?: boolean;
  /** west, south, east, north in degrees. */
  bbox?: readonly [number, number, number, number];
  sort?: WellSort;
  order?: 'asc' | 'desc';
  limit?: number;
  offset?: number;
}

const wellsPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}/wells`;
const wellPath = (teamId: string, wellId: string) => `${wellsPath(teamId)}/${encodeURIComponent(wellId)}`;

/**
 * The query string of `GET /wells` in the form `wellListQuery` (shared/schemas/wells.ts) parses:
 * lists comma-joined, booleans as words, empty values left out so the server defaults apply.
 * @example wellListSearch({ q: ' AVX ', status: ['drilled', 'abandoned'], limit: 25 })
 * // 'q=AVX&status=drilled%2Cabandoned&limit=25'
 */
export function wellListSearch(params: WellListParams): string {
  const search = new URLSearchParams();
  const q = params.q?.trim();
  if (q) search.set('q', q);
  if (params.status && params.status.length > 0) search.set('status', params.status.join(','));
  if (params.hasPressures !== undefined) search.set('hasPressures', String(params.hasPressures));
  if (params.bbox) search.set('bbox', params.bbox.join(','));
  if (params.sort) search.set('sort', params.sort);
  if (params.order) search.set('order', params.order);
  if (params.limit !== undefined) search.set('limit', String(params.limit));
  if (params.offset) search.set('offset', String(params.offset));
  return search.toString();
}

/**
 * One page of the team's wells with the total that match.
 * @example const { total, items } = await listWells(teamId, { q: 'AVX', sort: 'tdMdM', order: 'desc' });
 */
export function listWells(teamId: string, params: WellListParams = {}, client: ApiClient = api): Promise<WellList> {
  const search = wellListSearch(params);
  return client.get(`${wellsPath(teamId)}${search ? `?${search}` : ''}`, wellListSchema);
}

/**
 * A well's header, datums, tops, survey summary and the version to send back when editing.
 * @example const well = await getWell(teamId, wellId); well.version // 3
 */
export function getWell(teamId: string, wellId: string, client: ApiClient = api): Promise<WellDetail> {
  return client.get(wellPath(teamId, wellId), wellDetailSchema);
}

/**
 * Changes header fields; rejects with status 409 `conflict` when `version` is no longer the current one
 * (or when the new name/UWI belongs to another well).
 * @example await patchWell(teamId, wellId, { version: 3, status: 'abandoned' });
 */
export function patchWell(teamId: string, wellId: string, body: WellPatchBody, client: ApiClient = api): Promise<WellDetail> {
  return client.patch(wellPath(teamId, wellId), body, wellDetailSchema);
}

/**
 * Measured and observed pressures of a well, shallowest TVD first.
 * @example const pressures = await listPressures(teamId, wellId);
 */
export function listPressures(teamId: string, wellId: string, client: ApiClient = api): Promise<PressureObservation[]> {
  return client.get(`${wellPath(teamId, wellId)}/pressures`, z.array(pressureObservationSchema));
}

/**
 * The survey stations of a well with their minimum-curvature positions, in MD order.
 * @example const stations = await listSurveyStations(teamId, wellId);
 */
export function listSurveyStations(teamId: string, wellId: string, client: ApiClient = api): Promise<SurveyStation[]> {
  return client.get(`${wellPath(teamId, wellId)}/surveys`, z.array(surveyStationSchema));
}

/**
 * The log curves of a well, without their samples.
 * @example const curves = await listLogCurves(teamId, wellId);
 */
export function listLogCurves(teamId: string, wellId: string, client: ApiClient = api): Promise<LogCurveSummary[]> {
  return client.get(`${wellPath(teamId, wellId)}/logs`, z.array(logCurveSummarySchema));
}

/**
 * One curve's samples; `maxPoints` thins them on the server keeping each bucket's minimum and maximum.
 * @example const gr = await getLogCurve(teamId, wellId, curveId, 2000);
 */
export function getLogCurve(
  teamId: string,
  wellId: string,
  curveId: string,
  maxPoints?: number,
  client: ApiClient = api,
): Promise<LogCurveData> {
  const query = maxPoints === undefined ? '' : `?maxPoints=${maxPoints}`;
  return client.get(`${wellPath(teamId, wellId)}/logs/${encodeURIComponent(curveId)}${query}`, logCurveDataSchema);
}
