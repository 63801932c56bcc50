import * as turf from '@turf/turf';
import type { Polygon } from 'geojson';
import proj4 from 'proj4';

export interface LocalFrame {
  /** proj4 definition of the frame. */
  def: string;
  /** lon/lat → x/y, m. */
  forward: (p: number[]) => [number, number];
  /** x/y, m → lon/lat. */
  inverse: (p: number[]) => [number, number];
}

/**
 * A local azimuthal equidistant frame about the prospect centre: distances from the centre are true and,
 * over a prospect's tens of kilometres, every distance is within a small fraction of a percent.
 * @example localFrame(outline).forward(centroidLonLat) // [0, 0]
 */
export function localFrame(outline: Polygon): LocalFrame {
  const [lon, lat] = turf.centroid(outline).geometry.coordinates;
  const def = `+proj=aeqd +lat_0=${lat} +lon_0=${lon} +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs`;
  const converter = proj4('EPSG:4326', def);
  return {
    def,
    forward: (p) => converter.forward([p[0], p[1]]) as [number, number],
    inverse: (p) => converter.inverse([p[0], p[1]]) as [number, number],
  };
}
