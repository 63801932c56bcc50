import { scaleLinear, scaleLog, type ScaleContinuousNumeric } from 'd3';

/** The panels of the profile figure, in order from left to right after the depth axis. */
export type TrackKey = 'gamma' | 'sonic' | 'resistivity' | 'density';

export interface Band {
  x0: number;
  x1: number;
}

export interface ProfileLayout {
  width: number;
  height: number;
  /** Top of the plotting area (room for the track headers and x axes above it). */
  top: number;
  /** Bottom of the plotting area. */
  bottom: number;
  depthAxis: Band;
  tracks: (Band & { key: TrackKey })[];
  plot: Band;
  legend: Band;
}

const TRACK_WIDTH: Record<TrackKey, number> = { gamma: 84, sonic: 112, resistivity: 112, density: 92 };

/**
 * Where each panel of the profile figure goes for a given size: depth axis, log tracks, the pressure plot and
 * the legend column. Tracks shrink together (not below 64 px) when the figure is narrow; the pressure plot keeps
 * at least 300 px.
 * @example profileLayout(1100, 640, ['gamma', 'sonic']).plot; // { x0: 330, x1: 892 }
 */
export function profileLayout(width: number, height: number, tracks: readonly TrackKey[], legendWidth = 196): ProfileLayout {
  const left = 64;
  const gap = 12;
  const minPlot = 300;
  const wanted = tracks.reduce((s, k) => s + TRACK_WIDTH[k] + gap, 0);
  const room = Math.max(0, width - left - legendWidth - minPlot - 8);
  const shrink = wanted > room ? Math.max(64 / 112, room / Math.max(1, wanted)) : 1;
  let x = left;
  const bands = tracks.map((key) => {
    const w = Math.max(56, Math.round(TRACK_WIDTH[key] * shrink));
    const band = { key, x0: x, x1: x + w };
    x += w + gap;
    return band;
  });
  const plot = { x0: x + (tracks.length ? 4 : 0), x1: Math.max(x + 160, width - legendWidth - 8) };
  return {
    width,
    height,
    top: 74,
    bottom: height - 34,
    depthAxis: { x0: 0, x1: left },
    tracks: bands,
    plot,
    legend: { x0: plot.x1 + 16, x1: width - 4 },
  };
}

/**
 * The x scale of a log track: sonic reversed (slowness falls to the right, as logs are read), resistivity on a
 * log axis, the others linear.
 * @example trackScale('resistivity', [0.2, 20], { x0: 0, x1: 100 })(2); // 50
 */
export function trackScale(key: TrackKey, domain: [number, number], band: Band): ScaleContinuousNumeric<number, number> {
  const range: [number, number] = key === 'sonic' ? [band.x1 - 4, band.x0 + 4] : [band.x0 + 4, band.x1 - 4];
  if (key === 'resistivity') return scaleLog().domain(domain).range(range).clamp(false);
  return scaleLinear().domain(domain).range(range);
}

/**
 * A domain for a log track from its values: fixed trade ranges where the values fit, widened to the data otherwise.
 * @example trackDomain('gamma', Float64Array.of(20, 140)); // [0, 150]
 */
export function trackDomain(key: TrackKey, values: ArrayLike<number> | undefined): [number, number] {
  const preset: Record<TrackKey, [number, number]> = { gamma: [0, 150], sonic: [40, 200], resistivity: [0.2, 20], density: [1.95, 2.95] };
  let [lo, hi] = preset[key];
  if (!values) return [lo, hi];
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v)) continue;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  if (min === Infinity) return [lo, hi];
  if (key === 'resistivity') {
    if (min < lo) lo = 10 ** Math.floor(Math.log10(min));
    if (max > hi) hi = 10 ** Math.ceil(Math.log10(max));
  } else {
    const pad = (max - min) * 0.05;
    // Density in g/cc rounds to 0.05; the others (API, µs/ft) to whole units.
    const step = key === 'density' ? 0.05 : 1;
    if (min < lo) lo = Math.floor((min - pad) / step) * step;
    if (max > hi) hi = Math.ceil((max + pad) / step) * step;
  }
  return [lo, hi];
}

/**
 * A value domain that holds every finite value given, padded and rounded to nice ticks.
 * @example valueDomain([[0, 10.3], [2, 12]]); // [0, 13]
 */
export function valueDomain(
  series: readonly ArrayLike<number>[],
  opts: { padFraction?: number; floorAtZero?: boolean } = {},
): [number, number] {
  let min = Infinity;
  let max = -Infinity;
  for (const s of series) {
    for (let i = 0; i < s.length; i++) {
      const v = s[i];
      if (!Number.isFinite(v)) continue;
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  if (min === Infinity) return [0, 1];
  const pad = (max - min || Math.abs(max) || 1) * (opts.padFraction ?? 0.03);
  const lo = opts.floorAtZero ? 0 : min - pad;
  const [a, b] = scaleLinear()
    .domain([lo, max + pad])
    .nice(8)
    .domain();
  return [a, b];
}

/**
 * Zooms a depth domain about `centre` by `factor` (< 1 zooms in), kept inside `limits` and no thinner than `minSpan`.
 * @example zoomDomain([0, 4000], 2000, 0.5, [0, 4000]); // [1000, 3000]
 */
export function zoomDomain(
  domain: [number, number],
  centre: number,
  factor: number,
  limits: [number, number],
  minSpan = 20,
): [number, number] {
  const span = Math.min(limits[1] - limits[0], Math.max(minSpan, (domain[1] - domain[0]) * factor));
  const w = (centre - domain[0]) / (domain[1] - domain[0] || 1);
  return clampDomain([centre - w * span, centre - w * span + span], limits);
}

/**
 * Moves a depth domain by `delta`, kept inside `limits`.
 * @example panDomain([1000, 2000], 500, [0, 4000]); // [1500, 2500]
 */
export function panDomain(domain: [number, number], delta: number, limits: [number, number]): [number, number] {
  return clampDomain([domain[0] + delta, domain[1] + delta], limits);
}

function clampDomain([a, b]: [number, number], [lo, hi]: [number, number]): [number, number] {
  const span = Math.min(b - a, hi - lo);
  if (a < lo) return [lo, lo + span];
  if (b > hi) return [hi - span, hi];
  return [a, b];
}

/**
 * Index of the sample nearest to `depth` in an ascending array (binary search), −1 when empty.
 * @example nearestIndex(Float64Array.of(0, 10, 20), 14); // 1
 */
export function nearestIndex(depths: ArrayLike<number>, depth: number): number {
  const n = depths.length;
  if (n === 0) return -1;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (depths[mid] <= depth) lo = mid;
    else hi = mid;
  }
  return Math.abs(depths[hi] - depth) < Math.abs(depth - depths[lo]) ? hi : lo;
}
