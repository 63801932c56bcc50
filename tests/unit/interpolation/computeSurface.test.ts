import * as turf from '@turf/turf';
import type { Polygon } from 'geojson';
import proj4 from 'proj4';
import { describe, expect, it } from 'vitest';
import {
  computeSurface,
  contourLevels,
  SurfaceInputError,
  type SurfaceComputePhase,
  type SurfaceInputPoint,
} from '../../../shared/interpolation/surface';
import { krigingNeighbours, surfaceRequestBody } from '../../../shared/schemas/surfaces';

// A prospect of about 40 × 55 km and 30 wells spread by the R2 low-discrepancy sequence (Roberts 2018,
// "The unreasonable effectiveness of quasirandom sequences"), with a smooth TOP-like depth field: no seed data needed.
const outline = turf.bboxPolygon([2.0, 56.0, 2.6, 56.5]).geometry as Polygon;
const R2 = [0.7548776662466927, 0.5698402909980532];
const wells: SurfaceInputPoint[] = Array.from({ length: 30 }, (_, i) => {
  const u = (0.5 + R2[0] * (i + 1)) % 1;
  const v = (0.5 + R2[1] * (i + 1)) % 1;
  const lon = 2.03 + 0.54 * u;
  const lat = 56.03 + 0.44 * v;
  return {
    wellId: `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
    name: `W-${i + 1}`,
    lon,
    lat,
    value: 2400 + 600 * u + 300 * Math.sin(2 * Math.PI * v) + 80 * Math.cos(7 * u * v),
    interpretationVersion: 1,
  };
});

function run(method: object, points = wells, extra: object = {}) {
  return computeSurface({
    points,
    outline,
    params: surfaceRequestBody.parse({ method, cellSizeM: 1000, extentBufferKm: 0, contourIntervalM: 100, ...extra }),
  });
}

describe('wells at one location', () => {
  const first = wells[0];
  const twin = { ...first, wellId: '00000000-0000-4000-8000-999999999999', name: 'TWIN', value: first.value + 100 };
  const r = run({ kind: 'idw', power: 2 }, [...wells.slice(0, 8), twin]);

  it('are averaged, and the run says so', () => {
    expect(r.warnings).toContain(`Wells ${first.name}, TWIN share a location; their values were averaged.`);
    // Leave-one-out reports predicted − observed, so the value the interpolation used there is predicted − residual:
    // the mean of the two wells (first.value + 50), not either one.
    const atTwin = r.wells.filter((w) => w.name === first.name || w.name === 'TWIN');
    expect(atTwin).toHaveLength(2);
    for (const w of atTwin) expect(w.predicted! - w.residual!).toBeCloseTo(first.value + 50, 6);
    // Each well keeps its own value in the reply.
    expect(atTwin.map((w) => w.value)).toEqual([first.value, first.value + 100]);
  });

  it('count once, with the mean value, in the estimate at a neighbour', () => {
    // Inverse-distance weighting, ẑ = Σ zᵢ/dᵢ² ÷ Σ 1/dᵢ² (Shepard 1968, Proc. ACM National Conference), computed here
    // on the run's own projection for the leave-one-out estimate at W-2 from the 7 other locations.
    const frame = proj4('EPSG:4326', r.grid.projection);
    const located = [{ ...first, value: first.value + 50 }, ...wells.slice(2, 8)].map((p) => ({
      xy: frame.forward([p.lon, p.lat]),
      z: p.value,
    }));
    const [x, y] = frame.forward([wells[1].lon, wells[1].lat]);
    let num = 0;
    let den = 0;
    for (const { xy, z } of located) {
      const w = 1 / ((xy[0] - x) ** 2 + (xy[1] - y) ** 2);
      num += w * z;
      den += w;
    }
    expect(r.wells.find((w) => w.name === 'W-2')!.predicted).toBeCloseTo(num / den, 6);
  });
});

describe('bad input', () => {
  it('needs at least three wells', () => {
    expect(() => run({ kind: 'idw', power: 2 }, wells.slice(0, 2))).toThrow(
      new SurfaceInputError('A surface needs at least 3 wells with a value at different locations; found 2.'),
    );
  });

  it('makes a flat surface with zero variance when all values are equal', () => {
    const r = run(
      { kind: 'kriging', model: 'spherical' },
      wells.slice(0, 6).map((p) => ({ ...p, value: 2500 })),
    );
    expect(r.grid.min).toBe(2500);
    expect(r.grid.max).toBe(2500);
    expect(r.grid.stdDev!.every((v) => v === null || v === 0)).toBe(true);
    expect(r.contours.features).toEqual([]);
    expect(r.warnings[0]).toMatch(/same value \(2500\): the surface is flat and its kriging variance is zero/);
  });

  it('refuses a cell size that would make too many cells', () => {
    expect(() => run({ kind: 'idw', power: 2 }, wells, { cellSizeM: 25 })).toThrow(
      /^Grid of \d+ × \d+ = \d+ cells exceeds the limit of 250000: choose a larger cell size\.$/,
    );
  });

  it('asks for the depth of an at-depth quantity, naming the field', () => {
    const r = surfaceRequestBody.safeParse({ quantity: 'emw_at_depth' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0]).toMatchObject({
      path: ['depthTvdssM'],
      message: 'is required for emw_at_depth: the depth below sea level, m',
    });
  });
});

describe('quantities in other units and progress', () => {
  const variogram = { model: 'exponential' as const, nugget: 100, sill: 60_000, range: 25_000 };

  it('kriges pressures (Pa) exactly as the same numbers in another unit: kriging is linear in the data', () => {
    // Ordinary kriging weights depend only on the variogram's shape, so multiplying every value by k and the sill and
    // nugget by k² multiplies estimates by k and variances by k² (Isaaks & Srivastava 1989, ch. 12).
    const k = 1e4;
    const depth = run({ kind: 'kriging', variogram });
    const pressure = run(
      { kind: 'kriging', variogram: { ...variogram, nugget: variogram.nugget * k * k, sill: variogram.sill * k * k } },
      wells.map((p) => ({ ...p, value: p.value * k })),
      { quantity: 'overpressure_at_depth', depthTvdssM: 3000, contourIntervalPa: 1e6 },
    );
    depth.grid.values.forEach((v, i) => {
      if (v === null) expect(pressure.grid.values[i]).toBeNull();
      else expect(pressure.grid.values[i]! / (v * k)).toBeCloseTo(1, 9);
    });
    const first = depth.grid.values.findIndex((v) => v !== null);
    expect(pressure.grid.stdDev![first]! / (depth.grid.stdDev![first]! * k)).toBeCloseTo(1, 9);
    expect(pressure.crossValidation.rmse / (depth.crossValidation.rmse * k)).toBeCloseTo(1, 9);
    expect(pressure.variogram!.model.sill).toBeCloseTo(variogram.sill * k * k, 0);
    expect((pressure.contours.features[0] as { properties: { label: string } }).properties.label).toMatch(/ Pa$/);
  });

  it('reports progress during the interpolation, then cross-validates and contours', () => {
    const calls: [SurfaceComputePhase, number, number][] = [];
    computeSurface(
      {
        points: wells,
        outline,
        params: surfaceRequestBody.parse({ method: { kind: 'kriging', variogram }, cellSizeM: 250, extentBufferKm: 0 }),
      },
      (phase, done, total) => calls.push([phase, done, total]),
    );
    const during = calls.filter(([phase, done, total]) => phase === 'interpolating' && done > 0 && done < total);
    expect(during.length).toBeGreaterThan(1);
    const dones = calls.filter(([phase]) => phase === 'interpolating').map(([, done]) => done);
    expect(dones).toEqual([...dones].sort((a, b) => a - b));
    expect([...new Set(calls.map(([phase]) => phase))]).toEqual(['interpolating', 'cross-validating', 'contouring']);
  });
});

describe('contour levels', () => {
  it('are every multiple of the interval within the grid’s range', () => {
    expect(contourLevels(2010, 2160, 50, 'm')).toEqual({ thresholds: [2050, 2100, 2150], warnings: [] });
  });

  it('widen past 200 levels and say so', () => {
    const { thresholds, warnings } = contourLevels(0, 10_000, 10, 'm');
    expect(warnings).toEqual(['A contour interval of 10 m would draw 1000 levels; it was widened to 50.0 m.']);
    expect(thresholds).toHaveLength(201);
  });
});

describe('kriging neighbourhood', () => {
  it('kriges with all wells for a small run by default, so contours have no seams where a neighbour set changes', () => {
    const variogram = { model: 'spherical' as const, nugget: 0, sill: 55_000, range: 34_000 };
    const all = run({ kind: 'kriging', variogram });
    const nearest = run({ kind: 'kriging', variogram, maxNeighbours: 16 });
    const everyWell = run({ kind: 'kriging', variogram, maxNeighbours: 64 });
    expect(all.grid.values).toEqual(everyWell.grid.values);
    expect(all.grid.values).not.toEqual(nearest.grid.values);
  });

  it('uses the nearest 16 above 100 wells', () => {
    expect(krigingNeighbours(null, 100)).toBeUndefined();
    expect(krigingNeighbours(null, 101)).toBe(16);
    expect(krigingNeighbours(8, 54)).toBe(8);
    expect(krigingNeighbours(64, 54)).toBeUndefined();
  });
});
