import { toLonLat } from './frame';

/** An invented prospect: an outline on the map, the depth range of its target, and wells planned into it. */
export interface DemoProspect {
  name: string;
  /** Closed ring of [lon, lat] (first point repeated last), WGS 84, counter-clockwise (RFC 7946). */
  polygon: [number, number][];
  targetTvdssM: { top: number; base: number };
  /**
   * `targetTvdssM` is where the well aims inside the target; `tdTvdssM` is where it stops, below the target's base
   * so the whole interval is drilled and logged. Both are metres below sea level (the wells are vertical).
   */
  plannedWells: { name: string; lon: number; lat: number; targetTvdssM: number; tdTvdssM: number }[];
}

/**
 * How far below the base of the target a demo planned well is drilled: room to log the whole target and set
 * casing or a plug below it (common practice, no source).
 */
export const TD_BELOW_TARGET_BASE_M = 200;

interface ProspectShape {
  name: string;
  centreM: { xM: number; yM: number };
  semiAxesM: [number, number];
  rotationDeg: number;
  targetTvdssM: { top: number; base: number };
  planned: { name: string; dxM: number; dyM: number; targetTvdssM: number }[];
}

/** Outlines as ellipses in the local frame; the ring is computed once, rounded to 1e-6° (about 0.1 m). */
const SHAPES: ProspectShape[] = [
  {
    name: 'Ostrel Ridge Prospect',
    centreM: { xM: 12_000, yM: 4_000 },
    semiAxesM: [4_500, 2_500],
    rotationDeg: 30,
    targetTvdssM: { top: 2_300, base: 3_100 },
    planned: [
      { name: 'Ostrel Ridge-1 (planned)', dxM: 0, dyM: 0, targetTvdssM: 3_000 },
      { name: 'Ostrel Ridge-2 (planned)', dxM: 2_200, dyM: 1_200, targetTvdssM: 2_900 },
    ],
  },
  {
    name: 'Fennick Fan Prospect',
    centreM: { xM: 28_000, yM: -21_000 },
    semiAxesM: [5_000, 3_000],
    rotationDeg: -20,
    targetTvdssM: { top: 3_400, base: 4_200 },
    planned: [{ name: 'Fennick Fan-1 (planned)', dxM: 500, dyM: -300, targetTvdssM: 4_100 }],
  },
  {
    name: 'Brimlow Terrace Prospect',
    centreM: { xM: -30_000, yM: 2_000 },
    semiAxesM: [4_000, 3_000],
    rotationDeg: 60,
    targetTvdssM: { top: 2_600, base: 3_300 },
    planned: [{ name: 'Brimlow Terrace-1 (planned)', dxM: -400, dyM: 600, targetTvdssM: 3_200 }],
  },
];

const round6 = (v: number) => Math.round(v * 1e6) / 1e6;

function ring(shape: ProspectShape, vertices = 16): [number, number][] {
  const rot = (shape.rotationDeg * Math.PI) / 180;
  const [a, b] = shape.semiAxesM;
  const out: [number, number][] = [];
  for (let k = 0; k < vertices; k++) {
    const t = (2 * Math.PI * k) / vertices; // increasing angle: counter-clockwise
    const x = a * Math.cos(t);
    const y = b * Math.sin(t);
    const p = toLonLat(shape.centreM.xM + x * Math.cos(rot) - y * Math.sin(rot), shape.centreM.yM + x * Math.sin(rot) + y * Math.cos(rot));
    out.push([round6(p.lon), round6(p.lat)]);
  }
  out.push(out[0]);
  return out;
}

/**
 * The demo's invented prospects, for the prospect and planning features that come later (no table yet).
 * @example
 * demoProspects[0].plannedWells[0].name; // 'Ostrel Ridge-1 (planned)'
 */
export const demoProspects: readonly DemoProspect[] = SHAPES.map((s) => ({
  name: s.name,
  polygon: ring(s),
  targetTvdssM: s.targetTvdssM,
  plannedWells: s.planned.map((p) => {
    const at = toLonLat(s.centreM.xM + p.dxM, s.centreM.yM + p.dyM);
    return {
      name: p.name,
      lon: round6(at.lon),
      lat: round6(at.lat),
      targetTvdssM: p.targetTvdssM,
      tdTvdssM: s.targetTvdssM.base + TD_BELOW_TARGET_BASE_M,
    };
  }),
}));
