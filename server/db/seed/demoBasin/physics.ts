import {
  G,
  PPG_KGM3,
  SHALE_COMPACTION,
  athyPorosity,
  bulkDensityFromPorosity,
  fractureEaton,
  hydrostatic,
  overburden,
} from '../../../../shared/pressure';

/**
 * The pressure column of one demo well on a 1 m TVD grid from the rig datum, built only from
 * shared/pressure so the demo and the product speak the same physics:
 * - normal pore pressure: one brine column from sea level (the datum offset is the air gap);
 * - overburden: the sea, then Athy porosity (Sclater & Christie 1980 shale constants) mixed to bulk density;
 * - below the hidden top of overpressure, pore pressure ramps towards λ·S_v while the effective stress
 *   that set the porosity stays frozen at its largest value (disequilibrium compaction: the fluid cannot
 *   leave, so the rock stops compacting), which keeps porosity high and density low below the top;
 * - fracture pressure from Eaton (1969) with a Poisson's ratio rising with depth.
 */
export const DEMO_PHYSICS = {
  /**
   * Pore brine and the sea are both 1030 kg/m3, so the normal pore pressure is one column from sea level
   * and the effective stress is zero at the mudline (seawater 1020–1030 kg/m3, basin brine 1030–1070 kg/m3:
   * common practice, no source).
   */
  brineKgM3: 1030,
  seawaterKgM3: 1030,
  phi0: SHALE_COMPACTION.phi0,
  cPerM: SHALE_COMPACTION.cPerM,
  grainKgM3: SHALE_COMPACTION.grainKgM3,
  /**
   * Poisson's ratio ν(z) = surface + (deep − surface)·(1 − exp(−z/scale)), z below the mudline: a smooth
   * rise with depth in the manner of Eaton's (1969) depth chart; the numbers are invented for this basin.
   */
  poisson: { surface: 0.25, deep: 0.45, scaleM: 2000 },
  /** Pore pressure is capped so that fracture pressure stays at least this far above it (1.2 ppg EMW). */
  minWindowKgM3: 1.2 * PPG_KGM3,
  stepM: 1,
} as const;

/** Where the column's overpressure comes from, at the point where the well meets the top. */
export interface ColumnInput {
  tdTvdM: number;
  waterDepthM: number;
  airGapM: number;
  /** Hidden top of overpressure, TVD below sea level, m. */
  topTvdssM: number;
  /** P/S_v that the ramp tends to. */
  lambda: number;
  /** Length scale of the ramp, m. */
  rampLengthM: number;
}

/** The well's pressures, stresses and rock on the TVD grid (TVD below the rig datum, m). */
export interface PressureColumn {
  tvdM: Float64Array;
  mudlineTvdM: number;
  /** Top of overpressure, TVD below the rig datum (= TVDSS + air gap), m. */
  topTvdM: number;
  airGapM: number;
  waterDepthM: number;
  /** Bulk density, kg/m3; NaN above the mudline (sea and air). */
  densityKgM3: Float64Array;
  porosity: Float64Array;
  poisson: Float64Array;
  overburdenPa: Float64Array;
  normalPa: Float64Array;
  porePa: Float64Array;
  fracturePa: Float64Array;
}

/**
 * ν at a depth below the mudline.
 * @example poissonAt(0); // 0.25
 */
export function poissonAt(depthBelowMudlineM: number): number {
  const { surface, deep, scaleM } = DEMO_PHYSICS.poisson;
  return surface + (deep - surface) * (1 - Math.exp(-Math.max(0, depthBelowMudlineM) / scaleM));
}

/** A curve on the uniform TVD grid at any TVD, linear between samples, held beyond the ends. */
function onGrid(curve: Float64Array, tvdM: number): number {
  const last = curve.length - 1;
  const f = tvdM / DEMO_PHYSICS.stepM;
  if (f <= 0) return curve[0];
  if (f >= last) return curve[last];
  const i = Math.floor(f);
  const w = f - i;
  return w === 0 ? curve[i] : curve[i] + w * (curve[i + 1] - curve[i]);
}

/**
 * A curve of the column at any TVD (m below the rig datum), linear between the 1 m samples.
 * @example atTvd(column, column.porePa, 2500.5);
 */
export function atTvd(column: PressureColumn, curve: Float64Array, tvdM: number): number {
  if (curve.length !== column.tvdM.length)
    throw new Error(`atTvd: the curve has ${curve.length} samples but the column ${column.tvdM.length}`);
  return onGrid(curve, tvdM);
}

/** The TVD at which an increasing curve (on indices ≥ from) reaches `value`, linear between samples. */
function depthWhere(curve: Float64Array, tvdM: Float64Array, from: number, value: number): number {
  let lo = from;
  let hi = curve.length - 1;
  if (value <= curve[lo]) return tvdM[lo];
  if (value >= curve[hi]) return tvdM[hi];
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (curve[mid] <= value) lo = mid;
    else hi = mid;
  }
  return tvdM[lo] + ((value - curve[lo]) / (curve[hi] - curve[lo])) * (tvdM[hi] - tvdM[lo]);
}

/**
 * Builds the pressure column of one well. The overburden depends on the density, which depends on the
 * effective stress, which depends on the overburden: a few fixed-point passes settle it (the change per
 * pass shrinks by about the ratio of excess pressure to overburden, well below 1), and the last pass
 * recomputes pore and fracture pressure from the final overburden so that all curves agree exactly.
 * @example
 * const c = buildColumn({ tdTvdM: 4000, waterDepthM: 150, airGapM: 25, topTvdssM: 2500, lambda: 0.85, rampLengthM: 900 });
 * c.porePa[3000] / (9.80665 * (3000 - 25)); // pore EMW below sea level, ≈ 1334 kg/m3
 */
export function buildColumn(input: ColumnInput): PressureColumn {
  const { tdTvdM, waterDepthM, airGapM, topTvdssM, lambda, rampLengthM } = input;
  const p = DEMO_PHYSICS;
  const n = Math.floor(tdTvdM / p.stepM) + 2;
  const tvdM = new Float64Array(n);
  for (let i = 0; i < n; i++) tvdM[i] = i * p.stepM;
  const mudlineTvdM = airGapM + waterDepthM;
  const topTvdM = topTvdssM + airGapM;
  if (!(topTvdM > mudlineTvdM))
    throw new Error(`buildColumn: the top of overpressure (${topTvdM} m) must lie below the mudline (${mudlineTvdM} m)`);
  const firstSediment = Math.ceil(mudlineTvdM / p.stepM);

  const below = tvdM.map((z) => Math.max(0, z - mudlineTvdM));
  const poisson = below.map(poissonAt);
  const normalPorosity = athyPorosity(below, p.phi0, p.cPerM);
  const sedimentOnly = (rho: Float64Array) => rho.map((v, i) => (tvdM[i] < mudlineTvdM ? NaN : v));
  const normalDensity = sedimentOnly(bulkDensityFromPorosity(normalPorosity, p.grainKgM3, p.brineKgM3));
  const load = (densityKgM3: Float64Array) =>
    overburden({ depthM: tvdM, densityKgM3, waterDepthM, airGapM, seawaterDensityKgM3: p.seawaterKgM3 });
  const normalPa = hydrostatic(tvdM, p.brineKgM3, { datumOffsetM: airGapM });
  const normalOverburden = load(normalDensity);
  const normalStress = normalOverburden.map((s, i) => s - normalPa[i]);

  const poreFrom = (s: Float64Array): Float64Array => {
    const sTop = onGrid(s, topTvdM);
    const gapPa = sTop - onGrid(normalPa, topTvdM) - (1 - lambda) * sTop;
    return s.map((sv, i) => {
      const z = tvdM[i];
      if (z <= topTvdM) return normalPa[i];
      const u = (z - topTvdM) / rampLengthM;
      const effective = (1 - lambda) * sv + gapPa * Math.exp(-u * u);
      const k = poisson[i] / (1 - poisson[i]);
      const cap = sv - (p.minWindowKgM3 * G * z) / k;
      return Math.max(normalPa[i], Math.min(sv - effective, cap));
    });
  };

  let density = normalDensity;
  let s = normalOverburden;
  let porosity = normalPorosity;
  for (let pass = 0; pass < 4; pass++) {
    const pore = poreFrom(s);
    // Porosity follows the largest effective stress met so far below the top (no rebound when it falls).
    porosity = new Float64Array(normalPorosity);
    let maxStress = -Infinity;
    for (let i = firstSediment; i < n; i++) {
      if (tvdM[i] <= topTvdM) continue;
      maxStress = Math.max(maxStress, s[i] - pore[i]);
      const equivalentDepth = depthWhere(normalStress, tvdM, firstSediment, maxStress);
      porosity[i] = athyPorosity(Math.max(0, equivalentDepth - mudlineTvdM), p.phi0, p.cPerM);
    }
    density = sedimentOnly(bulkDensityFromPorosity(porosity, p.grainKgM3, p.brineKgM3));
    s = load(density);
  }
  const porePa = poreFrom(s);
  const fracturePa = fractureEaton({ overburdenPa: s, porePa, poisson });
  return {
    tvdM,
    mudlineTvdM,
    topTvdM,
    airGapM,
    waterDepthM,
    densityKgM3: density,
    porosity,
    poisson,
    overburdenPa: s,
    normalPa,
    porePa,
    fracturePa,
  };
}

/**
 * EMW of a column curve at a TVD, kg/m3, against TVD below the rig datum as the importer stores it.
 * @example emwAt(column, column.fracturePa, 3000);
 */
export function emwAt(column: PressureColumn, curve: Float64Array, tvdM: number): number {
  return atTvd(column, curve, tvdM) / (G * tvdM);
}
