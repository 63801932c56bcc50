import type { LocalFrame } from './localFrame';
import type { SurfaceInputPoint } from './types';

/** Two wells closer than this are one location for the interpolation. */
export const SAME_LOCATION_M = 1;

/** One location of the interpolation: the mean value of its wells, placed in the local frame. */
export interface MergedPoint extends SurfaceInputPoint {
  x: number;
  y: number;
  /** Names of the wells at this location, in input order. */
  members: string[];
}

/**
 * Duplicate locations make the kriging system singular: wells within {@link SAME_LOCATION_M} of each other
 * become one location with the mean of their values, and a warning names them.
 * @example mergeSameLocation([a, twinOfA, b], frame).merged.length // 2
 */
export function mergeSameLocation(points: readonly SurfaceInputPoint[], frame: LocalFrame): { merged: MergedPoint[]; warnings: string[] } {
  const merged: MergedPoint[] = [];
  for (const p of points) {
    const [x, y] = frame.forward([p.lon, p.lat]);
    const twin = merged.find((m) => Math.hypot(m.x - x, m.y - y) < SAME_LOCATION_M);
    if (twin) {
      twin.value = (twin.value * twin.members.length + p.value) / (twin.members.length + 1);
      twin.members.push(p.name);
      continue;
    }
    merged.push({ ...p, x, y, members: [p.name] });
  }
  const warnings = merged
    .filter((m) => m.members.length > 1)
    .map((m) => `Wells ${m.members.join(', ')} share a location; their values were averaged.`);
  return { merged, warnings };
}
