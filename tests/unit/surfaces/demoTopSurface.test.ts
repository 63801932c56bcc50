import * as turf from '@turf/turf';
import type { Polygon } from 'geojson';
import proj4 from 'proj4';
import { describe, expect, it } from 'vitest';
import { leaveOneOut } from '../../../shared/interpolation';
import { hiddenTopTvdssM } from '../../../server/db/seed/demoBasin/surfaces';
import { demoTopPick } from '../../../server/db/seed/demoBasin/writeInterpretations';
import { computeSurface, type SurfaceInputPoint } from '../../../shared/interpolation/surface';
import { surfaceRequestBody } from '../../../shared/schemas/surfaces';
import { demo } from '../demoBasin/demoData';

const basin = demo();
const [w, s, e, n] = basin.basin.bbox;
const outline = turf.bboxPolygon([w + 0.05, s + 0.05, e - 0.05, n - 0.05]).geometry as Polygon;
const picks: SurfaceInputPoint[] = basin.wells.flatMap((well) => {
  const pick = demoTopPick(well);
  return pick
    ? [
        {
          wellId: crypto.randomUUID(),
          name: well.name,
          lon: well.lon,
          lat: well.lat,
          value: pick.tvdM - well.datumElevationM,
          interpretationVersion: 1,
        },
      ]
    : [];
});

function run(method: object, points = picks, extra: object = {}) {
  return computeSurface({
    points,
    outline,
    params: surfaceRequestBody.parse({ method, cellSizeM: 1000, extentBufferKm: 0, contourIntervalM: 100, ...extra }),
  });
}

/** Grid cell centres back in lon/lat with their value, inside the wells' convex hull only (no extrapolation). */
function cellsInHull(result: ReturnType<typeof run>) {
  const hull = turf.convex(turf.featureCollection(picks.map((p) => turf.point([p.lon, p.lat]))))!;
  const [sw, se, , nw] = result.grid.cornersLonLat;
  const out: { lon: number; lat: number; value: number }[] = [];
  for (let j = 0; j < result.grid.ny; j++)
    for (let i = 0; i < result.grid.nx; i++) {
      const v = result.grid.values[j * result.grid.nx + i];
      if (v === null) continue;
      // Corners are nearly a rectangle in lon/lat over 80 km; bilinear placement is within a few metres.
      const lon = sw[0] + ((i + 0.5) / result.grid.nx) * (se[0] - sw[0]);
      const lat = sw[1] + ((j + 0.5) / result.grid.ny) * (nw[1] - sw[1]);
      if (turf.booleanPointInPolygon([lon, lat], hull)) out.push({ lon, lat, value: v });
    }
  return out;
}

describe('TOP surface of the demo basin against its hidden truth', () => {
  // The picks sit below the hidden onset by a steady offset (see topPicks.test.ts); the truth the map
  // should show is that surface shifted by the mean offset at the wells.
  const offset = picks.reduce((sum, p) => sum + p.value - hiddenTopTvdssM(p.lon, p.lat), 0) / picks.length;
  const rmseAgainstTruth = (r: ReturnType<typeof run>) => {
    const cells = cellsInHull(r);
    return Math.sqrt(cells.reduce((sum, c) => sum + (c.value - hiddenTopTvdssM(c.lon, c.lat) - offset) ** 2, 0) / cells.length);
  };
  const kriged = run({ kind: 'kriging', model: 'spherical' });
  const inverse = run({ kind: 'idw', power: 2 });
  const exponential = run({ kind: 'kriging', model: 'exponential' });

  it('reproduces the hidden surface within 120 m RMS inside the well hull (relief ≈ 1,900 m)', () => {
    expect(rmseAgainstTruth(kriged)).toBeLessThan(120);
  });

  it('is not worse than inverse-distance weighting on the same picks', () => {
    expect(rmseAgainstTruth(kriged)).toBeLessThanOrEqual(rmseAgainstTruth(inverse));
  });

  it('reports leave-one-out cross-validation per well', () => {
    expect(kriged.crossValidation.rmse).toBeGreaterThan(0);
    expect(kriged.crossValidation.rmse).toBeLessThan(300);
    expect(kriged.wells.every((x) => x.residual !== null)).toBe(true);
    expect(kriged.variogram?.fitted).toBe(true);
  });

  it('fits a practical range no longer than the largest lag used (about half the largest well separation)', () => {
    for (const r of [kriged, exponential]) {
      const lags = r.variogram!.experimental;
      expect(r.variogram!.model.range).toBeLessThanOrEqual(lags[lags.length - 1].lagM * (1 + 1e-9));
    }
  });

  // Leave-one-out standardised errors (observed − predicted)/σ: for a Gaussian error with the right σ, mean |z| ≈
  // √(2/π) ≈ 0.8 and RMS z ≈ 1 (common practice, no source). Before the fit was bounded, σ at the wells was 3–4×
  // the errors (RMS z ≈ 0.2).
  const standardised = (r: ReturnType<typeof run>) => {
    const conv = proj4('EPSG:4326', r.grid.projection);
    const data = picks.map((p) => {
      const [x, y] = conv.forward([p.lon, p.lat]);
      return { x, y, value: p.value };
    });
    const loo = leaveOneOut(data, { kind: 'kriging', variogram: r.variogram!.model });
    const z = loo.residuals.map((q) => q.residual / q.stdDev!);
    return {
      meanAbs: z.reduce((a, b) => a + Math.abs(b), 0) / z.length,
      rms: Math.sqrt(z.reduce((a, b) => a + b * b, 0) / z.length),
      rmse: loo.rmse,
      meanSd: loo.residuals.reduce((a, q) => a + q.stdDev!, 0) / z.length,
    };
  };

  it('gives kriging standard deviations consistent with the cross-validation errors (exponential model)', () => {
    const z = standardised(exponential);
    // measured 0.58 and 0.75
    expect(z.meanAbs).toBeGreaterThan(0.5);
    expect(z.meanAbs).toBeLessThan(1.2);
    expect(z.rms).toBeGreaterThan(0.5);
    expect(z.rms).toBeLessThan(2);
  });

  it('keeps the spherical standard deviation within 2× the errors (a spherical model is linear at the origin while the demo surface is smooth, so it overstates σ near wells)', () => {
    const z = standardised(kriged);
    // measured RMS z 0.46, mean σ 92 m against RMSE 62 m
    expect(z.rms).toBeGreaterThan(0.4);
    expect(z.rms).toBeLessThan(2);
    expect(z.meanSd).toBeLessThan(2 * z.rmse);
  });

  it('keeps a gaussian fit solvable with a small nugget, so its cross-validation stays in line with the others', () => {
    const gaussian = run({ kind: 'kriging', model: 'gaussian' });
    // A gaussian with no nugget made the system nearly singular (leave-one-out errors of kilometres).
    expect(gaussian.variogram!.model.nugget).toBeGreaterThanOrEqual(
      0.0099 * (gaussian.variogram!.model.nugget + gaussian.variogram!.model.sill),
    );
    expect(gaussian.crossValidation.rmse).toBeLessThan(2 * kriged.crossValidation.rmse);
    expect(rmseAgainstTruth(gaussian)).toBeLessThan(150);
  });

  it('with a planar trend removed, kriges the residuals: no worse against the truth, and a variogram that levels off', () => {
    const detrended = run({ kind: 'kriging', model: 'spherical', trend: 'planar' });
    expect(
      detrended.warnings.some((w) => /^A planar regional trend was removed before kriging \(rising [\d.]+ m per km toward \d+°\)/.test(w)),
    ).toBe(true);
    expect(rmseAgainstTruth(detrended)).toBeLessThan(rmseAgainstTruth(kriged) * 1.1);
    // The residual variogram's outer lags are far closer to its model's sill than the raw ones (the trend was most of the rise).
    const outerOverSill = (r: ReturnType<typeof run>) => {
      const v = r.variogram!;
      const last = Math.max(...v.experimental.map((l) => l.lagM));
      const outer = v.experimental.filter((l) => l.lagM > (2 / 3) * last);
      return outer.reduce((a, l) => a + l.gamma, 0) / outer.length / (v.model.nugget + v.model.sill);
    };
    expect(outerOverSill(detrended)).toBeLessThan(outerOverSill(kriged));
    // Cross-validation reports predictions with the plane put back, on the wells' own values.
    for (const w of detrended.wells) expect(w.predicted! - w.value).toBeCloseTo(w.residual!, 6);
  });

  it('draws closed contour rings that nest: the region deeper than a level lies inside the region of a shallower one', () => {
    const features = kriged.contours.features as { properties: { value: number }; geometry: { coordinates: number[][][][] } }[];
    expect(features.length).toBeGreaterThan(3);
    for (const f of features)
      for (const poly of f.geometry.coordinates) for (const ring of poly) expect(ring[0]).toEqual(ring[ring.length - 1]);
    for (let k = 1; k < features.length; k++) {
      const outer = turf.multiPolygon(features[k - 1].geometry.coordinates);
      const inner = turf.multiPolygon(features[k].geometry.coordinates);
      // Every interior point of the deeper band region is inside the shallower one (turf's pointOnFeature).
      for (const poly of inner.geometry.coordinates) {
        const pt = turf.pointOnFeature(turf.polygon(poly));
        expect(turf.booleanPointInPolygon(pt, outer)).toBe(true);
      }
      expect(turf.area(inner)).toBeLessThanOrEqual(turf.area(outer));
    }
  });
});

describe('run names in the unit the depth was entered in', () => {
  it('gives 10,000 ft back as 10,000 ft, not 3048 m (international foot, 0.3048 m exactly, NIST SP 811 B.9)', async () => {
    const { depthText } = await import('../../../server/features/surfaces/surfaces.service');
    expect(depthText(3048, 'ft')).toBe('10,000 ft');
    expect(depthText(3000)).toBe('3,000 m');
  });
});
