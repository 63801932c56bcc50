/** west, south, east, north in degrees. */
export type LonLatBounds = [number, number, number, number];

/** Half-width given to the frame of a single well or of wells on one spot, in degrees (≈ 5 km of latitude). */
const MIN_HALF_SPAN_DEG = 0.045;

/**
 * The frame around a set of points, widened so a single well does not zoom the map to street level.
 * Points with impossible coordinates are skipped; no points gives null. Frames across the antimeridian
 * are not handled (no team works there yet).
 * @example boundsOfPoints([{ lon: -101.2, lat: -32.4 }, { lon: -100.8, lat: -32.7 }]) // [-101.2, -32.7, -100.8, -32.4]
 */
export function boundsOfPoints(points: readonly { lon: number; lat: number }[]): LonLatBounds | null {
  let w = Infinity;
  let s = Infinity;
  let e = -Infinity;
  let n = -Infinity;
  for (const p of points) {
    if (!Number.isFinite(p.lon) || !Number.isFinite(p.lat) || Math.abs(p.lon) > 180 || Math.abs(p.lat) > 90) continue;
    w = Math.min(w, p.lon);
    e = Math.max(e, p.lon);
    s = Math.min(s, p.lat);
    n = Math.max(n, p.lat);
  }
  if (w === Infinity) return null;
  const widen = (lo: number, hi: number, limit: number): [number, number] => {
    if (hi - lo >= 2 * MIN_HALF_SPAN_DEG) return [lo, hi];
    const mid = (lo + hi) / 2;
    return [Math.max(-limit, mid - MIN_HALF_SPAN_DEG), Math.min(limit, mid + MIN_HALF_SPAN_DEG)];
  };
  const [w2, e2] = widen(w, e, 180);
  const [s2, n2] = widen(s, n, 90);
  return [w2, s2, e2, n2];
}

/**
 * The outer ring's frame of a polygon.
 * @example boundsOfRing([[0, 0], [2, 0], [2, 1], [0, 0]]) // [0, 0, 2, 1]
 */
export function boundsOfRing(ring: readonly (readonly number[])[]): LonLatBounds | null {
  return boundsOfPoints(ring.map(([lon, lat]) => ({ lon, lat })));
}
