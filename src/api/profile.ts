import { z } from 'zod';
import { interpretationSchema, type Interpretation, type SaveInterpretationBody } from '@shared/schemas/interpretations';
import { api, ApiClientError, type ApiClient } from './client';

const interpretationsPath = (teamId: string, wellId: string) =>
  `/api/teams/${encodeURIComponent(teamId)}/wells/${encodeURIComponent(wellId)}/interpretations`;

/**
 * Every saved version of a well's interpretation, newest first.
 * @example const versions = await listInterpretations(teamId, wellId); versions[0].version // 4
 */
export function listInterpretations(teamId: string, wellId: string, client: ApiClient = api): Promise<Interpretation[]> {
  return client.get(interpretationsPath(teamId, wellId), z.array(interpretationSchema));
}

/**
 * The newest accepted interpretation, or null when the well has none yet (the server's 404 `not_found`).
 * @example const current = await currentInterpretation(teamId, wellId); current?.top?.tvdM
 */
export async function currentInterpretation(teamId: string, wellId: string, client: ApiClient = api): Promise<Interpretation | null> {
  try {
    return await client.get(`${interpretationsPath(teamId, wellId)}/current`, interpretationSchema);
  } catch (e) {
    if (e instanceof ApiClientError && e.status === 404) return null;
    throw e;
  }
}

/**
 * Saves a new version. Rejects with an ApiClientError of status 409 (`conflict`) when `baseVersion`
 * is no longer the newest: someone else saved in between.
 * @example await saveInterpretation(teamId, wellId, { ...content, baseVersion: 3, status: 'accepted', note: null });
 */
export function saveInterpretation(
  teamId: string,
  wellId: string,
  body: SaveInterpretationBody,
  client: ApiClient = api,
): Promise<Interpretation> {
  return client.post(interpretationsPath(teamId, wellId), body, interpretationSchema);
}

/**
 * Saves a new version that copies `version`; same 409 rule as saving.
 * @example await restoreInterpretation(teamId, wellId, 2, 5);
 */
export function restoreInterpretation(
  teamId: string,
  wellId: string,
  version: number,
  baseVersion: number | null,
  client: ApiClient = api,
): Promise<Interpretation> {
  return client.post(`${interpretationsPath(teamId, wellId)}/${version}/restore`, { baseVersion }, interpretationSchema);
}

/** Whether an error is the "someone saved a newer version" answer. */
export function isStaleVersion(e: unknown): boolean {
  return e instanceof ApiClientError && e.status === 409;
}
