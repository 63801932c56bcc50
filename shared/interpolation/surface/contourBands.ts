import { contours as d3Contours } from 'd3-contour';
import type { Surface } from '../../schemas/surfaces';
import type { Grid } from '../grid';
import type { FilledGrid } from './fillGrid';
import type { LocalFrame } from './localFrame';

/** More contour levels than this would draw a solid smear; the interval is widened and the run says so. */
export const MAX_CONTOUR_LEVELS = 200;

/**
 * Every multiple of `interval` within [min, max], the interval widened first when there would be more than
 * {@link MAX_CONTOUR_LEVELS} of them.
 * @example contourLevels(2010, 2160, 50, 'm').thresholds // [2050, 2100, 2150]
 */
export function contourLevels(min: number, max: number, interval: number, unit: string): { thresholds: number[]; warnings: string[] } {
  const warnings: string[] = [];
  let step = interval;
  if ((max - min) / step > MAX_CONTOUR_LEVELS) {
    const wider = (max - min) / MAX_CONTOUR_LEVELS;
    warnings.push(
      `A contour interval of ${step} ${unit} would draw ${Math.floor((max - min) / step)} levels; it was widened to ${wider.toPrecision(3)} ${unit}.`,
    );
    step = wider;
  }
  const thresholds: number[] = [];
  for (let v = Math.ceil(min / step) * step; v <= max; v += step) thresholds.push(v);
  return { thresholds, warnings };
}

/**
 * Contour bands of the grid in lon/lat: each feature is the region at or beyond its value (d3-contour), as a MultiPolygon.
 * @example contourBands(g, filled, frame, [2050, 2100], 'm').features[0].properties // { value: 2050, label: '2050 m' }
 */
export function contourBands(g: Grid, filled: FilledGrid, frame: LocalFrame, thresholds: number[], unit: string): Surface['contours'] {
  const values = filled.values.map((v) => (v === null ? NaN : v));
  const toLonLat = ([cx, cy]: number[]) => {
    const [lon, lat] = frame.inverse([g.x0 - g.cellSize / 2 + cx * g.cellSize, g.y0 - g.cellSize / 2 + cy * g.cellSize]);
    return [Math.round(lon * 1e7) / 1e7, Math.round(lat * 1e7) / 1e7];
  };
  const bands = thresholds.length ? d3Contours().size([g.nx, g.ny]).thresholds(thresholds)(values) : [];
  return {
    type: 'FeatureCollection',
    features: bands
      .filter((b) => b.coordinates.length > 0)
      .map((b) => ({
        type: 'Feature',
        properties: { value: b.value, label: `${Number(b.value.toPrecision(6))} ${unit}` },
        geometry: { type: 'MultiPolygon', coordinates: b.coordinates.map((poly) => poly.map((ring) => ring.map(toLonLat))) },
      })),
  };
}
