import { z } from 'zod';
import { referenceLayerSchema, type ReferenceLayer } from '@shared/schemas/planning';
import { api, postMultipart, type ApiClient } from './client';

const layersPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}/layers`;

/** What the upload form sends beside the file; the server fills `kind` and `color` when left out. */
export interface ReferenceLayerFields {
  name: string;
  kind: ReferenceLayer['kind'];
  color: string;
}

/**
 * The team's uploaded reference layers, by name.
 * @example const layers = await listReferenceLayers(teamId); layers[0].geometryTypes // ['POLYGON']
 */
export function listReferenceLayers(teamId: string, client: ApiClient = api): Promise<ReferenceLayer[]> {
  return client.get(layersPath(teamId), z.array(referenceLayerSchema));
}

/**
 * Deletes one reference layer with its features.
 * @example await deleteReferenceLayer(teamId, layer.id);
 */
export function deleteReferenceLayer(teamId: string, layerId: string, client: ApiClient = api): Promise<void> {
  return client.del(`${layersPath(teamId)}/${encodeURIComponent(layerId)}`);
}

/** The message for a refusal whose body is not our `{ error }` shape (a proxy's page, a crash). */
function bareFailure(status: number): string {
  if (status === 413) return 'The layer file is too large for the server to accept.';
  if (status >= 500) return `The server ran into a problem (HTTP ${status}). Try again shortly.`;
  return `The upload failed (HTTP ${status}).`;
}

/**
 * Uploads a GeoJSON or KML file as a new reference layer. The server checks every feature and stores all
 * or nothing; its refusal (not valid JSON, feature N invalid, too large, a field) comes back as an
 * ApiClientError whose message names the feature or field. Multipart, so it calls fetch itself: the
 * shared JSON client cannot carry a file.
 * @example const layer = await uploadReferenceLayer(teamId, { name: 'Blocks', kind: 'lease_blocks', color: '#A0782C' }, file);
 */
export async function uploadReferenceLayer(
  teamId: string,
  fields: ReferenceLayerFields,
  file: Blob & { name?: string },
  fetchImpl: typeof fetch = (input, init) => globalThis.fetch(input, init),
): Promise<ReferenceLayer> {
  const form = new FormData();
  form.append('name', fields.name);
  form.append('kind', fields.kind);
  form.append('color', fields.color);
  form.append('file', file, file.name ?? 'layer.geojson');
  return postMultipart(layersPath(teamId), form, { schema: referenceLayerSchema, bareFailure, fetchImpl });
}
