/**
 * world-atlas geometry is made for spherical rendering: a ring that crosses the antimeridian jumps from
 * +180° to −180°, Antarctica's ring runs once around the pole, and the 50m Antarctica carries a
 * degenerate ring along −90°. A planar tiler (geojson-vt) would draw such rings as bands across the whole
 * world. These functions turn them into plane geometry: longitudes are unwrapped to be continuous (the
 * tiler itself wraps anything beyond ±180°), and a ring around a pole is closed along that pole.
 */
import type { Position } from 'geojson';

/** Longitude step between two vertices that can only mean a crossing of the antimeridian. */
const JUMP_DEG = 180;

/**
 * Longitudes made continuous along a path, plus the number of full turns (±1 for a ring around a pole).
 * @example unwrapLongitudes([[179, 0], [-179, 1]]).path // [[179, 0], [181, 1]]
 */
export function unwrapLongitudes(path: readonly Position[]): { path: Position[]; turns: number } {
  if (path.length === 0) return { path: [], turns: 0 };
  let shift = 0;
  const out: Position[] = [[path[0][0], path[0][1]]];
  for (let i = 1; i < path.length; i++) {
    const dx = path[i][0] - path[i - 1][0];
    if (dx > JUMP_DEG) shift -= 360;
    else if (dx < -JUMP_DEG) shift += 360;
    out.push([path[i][0] + shift, path[i][1]]);
  }
  return { path: out, turns: Math.round(shift / 360) };
}

/** world-atlas quantization leaves "−90°" at −89.999°; no real coast lies within 0.01° of a pole. */
const POLE_EPS_DEG = 0.01;

/** True for rings that lie wholly on a pole (zero area on the sphere, a bogus band on the plane). */
function isPoleRing(ring: readonly Position[]): boolean {
  return ring.every((p) => 90 - Math.abs(p[1]) < POLE_EPS_DEG);
}

/**
 * A world-atlas polygon (rings as given) as a plane polygon, or null when nothing real is left.
 * Holes are shifted by whole turns to sit beside their exterior once that one is unwrapped.
 * @example planarPolygon([[[-180, -70], [0, -75], [179, -70], [-180, -70]]]) // closed along −90°
 */
export function planarPolygon(rings: readonly Position[][]): Position[][] | null {
  const real = rings.filter((r) => r.length >= 4 && !isPoleRing(r));
  if (real.length === 0) return null;
  const out = real.map((ring) => {
    const { path, turns } = unwrapLongitudes(ring);
    if (turns === 0) return path;
    // Around a pole: the unwrapped ring runs one full turn; go down to the pole and back to the start.
    const poleLat = meanLatitude(path) < 0 ? -90 : 90;
    const first = path[0];
    const last = path[path.length - 1];
    return [...path, [last[0], poleLat], [first[0], poleLat], [first[0], first[1]]];
  });
  const [west, east] = longitudeRange(out[0]);
  for (let i = 1; i < out.length; i++) {
    const lon = out[i][0][0];
    const turns = lon < west ? Math.ceil((west - lon) / 360) : lon > east ? -Math.ceil((lon - east) / 360) : 0;
    if (turns !== 0) out[i] = out[i].map((p) => [p[0] + turns * 360, p[1]]);
  }
  return out;
}

/**
 * The coastline of a world-atlas ring as a plane line. Unwrapping is all it takes: on the sphere every
 * segment is real coast, and the pole closure added by `planarPolygon` is never part of it.
 * @example planarCoast([[179, -70], [-179, -71], [179, -70]]) // [[[179, -70], [181, -71], [179, -70]]]
 */
export function planarCoast(ring: readonly Position[]): Position[][] {
  if (ring.length < 2 || isPoleRing(ring)) return [];
  return [unwrapLongitudes(ring).path];
}

/**
 * Lines (such as topojson meshes) unwrapped the same way; a line is kept whole, the tiler wraps it.
 * @example planarLines([[[179, 10], [-179, 10]]]) // [[[179, 10], [181, 10]]]
 */
export function planarLines(lines: readonly Position[][]): Position[][] {
  return lines.filter((l) => l.length >= 2).map((l) => unwrapLongitudes(l).path);
}

function meanLatitude(path: readonly Position[]): number {
  return path.reduce((s, p) => s + p[1], 0) / path.length;
}

function longitudeRange(path: readonly Position[]): [number, number] {
  let west = Infinity;
  let east = -Infinity;
  for (const p of path) {
    west = Math.min(west, p[0]);
    east = Math.max(east, p[0]);
  }
  return [west, east];
}
