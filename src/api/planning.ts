import { z } from 'zod';
import {
  offsetCandidateSchema,
  offsetSetEntrySchema,
  plannedWellSchema,
  prospectSchema,
  type OffsetCandidate,
  type OffsetSetBody,
  type OffsetSetEntry,
  type PlannedWell,
  type PlannedWellBody,
  type Prospect,
  type ProspectBody,
} from '@shared/schemas/planning';
import { api, type ApiClient } from './client';

const teamPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}`;
const prospectsPath = (teamId: string) => `${teamPath(teamId)}/prospects`;
const plannedPath = (teamId: string) => `${teamPath(teamId)}/planned-wells`;
const onePlanned = (teamId: string, id: string) => `${plannedPath(teamId)}/${encodeURIComponent(id)}`;

/**
 * The team's prospects with their outlines and areas.
 * @example const prospects = await listProspects(teamId);
 */
export function listProspects(teamId: string, client: ApiClient = api): Promise<Prospect[]> {
  return client.get(prospectsPath(teamId), z.array(prospectSchema));
}

/**
 * Saves a new prospect. A polygon the server cannot accept (self-intersecting, too few points)
 * rejects with status 400 and a message meant for the person who drew it.
 * @example await createProspect(teamId, { name: 'Ostrel Ridge', geometry: { type: 'Polygon', coordinates: [ring] } });
 */
export function createProspect(teamId: string, body: ProspectBody, client: ApiClient = api): Promise<Prospect> {
  return client.post(prospectsPath(teamId), body, prospectSchema);
}

/**
 * Replaces a prospect's fields; 409 `conflict` when someone saved it since `version` was read.
 * @example await updateProspect(teamId, p.id, { ...body, version: p.version });
 */
export function updateProspect(
  teamId: string,
  id: string,
  body: ProspectBody & { version: number },
  client: ApiClient = api,
): Promise<Prospect> {
  return client.patch(`${prospectsPath(teamId)}/${encodeURIComponent(id)}`, body, prospectSchema);
}

/**
 * Deletes a prospect; its planned wells stay, without a prospect.
 * @example await deleteProspect(teamId, p.id);
 */
export function deleteProspect(teamId: string, id: string, client: ApiClient = api): Promise<void> {
  return client.del(`${prospectsPath(teamId)}/${encodeURIComponent(id)}`);
}

/**
 * The team's planned wells.
 * @example const planned = await listPlannedWells(teamId);
 */
export function listPlannedWells(teamId: string, client: ApiClient = api): Promise<PlannedWell[]> {
  return client.get(plannedPath(teamId), z.array(plannedWellSchema));
}

/**
 * Places a planned well; `waterDepthM: null` asks the server to estimate it from the nearest wells.
 * @example await createPlannedWell(teamId, { name: 'Ostrel-1', location: { type: 'Point', coordinates: [-101, -32.5] }, datumElevationM: 25, plannedTdM: 3200 });
 */
export function createPlannedWell(teamId: string, body: PlannedWellBody, client: ApiClient = api): Promise<PlannedWell> {
  return client.post(plannedPath(teamId), body, plannedWellSchema);
}

/**
 * Deletes a planned well and its offset set.
 * @example await deletePlannedWell(teamId, pw.id);
 */
export function deletePlannedWell(teamId: string, id: string, client: ApiClient = api): Promise<void> {
  return client.del(onePlanned(teamId, id));
}

/** How far to look for offset wells: a radius around the planned well, or its prospect plus a buffer. */
export type OffsetSearch = { radiusKm: number } | { prospectBufferKm: number };

/**
 * The query string of the offset search.
 * @example offsetSearchQuery({ radiusKm: 25 }) // 'radiusKm=25'
 * @example offsetSearchQuery({ prospectBufferKm: 5 }) // 'prospectBufferKm=5'
 */
export function offsetSearchQuery(search: OffsetSearch): string {
  return 'radiusKm' in search ? `radiusKm=${search.radiusKm}` : `prospectBufferKm=${search.prospectBufferKm}`;
}

/**
 * Wells inside a prospect's outline or within `bufferKm` of it, best first (distances from the outline).
 * @example const around = await listProspectWells(teamId, prospect.id, 10);
 */
export function listProspectWells(
  teamId: string,
  prospectId: string,
  bufferKm: number,
  client: ApiClient = api,
): Promise<OffsetCandidate[]> {
  return client.get(`/api/teams/${teamId}/prospects/${prospectId}/offset-wells?bufferKm=${bufferKm}`, z.array(offsetCandidateSchema));
}

/**
 * Wells that could serve as offsets for a planned well, best first.
 * @example const ranked = await listOffsetCandidates(teamId, pw.id, { radiusKm: 25 });
 */
export function listOffsetCandidates(
  teamId: string,
  plannedWellId: string,
  search: OffsetSearch,
  client: ApiClient = api,
): Promise<OffsetCandidate[]> {
  return client.get(`${onePlanned(teamId, plannedWellId)}/offset-candidates?${offsetSearchQuery(search)}`, z.array(offsetCandidateSchema));
}

/**
 * The offset wells chosen for a planned well, with who chose them and when.
 * @example const set = await getOffsetSet(teamId, pw.id);
 */
export function getOffsetSet(teamId: string, plannedWellId: string, client: ApiClient = api): Promise<OffsetSetEntry[]> {
  return client.get(`${onePlanned(teamId, plannedWellId)}/offsets`, z.array(offsetSetEntrySchema));
}

/**
 * Replaces the offset set; the reply carries who added each entry and when.
 * @example await putOffsetSet(teamId, pw.id, { wells: [{ wellId, reason: 'same fault block' }] });
 */
export function putOffsetSet(
  teamId: string,
  plannedWellId: string,
  body: OffsetSetBody,
  client: ApiClient = api,
): Promise<OffsetSetEntry[]> {
  return client.request('PUT', `${onePlanned(teamId, plannedWellId)}/offsets`, {
    body,
    schema: z.array(offsetSetEntrySchema),
  });
}
