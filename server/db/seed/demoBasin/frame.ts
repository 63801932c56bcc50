/**
 * Where the invented basin lies and its local metric frame. Open South Pacific ocean far from any real
 * basin, so nothing here can be mistaken for real data. The frame is an equirectangular projection about
 * the centre: x east, y north, metres; over 80 × 60 km its scale error stays below 0.1 %, far below the
 * accuracy any interpolation test needs.
 */

/** Basin centre, WGS 84 degrees. */
export const BASIN_CENTRE = { lon: -101.0, lat: -32.5 } as const;

/** Extent of the basin, km (east–west × north–south). */
export const BASIN_SIZE_KM = { x: 80, y: 60 } as const;

/** Mean Earth radius, m (IUGG mean radius R1 = 6,371,008.8 m; value recalled from memory). */
const EARTH_RADIUS_M = 6_371_008.8;
const DEG = Math.PI / 180;
const M_PER_DEG_LAT = EARTH_RADIUS_M * DEG;
const M_PER_DEG_LON = EARTH_RADIUS_M * DEG * Math.cos(BASIN_CENTRE.lat * DEG);

export interface LocalPoint {
  xM: number;
  yM: number;
}

/**
 * Lon/lat (degrees) to the basin's local frame (m east and north of the centre).
 * @example
 * toLocalM(-101, -32.5); // { xM: 0, yM: 0 }
 */
export function toLocalM(lon: number, lat: number): LocalPoint {
  if (!Number.isFinite(lon) || !Number.isFinite(lat)) throw new Error(`toLocalM: lon and lat must be finite (got ${lon}, ${lat})`);
  return { xM: (lon - BASIN_CENTRE.lon) * M_PER_DEG_LON, yM: (lat - BASIN_CENTRE.lat) * M_PER_DEG_LAT };
}

/**
 * The basin's local frame (m) back to lon/lat (degrees).
 * @example
 * toLonLat(0, 0); // { lon: -101, lat: -32.5 }
 */
export function toLonLat(xM: number, yM: number): { lon: number; lat: number } {
  if (!Number.isFinite(xM) || !Number.isFinite(yM)) throw new Error(`toLonLat: xM and yM must be finite (got ${xM}, ${yM})`);
  return { lon: BASIN_CENTRE.lon + xM / M_PER_DEG_LON, lat: BASIN_CENTRE.lat + yM / M_PER_DEG_LAT };
}

const HALF_X_M = (BASIN_SIZE_KM.x * 1000) / 2;
const HALF_Y_M = (BASIN_SIZE_KM.y * 1000) / 2;

/** The basin's bounding box in lon/lat: [west, south, east, north]. */
export const BASIN_BBOX: [number, number, number, number] = (() => {
  const sw = toLonLat(-HALF_X_M, -HALF_Y_M);
  const ne = toLonLat(HALF_X_M, HALF_Y_M);
  return [sw.lon, sw.lat, ne.lon, ne.lat];
})();

/** Half-extents of the basin in the local frame, m. */
export const BASIN_HALF_M = { x: HALF_X_M, y: HALF_Y_M } as const;
