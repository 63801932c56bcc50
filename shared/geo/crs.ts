import proj4 from 'proj4';

/**
 * Coordinate reference systems an import may use, converted to WGS 84 lon/lat with proj4.
 * Supported: EPSG:4326 (lon/lat), EPSG:3857 (web mercator), WGS 84 / UTM north 32601–32660 and south 32701–32760.
 */
export function proj4Definition(epsg: number): string | null {
  if (epsg === 4326) return '+proj=longlat +datum=WGS84 +no_defs';
  if (epsg === 3857) return '+proj=merc +a=6378137 +b=6378137 +lat_ts=0 +lon_0=0 +x_0=0 +y_0=0 +k=1 +units=m +nadgrids=@null +no_defs';
  if (epsg >= 32601 && epsg <= 32660) return `+proj=utm +zone=${epsg - 32600} +datum=WGS84 +units=m +no_defs`;
  if (epsg >= 32701 && epsg <= 32760) return `+proj=utm +zone=${epsg - 32700} +south +datum=WGS84 +units=m +no_defs`;
  return null;
}

export const SUPPORTED_CRS_TEXT = 'EPSG:4326, EPSG:3857, and WGS 84 / UTM zones EPSG:32601–32660 (north) and 32701–32760 (south)';

export interface LonLat {
  lon: number;
  lat: number;
}

/**
 * Converts x/y in `epsg` to lon/lat; throws with a message naming the problem.
 * @example toLonLat(500000, 0, 32631) // { lon: 3, lat: 0 }
 */
export function toLonLat(x: number, y: number, epsg: number): LonLat {
  if (!Number.isFinite(x) || !Number.isFinite(y)) throw new Error('Coordinates must be finite numbers');
  const def = proj4Definition(epsg);
  if (!def) throw new Error(`EPSG:${epsg} is not supported; use ${SUPPORTED_CRS_TEXT}`);
  const [lon, lat] = epsg === 4326 ? [x, y] : proj4(def, 'EPSG:4326', [x, y]);
  if (!(lon >= -180 && lon <= 180) || !(lat >= -90 && lat <= 90)) {
    throw new Error(`(${x}, ${y}) in EPSG:${epsg} is outside the world (lon ${lon.toFixed(3)}, lat ${lat.toFixed(3)})`);
  }
  const outside = outsideUtmZone(lon, lat, epsg);
  if (outside) throw new Error(`(${x}, ${y}) in EPSG:${epsg} ${outside}: are easting and northing swapped, or is the EPSG code wrong?`);
  return { lon, lat };
}

/** Zones are 6° wide; 6° from the central meridian leaves a zone's width of slack for wells just over a zone edge. */
export const UTM_MAX_DEGREES_FROM_CENTRAL_MERIDIAN = 6;

/**
 * Why lon/lat cannot have come from a point of the WGS 84 / UTM zone `epsg`, or null when it can (or
 * `epsg` is not UTM). proj4 converts any easting/northing to some lon/lat, so a swapped pair lands
 * far from the zone or in the other hemisphere instead of failing: this is what catches it.
 * @example outsideUtmZone(-19.2, -43.1, 32713) // 'lies at lon -19.200, 85.8° from the zone 13 central meridian (105°W)'
 */
export function outsideUtmZone(lon: number, lat: number, epsg: number): string | null {
  const north = epsg >= 32601 && epsg <= 32660;
  const south = epsg >= 32701 && epsg <= 32760;
  if (!north && !south) return null;
  const zone = epsg - (north ? 32600 : 32700);
  const centralLon = -183 + 6 * zone;
  const offset = Math.abs(((((lon - centralLon) % 360) + 540) % 360) - 180);
  const meridian = `${Math.abs(centralLon)}°${centralLon < 0 ? 'W' : 'E'}`;
  if (offset > UTM_MAX_DEGREES_FROM_CENTRAL_MERIDIAN) {
    return `lies at lon ${lon.toFixed(3)}, ${offset.toFixed(1)}° from the zone ${zone} central meridian (${meridian})`;
  }
  if (north && lat < 0) return `lies at lat ${lat.toFixed(3)}, south of the equator, but zone ${zone}N is for the northern hemisphere`;
  if (south && lat > 0) return `lies at lat ${lat.toFixed(3)}, north of the equator, but zone ${zone}S is for the southern hemisphere`;
  return null;
}

/**
 * Checks lon/lat given as EPSG:4326: out-of-range values, and the common swap of latitude into the
 * longitude column, get a message instead of being accepted silently.
 */
export function checkLonLat(lon: number, lat: number): string | null {
  if (!Number.isFinite(lon) || !Number.isFinite(lat)) return 'longitude and latitude must be numbers';
  if (Math.abs(lat) > 90 && Math.abs(lon) <= 90) return `latitude ${lat} is outside −90..90: are longitude and latitude swapped?`;
  if (Math.abs(lat) > 90) return `latitude ${lat} is outside −90..90`;
  if (Math.abs(lon) > 180) return `longitude ${lon} is outside −180..180 (projected coordinates need an EPSG code)`;
  return null;
}
