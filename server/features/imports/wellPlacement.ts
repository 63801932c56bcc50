import { checkLonLat, toLonLat, type LonLat } from '../../../shared/geo/crs';

/** The header fields a well import (a CSV row or a LAS file) plans for a well, located and in metres. */
export interface PlannedWellFields {
  name: string;
  uwi: string | null;
  operator: string | null;
  lon: number;
  lat: number;
  /** The coordinates as the file gave them, in `surfaceEpsg` (lon/lat for 4326). */
  surfaceX: number;
  surfaceY: number;
  surfaceEpsg: number;
  datumElevationM: number | null;
  datumKind: string | null;
  groundElevationM: number | null;
  waterDepthM: number | null;
  tdMdM: number | null;
  /** Null when neither the file nor a water depth says (the LAS import then settles it from a neighbour). */
  offshore: boolean | null;
}

/**
 * Places a well on the map from coordinates in `epsg` (x = longitude, y = latitude for EPSG:4326), or says
 * which of the two is wrong and why.
 * @example placeWell(500000, 0, 32631) // { lon: 3, lat: 0 }
 * @example placeWell(-32.5, 120, 4326) // { axis: 'y', message: 'latitude 120 is outside −90..90: are longitude and latitude swapped?' }
 */
export function placeWell(x: number, y: number, epsg: number): LonLat | { axis: 'x' | 'y'; message: string } {
  if (epsg === 4326) {
    const message = checkLonLat(x, y);
    return message ? { axis: message.startsWith('latitude') ? 'y' : 'x', message } : { lon: x, lat: y };
  }
  try {
    return toLonLat(x, y, epsg);
  } catch (err) {
    return { axis: 'x', message: (err as Error).message };
  }
}

/**
 * Offshore as the file states it, else from its water depth (a positive depth is offshore; 0 m is land), else unknown.
 * @example offshoreFromWaterDepth(120) // true
 */
export function offshoreFromWaterDepth(waterDepthM: number | null, stated: boolean | null = null): boolean | null {
  if (stated !== null) return stated;
  return waterDepthM === null ? null : waterDepthM > 0;
}
