/**
 * Where to put a country's name: the point of its polygon farthest from any edge (the pole of
 * inaccessibility, Garcia-Castellanos & Lombardo 2007, Scottish Geographical Journal 123(3)).
 * Our own because turf has no such function, and turf's centroid and centre of mass fall outside
 * concave shapes (a label for Chile or Norway would sit in the sea).
 */
import type { Position } from 'geojson';

const GRID = 12;
const ROUNDS = 7;
/** Rings are thinned to this many vertices for the search: a label needs the shape, not every cove. */
const MAX_RING_VERTICES = 400;

/**
 * Pole of inaccessibility of a polygon (lon/lat rings, first the exterior, then holes), found by a grid
 * search refined around the best cell. Distances are measured on an equirectangular plane scaled at the
 * polygon's mid-latitude, which is close enough for a label.
 * @example labelPoint([[[0, 0], [2, 0], [2, 2], [0, 2], [0, 0]]]) // ≈ [1, 1]
 */
export function labelPoint(rings: readonly Position[][]): [number, number] {
  if (rings.length === 0 || rings[0].length < 4) throw new Error('labelPoint: the polygon needs an exterior ring of at least 4 positions.');
  const box = bbox(rings[0]);
  const [, , east, north] = box;
  let [west, south] = box;
  const k = Math.cos((((south + north) / 2) * Math.PI) / 180);
  const plane = rings.map((r) => {
    const step = Math.max(1, Math.ceil(r.length / MAX_RING_VERTICES));
    const thinned = r.filter((_, i) => i % step === 0 || i === r.length - 1);
    return thinned.map((p) => [p[0] * k, p[1]] as [number, number]);
  });
  let best: { x: number; y: number; d: number } = { x: ((west + east) / 2) * k, y: (south + north) / 2, d: -Infinity };
  let x0 = west * k;
  let x1 = east * k;
  let y0 = south;
  let y1 = north;
  for (let round = 0; round < ROUNDS; round++) {
    const dx = (x1 - x0) / GRID;
    const dy = (y1 - y0) / GRID;
    for (let i = 0; i < GRID; i++) {
      for (let j = 0; j < GRID; j++) {
        const x = x0 + (i + 0.5) * dx;
        const y = y0 + (j + 0.5) * dy;
        const d = signedDistance(x, y, plane);
        if (d > best.d) best = { x, y, d };
      }
    }
    // Zoom in on the best cell and its neighbours: the true optimum is within a cell of it.
    x0 = best.x - 1.5 * dx;
    x1 = best.x + 1.5 * dx;
    y0 = best.y - 1.5 * dy;
    y1 = best.y + 1.5 * dy;
  }
  if (best.d < 0) {
    // A sliver thinner than the grid: fall back to the first vertex, which is on the polygon.
    [west, south] = rings[0][0];
    return [west, south];
  }
  return [best.x / k, best.y];
}

/** Distance to the nearest edge, positive inside (even-odd over all rings), negative outside. */
function signedDistance(x: number, y: number, rings: readonly [number, number][][]): number {
  let inside = false;
  let minSq = Infinity;
  for (const ring of rings) {
    for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
      const [ax, ay] = ring[i];
      const [bx, by] = ring[j];
      if (ay > y !== by > y && x < ((bx - ax) * (y - ay)) / (by - ay) + ax) inside = !inside;
      minSq = Math.min(minSq, segmentDistanceSq(x, y, ax, ay, bx, by));
    }
  }
  return (inside ? 1 : -1) * Math.sqrt(minSq);
}

function segmentDistanceSq(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  let x = ax;
  let y = ay;
  const dx = bx - ax;
  const dy = by - ay;
  if (dx !== 0 || dy !== 0) {
    const t = ((px - ax) * dx + (py - ay) * dy) / (dx * dx + dy * dy);
    if (t > 1) {
      x = bx;
      y = by;
    } else if (t > 0) {
      x += dx * t;
      y += dy * t;
    }
  }
  return (px - x) ** 2 + (py - y) ** 2;
}

function bbox(ring: readonly Position[]): [number, number, number, number] {
  let west = Infinity;
  let south = Infinity;
  let east = -Infinity;
  let north = -Infinity;
  for (const [lon, lat] of ring) {
    west = Math.min(west, lon);
    east = Math.max(east, lon);
    south = Math.min(south, lat);
    north = Math.max(north, lat);
  }
  return [west, south, east, north];
}
