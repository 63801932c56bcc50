import type { StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import { z } from 'zod';
import { wellDetailSchema, wellListSchema, type WellDetail, type WellList } from '@shared/schemas/wells';
import { api, type ApiClient } from './client';

const wellsPath = (teamId: string) => `/api/teams/${encodeURIComponent(teamId)}/wells`;

/** The most wells one list request may return (`limit` in shared/schemas/wells.ts). */
export const MAX_WELL_PAGE = 500;

// Only the shape the map needs is checked; MapLibre validates the rest of the style itself.
const styleShape = z.object({ version: z.literal(8), sources: z.record(z.string(), z.unknown()), layers: z.array(z.unknown()) }).loose();

/**
 * The offline basemap style for a theme, served by our own `/tiles` router.
 * @example const style = await fetchBasemapStyle('dark'); style.layers[0].id // 'basemap-sea'
 */
export async function fetchBasemapStyle(theme: 'light' | 'dark', client: ApiClient = api): Promise<StyleSpecification> {
  const style = await client.get(`/tiles/style.json?theme=${theme}`, styleShape);
  return style as unknown as StyleSpecification;
}

/**
 * The first page of the team's wells (up to 500), to frame the map and place saved offsets.
 * @example const { total, items } = await listWellsForMap(teamId);
 */
export function listWellsForMap(teamId: string, client: ApiClient = api): Promise<WellList> {
  return client.get(`${wellsPath(teamId)}?limit=${MAX_WELL_PAGE}`, wellListSchema);
}

/**
 * One well's header for the map's well card.
 * @example const well = await getWellForCard(teamId, wellId); well.tdMdM
 */
export function getWellForCard(teamId: string, wellId: string, client: ApiClient = api): Promise<WellDetail> {
  return client.get(`${wellsPath(teamId)}/${encodeURIComponent(wellId)}`, wellDetailSchema);
}
