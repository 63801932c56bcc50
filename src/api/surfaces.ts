import { z } from 'zod';
import { prospectSchema, type Prospect } from '@shared/schemas/planning';
import { jobStartedSchema, type JobStarted } from '@shared/schemas/jobs';
import { surfaceSchema, surfaceSummarySchema, type Surface, type SurfaceRequest, type SurfaceSummary } from '@shared/schemas/surfaces';
import { api, type ApiClient } from './client';

const teamPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}`;
const surfacePath = (teamId: string, surfaceId: string) => `${teamPath(teamId)}/surfaces/${encodeURIComponent(surfaceId)}`;

/** The value of a surface at a point; null outside the grid. */
export const surfacePointValueSchema = z.object({ value: z.number().nullable(), stdDev: z.number().nullable(), unit: z.string() }).loose();
export type SurfacePointValue = z.infer<typeof surfacePointValueSchema>;

/**
 * One prospect with its outline.
 * @example const p = await getProspect(teamId, prospectId); p.geometry.coordinates[0]
 */
export function getProspect(teamId: string, prospectId: string, client: ApiClient = api): Promise<Prospect> {
  return client.get(`${teamPath(teamId)}/prospects/${encodeURIComponent(prospectId)}`, prospectSchema);
}

/**
 * Earlier surface runs over a prospect, newest first as the server orders them.
 * @example const runs = await listSurfaces(teamId, prospectId); runs[0].rmseM
 */
export function listSurfaces(teamId: string, prospectId: string, client: ApiClient = api): Promise<SurfaceSummary[]> {
  return client.get(`${teamPath(teamId)}/prospects/${encodeURIComponent(prospectId)}/surfaces`, z.array(surfaceSummarySchema));
}

/**
 * One stored surface with its grid, contours, variogram and cross-validation.
 * @example const s = await getSurface(teamId, surfaceId); s.grid.nx
 */
export function getSurface(teamId: string, surfaceId: string, client: ApiClient = api): Promise<Surface> {
  return client.get(surfacePath(teamId, surfaceId), surfaceSchema);
}

/**
 * Starts a surface run in the background; poll it with `getJob(teamId, jobId, 'surface')` (./jobs). A body the server cannot accept
 * rejects at once with status 400; problems with the wells (fewer than 3 picks…) come back as the job's error.
 * @example const { jobId } = await startSurfaceJob(teamId, prospectId, { wells: { from: 'prospect', bufferKm: 30 } });
 */
export function startSurfaceJob(teamId: string, prospectId: string, body: SurfaceRequest, client: ApiClient = api): Promise<JobStarted> {
  return client.post(`${teamPath(teamId)}/prospects/${encodeURIComponent(prospectId)}/surfaces?async=true`, body, jobStartedSchema);
}

/**
 * Deletes a stored surface (roles with `surfaces.run`).
 * @example await deleteSurface(teamId, surfaceId);
 */
export function deleteSurface(teamId: string, surfaceId: string, client: ApiClient = api): Promise<void> {
  return client.del(surfacePath(teamId, surfaceId));
}

/**
 * The surface at a planned well's location (value and standard deviation in `unit`: m, kg/m3 or Pa); nulls outside the grid.
 * @example const { value, stdDev } = await plannedWellSurfaceValue(teamId, surfaceId, plannedWellId);
 */
export function plannedWellSurfaceValue(
  teamId: string,
  surfaceId: string,
  plannedWellId: string,
  client: ApiClient = api,
): Promise<SurfacePointValue> {
  return client.get(`${surfacePath(teamId, surfaceId)}/planned-wells/${encodeURIComponent(plannedWellId)}/value`, surfacePointValueSchema);
}
