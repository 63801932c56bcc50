import * as turf from '@turf/turf';
import { contours as d3Contours } from 'd3-contour';
import proj4 from 'proj4';
import type { Polygon } from 'geojson';
import {
  experimentalVariogram,
  fitPlanarTrend,
  fitVariogram,
  grid as makeGrid,
  idw,
  leaveOneOut,
  ordinaryKriging,
  type DataPoint,
  type PlanarTrend,
  type Variogram,
} from '../../../shared/interpolation';
import {
  MAX_SURFACE_CELLS,
  contourIntervalOf,
  krigingNeighbours,
  surfaceRequestBody,
  surfaceSiUnit,
  type Surface,
} from '../../../shared/schemas/surfaces';
import type { z } from 'zod';

export type SurfaceParams = z.output<typeof surfaceRequestBody>;

export interface SurfaceInputPoint {
  wellId: string;
  name: string;
  lon: number;
  lat: number;
  /** In the SI unit of the run's quantity (m, kg/m³ or Pa). */
  value: number;
  interpretationVersion: number | null;
  atDepth?: Surface['wells'][number]['atDepth'];
}

export interface SurfaceInput {
  points: SurfaceInputPoint[];
  /** The prospect outline, lon/lat. */
  outline: Polygon;
  params: SurfaceParams;
}

export type SurfaceResult = Pick<Surface, 'grid' | 'contours' | 'extent' | 'variogram' | 'crossValidation' | 'wells' | 'warnings'>;

/** A failure the caller should show as it is (bad input, not a bug). */
export class SurfaceInputError extends Error {}

type Progress = (phase: string, done: number, total: number) => void;

/** Two wells closer than this are one location for the interpolation. */
const SAME_LOCATION_M = 1;
const EXPERIMENTAL_LAGS = 12;
/** Cells estimated between two progress reports: often enough for a bar to move, rare enough to cost nothing. */
const PROGRESS_CHUNK = 2000;
/** More contour levels than this would draw a solid smear; the interval is widened and the run says so. */
const MAX_CONTOUR_LEVELS = 200;

/** The grid's neighbour rule applied to leave-one-out, where each estimate has one datum fewer. */
function looNeighbours(maxNeighbours: number | null, wells: number): number | undefined {
  const k = krigingNeighbours(maxNeighbours, wells);
  return k === undefined ? undefined : Math.min(k, wells - 1);
}

/** Estimates the targets in chunks so the worker can report progress during the interpolation itself. */
function inChunks<T, R>(targets: readonly T[], estimate: (chunk: T[]) => R[], progress: Progress): R[] {
  const out: R[] = [];
  for (let start = 0; start < targets.length; start += PROGRESS_CHUNK) {
    for (const e of estimate(targets.slice(start, start + PROGRESS_CHUNK))) out.push(e);
    progress('interpolating', Math.min(start + PROGRESS_CHUNK, targets.length), targets.length);
  }
  return out;
}

/**
 * A local azimuthal equidistant frame about the prospect centre: distances from the centre are true and,
 * over a prospect's tens of kilometres, every distance is within a small fraction of a percent.
 */
function localFrame(outline: Polygon) {
  const [lon, lat] = turf.centroid(outline).geometry.coordinates;
  const def = `+proj=aeqd +lat_0=${lat} +lon_0=${lon} +x_0=0 +y_0=0 +datum=WGS84 +units=m +no_defs`;
  const converter = proj4('EPSG:4326', def);
  return {
    def,
    forward: (p: number[]) => converter.forward([p[0], p[1]]) as [number, number],
    inverse: (p: number[]) => converter.inverse([p[0], p[1]]) as [number, number],
  };
}

/**
 * Interpolates well values (e.g. TOP depths) onto a grid over the prospect plus a buffer: ordinary
 * kriging with a fitted or given variogram, or inverse-distance weighting; leave-one-out
 * cross-validation; contour bands from d3-contour, all returned in lon/lat.
 */
export function computeSurface({ points: raw, outline, params }: SurfaceInput, progress: Progress = () => {}): SurfaceResult {
  const warnings: string[] = [];
  const frame = localFrame(outline);
  // Duplicate locations make the kriging system singular: merge them and say so.
  const merged: (SurfaceInputPoint & { x: number; y: number; members: string[] })[] = [];
  for (const p of raw) {
    const [x, y] = frame.forward([p.lon, p.lat]);
    const twin = merged.find((m) => Math.hypot(m.x - x, m.y - y) < SAME_LOCATION_M);
    if (twin) {
      twin.value = (twin.value * twin.members.length + p.value) / (twin.members.length + 1);
      twin.members.push(p.name);
      continue;
    }
    merged.push({ ...p, x, y, members: [p.name] });
  }
  for (const m of merged)
    if (m.members.length > 1) warnings.push(`Wells ${m.members.join(', ')} share a location; their values were averaged.`);
  if (merged.length < 3) {
    throw new SurfaceInputError(`A surface needs at least 3 wells with a value at different locations; found ${merged.length}.`);
  }
  // Pressures are solved in MPa: with sills of ~10¹³ Pa² beside the unit row of the kriging system, the LU's
  // pivot test (relative to the largest entry) would call a sound system singular. Results are scaled back below.
  const scale = surfaceSiUnit(params.quantity) === 'Pa' ? 1e6 : 1;
  const data: DataPoint[] = merged.map((m) => ({ x: m.x, y: m.y, value: m.value / scale }));

  const extentLonLat = turf.buffer(turf.feature(outline), params.extentBufferKm, { units: 'kilometers' })!.geometry as Polygon;
  const ringM = extentLonLat.coordinates[0].map(frame.forward);
  const extentM = turf.polygon([ringM]);
  const [minX, minY, maxX, maxY] = turf.bbox(extentM);
  let g: ReturnType<typeof makeGrid>;
  try {
    g = makeGrid([minX, minY, maxX, maxY], params.cellSizeM, { maxCells: MAX_SURFACE_CELLS });
  } catch (err) {
    throw new SurfaceInputError(`${(err as Error).message}: choose a larger cell size.`);
  }
  const inside = g.targets.map((t) => turf.booleanPointInPolygon([t.x, t.y], extentM));
  const targets = g.targets.filter((_, k) => inside[k]);

  const values = data.map((d) => d.value);
  const flat = Math.max(...values) - Math.min(...values) === 0;
  let variogram: Variogram | null = null;
  let experimental: ReturnType<typeof experimentalVariogram> = [];
  let fitted = false;
  let estimates: { value: number; variance: number | null }[];
  let trend: PlanarTrend | null = null;
  let krigData = data;
  progress('interpolating', 0, targets.length);
  if (flat) {
    warnings.push(
      `All ${data.length} wells have the same value (${values[0] * scale}): the surface is flat and its kriging variance is zero.`,
    );
    estimates = targets.map(() => ({ value: values[0] * scale, variance: params.method.kind === 'kriging' ? 0 : null }));
  } else if (params.method.kind === 'kriging') {
    // Regression kriging when asked: a least-squares plane takes out the regional trend, the residuals are kriged,
    // and the plane is added back (its own estimation error is not in the variance).
    if (params.method.trend === 'planar') {
      if (data.length < 4) throw new SurfaceInputError('Removing a planar trend needs at least 4 wells; krige without it, or add wells.');
      const plane = fitPlanarTrend(data);
      trend = plane;
      krigData = data.map((d) => ({ ...d, value: d.value - plane.evaluate(d.x, d.y) }));
      const perKm = Math.hypot(plane.b, plane.c) * 1000 * scale;
      const towards = ((Math.atan2(plane.b, plane.c) * 180) / Math.PI + 360) % 360;
      warnings.push(
        `A planar regional trend was removed before kriging (rising ${Number(perKm.toPrecision(3))} ${surfaceSiUnit(params.quantity)} per km toward ${Math.round(towards)}°); the variogram is of the residuals.`,
      );
    }
    let maxD = 0;
    for (let i = 0; i < data.length; i++)
      for (let j = i + 1; j < data.length; j++) maxD = Math.max(maxD, Math.hypot(data[i].x - data[j].x, data[i].y - data[j].y));
    // Lags up to half the largest well separation: past it few pairs span the area and the estimates are erratic
    // (common practice, no source). fitVariogram bounds the practical range by the largest lag it is given.
    experimental = experimentalVariogram(krigData, { lags: EXPERIMENTAL_LAGS, lagWidth: maxD / 2 / EXPERIMENTAL_LAGS });
    if (params.method.variogram) {
      const v = params.method.variogram;
      variogram = { ...v, nugget: v.nugget / scale ** 2, sill: v.sill / scale ** 2 };
    } else {
      if (experimental.length < 3)
        throw new SurfaceInputError('Too few well pairs to fit a variogram: give one by hand, or use inverse-distance weighting.');
      variogram = fitVariogram(experimental, { model: params.method.model });
      fitted = true;
    }
    const v = variogram;
    // All wells up to ALL_WELLS_MAX: one factorisation for every cell and no seams where a neighbour set changes.
    const maxNeighbours = krigingNeighbours(params.method.maxNeighbours, data.length);
    const t = trend;
    estimates = inChunks(
      targets,
      (chunk) =>
        ordinaryKriging(krigData, v, chunk, { maxNeighbours }).map((e, k) => ({
          value: (e.value + (t ? t.evaluate(chunk[k].x, chunk[k].y) : 0)) * scale,
          variance: e.variance * scale ** 2,
        })),
      progress,
    );
  } else {
    const power = params.method.power;
    estimates = inChunks(
      targets,
      (chunk) => idw(data, chunk, { power }).map((value) => ({ value: value * scale, variance: null as number | null })),
      progress,
    );
  }
  progress('cross-validating', targets.length, targets.length);

  const method =
    params.method.kind === 'kriging' && variogram
      ? {
          kind: 'kriging' as const,
          variogram,
          maxNeighbours: looNeighbours(params.method.kind === 'kriging' ? params.method.maxNeighbours : null, data.length),
        }
      : { kind: 'idw' as const, power: params.method.kind === 'idw' ? params.method.power : 2 };
  const looRaw = flat
    ? { rmse: 0, meanError: 0, residuals: data.map((d, index) => ({ index, observed: d.value, predicted: d.value, residual: 0 })) }
    : leaveOneOut(krigData, method);
  // With a trend removed the residuals were cross-validated (the plane fitted on all wells); the plane goes back on.
  const plane = trend;
  const loo = plane
    ? {
        ...looRaw,
        residuals: looRaw.residuals.map((r) => ({
          ...r,
          observed: data[r.index].value,
          predicted: r.predicted + plane.evaluate(data[r.index].x, data[r.index].y),
        })),
      }
    : looRaw;

  const cellValues: (number | null)[] = new Array(g.nx * g.ny).fill(null);
  const cellStd: (number | null)[] | null = params.method.kind === 'kriging' ? new Array(g.nx * g.ny).fill(null) : null;
  let t = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let c = 0; c < inside.length; c++) {
    if (!inside[c]) continue;
    const e = estimates[t++];
    cellValues[c] = e.value;
    if (cellStd) cellStd[c] = e.variance === null ? null : Math.sqrt(Math.max(0, e.variance));
    min = Math.min(min, e.value);
    max = Math.max(max, e.value);
  }

  // Contour bands: each feature is the region at or beyond its value (d3-contour), as a MultiPolygon.
  progress('contouring', 0, 1);
  const unit = surfaceSiUnit(params.quantity);
  let interval = contourIntervalOf(params);
  if ((max - min) / interval > MAX_CONTOUR_LEVELS) {
    const wider = (max - min) / MAX_CONTOUR_LEVELS;
    warnings.push(
      `A contour interval of ${interval} ${unit} would draw ${Math.floor((max - min) / interval)} levels; it was widened to ${wider.toPrecision(3)} ${unit}.`,
    );
    interval = wider;
  }
  const thresholds: number[] = [];
  for (let v = Math.ceil(min / interval) * interval; v <= max; v += interval) thresholds.push(v);
  const grid2 = cellValues.map((v) => (v === null ? NaN : v));
  const toLonLat = ([cx, cy]: number[]) => {
    const [lon, lat] = frame.inverse([g.x0 - g.cellSize / 2 + cx * g.cellSize, g.y0 - g.cellSize / 2 + cy * g.cellSize]);
    return [Math.round(lon * 1e7) / 1e7, Math.round(lat * 1e7) / 1e7];
  };
  const bands = flat ? [] : d3Contours().size([g.nx, g.ny]).thresholds(thresholds)(grid2);
  const contours = {
    type: 'FeatureCollection' as const,
    features: bands
      .filter((b) => b.coordinates.length > 0)
      .map((b) => ({
        type: 'Feature',
        properties: { value: b.value, label: `${Number(b.value.toPrecision(6))} ${unit}` },
        geometry: { type: 'MultiPolygon', coordinates: b.coordinates.map((poly) => poly.map((ring) => ring.map(toLonLat))) },
      })),
  };

  const corner = (x: number, y: number) => frame.inverse([x, y]);
  const x1 = g.x0 - g.cellSize / 2;
  const y1 = g.y0 - g.cellSize / 2;
  const x2 = x1 + g.nx * g.cellSize;
  const y2 = y1 + g.ny * g.cellSize;
  const byIndex = new Map(loo.residuals.map((r) => [r.index, r]));
  const at = (v: number | undefined) => (v === undefined ? null : v * scale);
  return {
    grid: {
      nx: g.nx,
      ny: g.ny,
      cellSizeM: g.cellSize,
      projection: frame.def,
      x0: g.x0,
      y0: g.y0,
      values: cellValues,
      stdDev: cellStd,
      cornersLonLat: [corner(x1, y1), corner(x2, y1), corner(x2, y2), corner(x1, y2)],
      min,
      max,
    },
    contours,
    extent: extentLonLat as Surface['extent'],
    variogram: variogram
      ? {
          model: { ...variogram, nugget: variogram.nugget * scale ** 2, sill: variogram.sill * scale ** 2 },
          experimental: experimental.map((e) => ({ ...e, gamma: e.gamma * scale ** 2 })),
          fitted,
        }
      : null,
    crossValidation: { rmse: loo.rmse * scale, meanError: loo.meanError * scale },
    wells: merged.flatMap((m, index) =>
      raw
        .filter((p) => m.members.includes(p.name))
        .map((p) => ({
          wellId: p.wellId,
          name: p.name,
          lon: p.lon,
          lat: p.lat,
          value: p.value,
          interpretationVersion: p.interpretationVersion,
          ...(p.atDepth ? { atDepth: p.atDepth } : {}),
          residual: at(byIndex.get(index)?.residual),
          predicted: at(byIndex.get(index)?.predicted),
        })),
    ),
    warnings,
  };
}
