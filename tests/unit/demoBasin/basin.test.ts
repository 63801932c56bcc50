import { createHash } from 'node:crypto';
import { booleanPointInPolygon, distance, point, polygon } from '@turf/turf';
import { beforeAll, describe, expect, it } from 'vitest';
import { BASIN_BBOX, toLocalM, toLonLat } from '../../../server/db/seed/demoBasin/frame';
import { generateDemoBasin, type DemoBasin } from '../../../server/db/seed/demoBasin/generate';
import { basinwardFraction, hiddenTopTvdssAtM, hiddenTopTvdssM } from '../../../server/db/seed/demoBasin/surfaces';
import { demo } from './demoData';

/** A digest of everything generated, typed arrays included, so two runs can be compared byte for byte. */
function digest(d: DemoBasin): string {
  const json = JSON.stringify(d, (_k, v) =>
    v instanceof Float64Array ? Buffer.from(v.buffer, v.byteOffset, v.byteLength).toString('base64') : v,
  );
  return createHash('sha256').update(json).digest('hex');
}

let basin: DemoBasin;
beforeAll(() => {
  basin = demo();
}, 60_000);

describe('determinism', () => {
  it('gives byte-identical output for the same seed and different output for another', () => {
    const again = generateDemoBasin(2026);
    expect(digest(again)).toBe(digest(basin));
    const other = generateDemoBasin(7);
    expect(digest(other)).not.toBe(digest(basin));
  }, 60_000);
});

describe('the invented basin', () => {
  it('has about 60 wells, a third of them directional (build-and-hold and S-shaped)', () => {
    expect(basin.wells).toHaveLength(60);
    const byProfile = (p: string) => basin.wells.filter((w) => w.profile === p).length;
    expect(byProfile('build-and-hold') + byProfile('s-shape')).toBe(20);
    expect(byProfile('build-and-hold')).toBeGreaterThan(0);
    expect(byProfile('s-shape')).toBeGreaterThan(0);
  });

  it('uses invented, unique names and UWIs, and invented operators marked synthetic', () => {
    const names = basin.wells.map((w) => w.name);
    expect(new Set(names).size).toBe(60);
    for (const n of names) expect(n).toMatch(/^(AVX-\d{2}|[A-Z][a-z]+-\d+)$/);
    const uwis = basin.wells.map((w) => w.uwi);
    expect(new Set(uwis).size).toBe(60);
    for (const u of uwis) expect(u).toMatch(/^AVB-\d{2}-\d{4}-00$/);
    expect(basin.basin.operators.length).toBeGreaterThanOrEqual(4);
    for (const o of basin.basin.operators) expect(o).toMatch(/\(synthetic\)$/);
    expect(basin.basin.name).toMatch(/synthetic/);
  });

  it('lies in open ocean near 32.5°S 101°W, about 80 × 60 km, every wellhead inside', () => {
    const [w, s, e, n] = BASIN_BBOX;
    // Independent distances by the haversine of @turf/turf.
    expect(distance(point([w, -32.5]), point([e, -32.5]), { units: 'kilometers' })).toBeCloseTo(80, 0);
    expect(distance(point([-101, s]), point([-101, n]), { units: 'kilometers' })).toBeCloseTo(60, 0);
    for (const well of basin.wells) {
      expect(well.lon).toBeGreaterThan(w);
      expect(well.lon).toBeLessThan(e);
      expect(well.lat).toBeGreaterThan(s);
      expect(well.lat).toBeLessThan(n);
    }
  });

  it('has a local metric frame that agrees with great-circle distances to 0.1 %', () => {
    const a = toLonLat(-20_000, 10_000);
    const b = toLonLat(25_000, -15_000);
    const km = distance(point([a.lon, a.lat]), point([b.lon, b.lat]), { units: 'kilometers' });
    expect(km).toBeCloseTo(Math.hypot(45, 25), 1);
    const back = toLocalM(a.lon, a.lat);
    expect(back.xM).toBeCloseTo(-20_000, 6);
    expect(back.yM).toBeCloseTo(10_000, 6);
  });

  it('deepens from a 40 m shelf in the north-west to about 600 m on the south-east slope; air gap ≈ 25 m', () => {
    for (const w of basin.wells) {
      expect(w.waterDepthM).toBeGreaterThanOrEqual(40);
      expect(w.waterDepthM).toBeLessThanOrEqual(600);
      expect(w.airGapM).toBeGreaterThanOrEqual(22);
      expect(w.airGapM).toBeLessThanOrEqual(28);
      expect(w.datumElevationM).toBe(w.airGapM);
      expect(w.datumKind).toBe('RT');
      expect(w.offshore).toBe(true);
    }
    const sorted = [...basin.wells].sort((a, b) => basinwardFraction(a.truth.xM, a.truth.yM) - basinwardFraction(b.truth.xM, b.truth.yM));
    expect(sorted[0].waterDepthM).toBeLessThan(sorted[sorted.length - 1].waterDepthM);
    expect(Math.max(...basin.wells.map((w) => w.waterDepthM))).toBeGreaterThan(400);
  });

  it('spuds its wells between 1994 and 2022', () => {
    for (const w of basin.wells) {
      expect(w.spudDate >= '1994-01-01' && w.spudDate <= '2022-12-31').toBe(true);
    }
  });
});

describe('hidden top of overpressure', () => {
  it('spans about 1900 m TVDSS under the delta front to about 3800 m, smoothly', () => {
    const [w, s, e, n] = BASIN_BBOX;
    let min = Infinity;
    let max = -Infinity;
    let steepest = 0;
    const steps = 80;
    for (let i = 0; i <= steps; i++) {
      for (let j = 0; j <= steps; j++) {
        const lon = w + ((e - w) * i) / steps;
        const lat = s + ((n - s) * j) / steps;
        const z = hiddenTopTvdssM(lon, lat);
        min = Math.min(min, z);
        max = Math.max(max, z);
        if (i > 0) steepest = Math.max(steepest, Math.abs(z - hiddenTopTvdssM(w + ((e - w) * (i - 1)) / steps, lat)));
      }
    }
    expect(min).toBeGreaterThan(1850);
    expect(min).toBeLessThan(1950);
    expect(max).toBeGreaterThan(3700);
    expect(max).toBeLessThan(3850);
    // 1 km grid steps: a smooth surface changes by far less than its relief between neighbours.
    expect(steepest).toBeLessThan(200);
  });

  it('is the same function in lon/lat and in the local frame', () => {
    const { xM, yM } = toLocalM(-100.8, -32.4);
    expect(hiddenTopTvdssM(-100.8, -32.4)).toBe(hiddenTopTvdssAtM(xM, yM));
    expect(basin.truth.topAtWells).toHaveLength(60);
  });
});

describe('prospects', () => {
  it('has 2–3 invented prospects with closed outlines and planned wells inside them', () => {
    expect(basin.prospects.length).toBeGreaterThanOrEqual(2);
    expect(basin.prospects.length).toBeLessThanOrEqual(3);
    for (const p of basin.prospects) {
      const ring = p.polygon;
      expect(ring[0]).toEqual(ring[ring.length - 1]);
      expect(p.targetTvdssM.top).toBeLessThan(p.targetTvdssM.base);
      expect(p.plannedWells.length).toBeGreaterThanOrEqual(1);
      expect(p.plannedWells.length).toBeLessThanOrEqual(2);
      // Point-in-polygon by @turf/turf, an independent implementation.
      for (const w of p.plannedWells) expect(booleanPointInPolygon(point([w.lon, w.lat]), polygon([ring]))).toBe(true);
    }
  });
});
