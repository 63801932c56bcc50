import type { ColourRamp } from '@/plots/surfaceRamp';
import { rampColour } from '@/plots/surfaceRamp';

/**
 * Grid values (row-major, SOUTH row first, null = no value) as RGBA pixels for an image whose first row is
 * the NORTH edge, as canvases and MapLibre image sources expect. Null cells are fully transparent.
 * `domain` maps to the ends of the ramp (values outside are clamped).
 * @example
 * const px = gridToRgba([1, 2, null, 4], 2, 2, [1, 4], DEPTH_RAMP); // 16 bytes, image row 0 = grid row 1
 */
export function gridToRgba(
  values: readonly (number | null)[],
  nx: number,
  ny: number,
  domain: readonly [number, number],
  ramp: ColourRamp,
  alpha = 255,
): Uint8ClampedArray {
  if (!Number.isInteger(nx) || !Number.isInteger(ny) || nx < 1 || ny < 1)
    throw new Error(`Grid size must be positive integers, got ${nx} × ${ny}`);
  if (values.length !== nx * ny) throw new Error(`Grid has ${values.length} values, expected nx × ny = ${nx * ny}`);
  const [lo, hi] = domain;
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new Error('Colour domain must be two finite numbers');
  const colour = rampColour(ramp);
  // A flat surface has no spread: paint it the middle of the ramp instead of dividing by zero.
  const span = hi - lo;
  const out = new Uint8ClampedArray(nx * ny * 4);
  for (let j = 0; j < ny; j++) {
    const imageRow = ny - 1 - j;
    for (let i = 0; i < nx; i++) {
      const v = values[j * nx + i];
      if (v === null || !Number.isFinite(v)) continue;
      const [r, g, b] = colour(span === 0 ? 0.5 : (v - lo) / span);
      const p = (imageRow * nx + i) * 4;
      out[p] = r;
      out[p + 1] = g;
      out[p + 2] = b;
      out[p + 3] = alpha;
    }
  }
  return out;
}

/**
 * The extreme values of a grid, ignoring nulls; null when it has none.
 * @example gridRange([3, null, 1]) // [1, 3]
 */
export function gridRange(values: readonly (number | null)[]): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (v === null || !Number.isFinite(v)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? [lo, hi] : null;
}
