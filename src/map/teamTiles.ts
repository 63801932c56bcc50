import { TEAM_TILE_LAYERS } from '@shared/schemas/planning';

/** A fixed team layer, or an uploaded reference layer by its id (`reference-<uuid>`). */
export type TeamTileLayer = (typeof TEAM_TILE_LAYERS)[number] | `reference-${string}`;

/** Zoom from which the server sends one point per well instead of clusters. */
export const WELL_POINTS_MIN_ZOOM = 9;

/** Deepest zoom the team tile endpoint is asked for; MapLibre overzooms past it. */
export const TEAM_TILES_MAX_ZOOM = 14;

/**
 * The tile URL template of one team layer. `version` changes after an edit so MapLibre
 * fetches fresh tiles instead of reusing the ones it holds. Absolute, because tiles are
 * fetched from MapLibre's worker, whose base URL is its script, not the page.
 * @example teamTileUrl('http://127.0.0.1:8080', 't1', 'wells', 3)
 * // 'http://127.0.0.1:8080/api/teams/t1/tiles/wells/{z}/{x}/{y}.mvt?v=3'
 */
export function teamTileUrl(origin: string, teamId: string, layer: TeamTileLayer, version: number): string {
  if (!/^https?:\/\/[^/?#\s]+$/.test(origin)) throw new Error(`teamTileUrl: origin must look like http://host:port, got "${origin}".`);
  if (!Number.isInteger(version) || version < 0) throw new Error(`teamTileUrl: version must be a whole number ≥ 0, got ${version}.`);
  return `${origin}/api/teams/${encodeURIComponent(teamId)}/tiles/${layer}/{z}/{x}/{y}.mvt?v=${version}`;
}
