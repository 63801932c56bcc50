/**
 * Where plot labels and the hover read-out go so they stay readable: off the legend, off each other, off the curves.
 * Text widths are estimated from character counts (≈ 0.56 em per character of Inter at small sizes, common
 * practice, no source) because these run without a DOM.
 */

/** Halo behind SVG text: a stroke in the figure's background colour painted under the fill. */
export const LABEL_HALO = { stroke: '#FFFFFF', 'stroke-width': 3.5, 'stroke-linejoin': 'round', 'paint-order': 'stroke' } as const;

/** Estimated width of a label in px. */
export function labelWidth(text: string, fontPx: number): number {
  return text.length * fontPx * 0.56;
}

/**
 * Left edge of a hover box of width `boxWidth` beside the pointer at `px`: to its right unless it would reach
 * `avoidX0` (the legend column, or the figure's edge), then to its left; never past the figure's left edge.
 * @example readoutLeft(700, 250, 880); // 716 (fits right of the pointer)
 * @example readoutLeft(700, 250, 900 - 20); // 434 (would cover the legend: flipped)
 */
export function readoutLeft(px: number, boxWidth: number, avoidX0: number, gap = 16): number {
  const right = px + gap;
  if (right + boxWidth <= avoidX0) return right;
  return Math.max(0, px - gap - boxWidth);
}

/**
 * Baselines for labels that want to sit at `wanted` (px, any order) but need `height` px each: pushed apart
 * downwards, then back up where the last ones would pass `max`; at least `min`. Returned in the input order.
 * @example staggerLabels([100, 104, 300], 13); // [100, 113, 300]
 */
export function staggerLabels(wanted: readonly number[], height: number, min = -Infinity, max = Infinity): number[] {
  const order = wanted.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  const placed = order.map((o) => Math.max(min, o.y));
  for (let k = 1; k < placed.length; k++) placed[k] = Math.max(placed[k], placed[k - 1] + height);
  if (placed.length && placed[placed.length - 1] > max) {
    placed[placed.length - 1] = max;
    for (let k = placed.length - 2; k >= 0; k--) placed[k] = Math.min(placed[k], placed[k + 1] - height);
  }
  const out = new Array<number>(wanted.length);
  order.forEach((o, k) => (out[o.i] = placed[k]));
  return out;
}

/**
 * Where along a horizontal line from `x0` to `x1` a label of width `width` crosses the fewest curves: the curves
 * cross the line at `curveXs`. Prefers the right end, then the left end, then the middle of the widest gap.
 * Returns the label's anchor point and SVG text-anchor.
 * @example clearSpot([880], 400, 900, 70); // { x: 406, anchor: 'start' } (a curve crosses the right end)
 */
export function clearSpot(
  curveXs: readonly number[],
  x0: number,
  x1: number,
  width: number,
  pad = 6,
): { x: number; anchor: 'start' | 'end' | 'middle' } {
  const xs = curveXs.filter((v) => Number.isFinite(v) && v >= x0 && v <= x1).sort((a, b) => a - b);
  const free = (a: number, b: number) => xs.every((v) => v < a - 3 || v > b + 3);
  if (free(x1 - pad - width, x1 - pad)) return { x: x1 - pad, anchor: 'end' };
  if (free(x0 + pad, x0 + pad + width)) return { x: x0 + pad, anchor: 'start' };
  const edges = [x0, ...xs, x1];
  let best = { gap: -1, mid: (x0 + x1) / 2 };
  for (let k = 1; k < edges.length; k++) {
    const gap = edges[k] - edges[k - 1];
    if (gap > best.gap) best = { gap, mid: (edges[k] + edges[k - 1]) / 2 };
  }
  if (best.gap >= width + 2 * pad) return { x: best.mid, anchor: 'middle' };
  return { x: x1 - pad, anchor: 'end' };
}
