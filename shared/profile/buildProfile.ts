import { compactionDensity, SHALE_COMPACTION } from '../pressure/density';
import { hydrostatic } from '../pressure/hydrostatic';
import { overburden, OVERBURDEN_DEFAULTS } from '../pressure/overburden';
import { topOfOverpressure, type TopOfOverpressure } from '../pressure/topOfOverpressure';
import { G, PPG_KGM3 } from '../units/constants';
import type { NumericArray } from '../units/convert';
import { isGoodPoreMeasurement, misfit, type Misfit, type ProfileObservation } from './calibration';
import { wellDatums, type ProfileWell } from './datums';
import { bridgeGaps } from './interpolate';
import { runningMedian } from './smooth';
import type { ProfileLogs } from './logGrid';
import { fracturePressure, PORE_METHOD_LABELS, porePressure, type FractureSettings, type PoreSettings } from './methods';
import { trendR2, trendValues, type TrendSettings } from './trend';
import { curveWindow, type DrillingWindow } from './window';

/** What of an interpretation the profile is built from (InterpretationContent fits this shape). */
export interface ProfileInterpretation {
  normalDensityKgM3: number;
  trend: TrendSettings | null;
  pore: PoreSettings | null;
  fracture: FractureSettings | null;
}

export interface TopSettings {
  /** Margin above the normal gradient, as EMW, kg/m³. */
  marginKgM3: number;
  minThicknessM: number;
}

/**
 * Defaults of the profile. The top-of-overpressure margin of 0.3 ppg (≈ 36 kg/m³) and the 50 m minimum
 * thickness are common practice, no source; brine 1030 kg/m³ likewise.
 */
export const PROFILE_DEFAULTS = {
  normalDensityKgM3: 1030,
  top: { marginKgM3: 0.3 * PPG_KGM3, minThicknessM: 50 },
  /** Spacing of the samples added where no log was run (above its top, below its base), m. */
  fillStepM: 10,
  /**
   * When to warn that a curve sits below hydrostatic: by more than 0.3 ppg of EMW (≈ 36 kg/m³, the same size as
   * the top-of-overpressure margin) over more than 20 % of the samples read. Common practice, no source.
   */
  belowNormal: { marginKgM3: 0.3 * PPG_KGM3, minFraction: 0.2 },
} as const;

/**
 * Share of the samples where `curvePa` has a value that sit more than `marginKgM3` of EMW below `normalPa`
 * (EMW from the rig datum), and how many samples had a value.
 * @example shareBelowNormal(tvdM, porePa, hydrostaticPa, 36).fraction; // 0.62
 */
export function shareBelowNormal(
  tvdM: NumericArray,
  curvePa: NumericArray,
  normalPa: NumericArray,
  marginKgM3: number,
): { fraction: number; count: number } {
  let count = 0;
  let below = 0;
  for (let i = 0; i < tvdM.length; i++) {
    const z = tvdM[i];
    if (!(z > 0) || !Number.isFinite(curvePa[i])) continue;
    count++;
    if ((normalPa[i] - curvePa[i]) / (G * z) > marginKgM3) below++;
  }
  return { fraction: count ? below / count : 0, count };
}

export interface BuildProfileInput {
  well: ProfileWell;
  /** TVD below the rig datum of the log samples, ascending, m (from MD through the survey: `alignLogs`). */
  tvdM: NumericArray;
  /** MD of the same samples, m; without it MD is taken equal to TVD. */
  mdM?: NumericArray;
  logs: ProfileLogs;
  interpretation: ProfileInterpretation;
  observations?: readonly ProfileObservation[];
  /** Extend the profile to this TVD (e.g. TD) even where no log reaches, m. */
  baseTvdM?: number;
  top?: TopSettings;
  fillStepM?: number;
  seawaterDensityKgM3?: number;
}

export interface Profile {
  /** TVD below the rig datum: the log samples plus filled samples above and below them, m. */
  tvdM: Float64Array;
  mdM: Float64Array;
  seaLevelTvdM: number;
  mudlineTvdM: number;
  /** The logs on this grid (NaN on filled samples). */
  logs: ProfileLogs;
  /** Bulk density used for the overburden, kg/m³ (NaN above the mudline). */
  densityKgM3: Float64Array;
  /** 1 where the density came from the log, 0 where from the shale compaction trend. */
  densityFromLog: Uint8Array;
  hydrostaticPa: Float64Array;
  overburdenPa: Float64Array;
  /** The normal compaction trend in the trend log's unit, or null without a trend. */
  normalTrend: Float64Array | null;
  /** The log the normal trend is on (its values are µs/ft for sonic, ohm·m for resistivity), or null. */
  normalTrendCurve: TrendSettings['curve'] | null;
  /** r² and point count of the trend's current parameters over its interval. */
  trendFit: { r2: number; n: number } | null;
  /** Log-derived pore pressure, NaN where the method had no (shale) sample; null without a method. */
  porePa: Float64Array | null;
  /** The log as the pore-pressure method read it (shale samples, smoothed), in its unit; null without a method. */
  poreLog: Float64Array | null;
  /** Pore pressure used for fracture and calibration: gaps bridged, normal above the first log value. */
  poreFilledPa: Float64Array | null;
  fracturePa: Float64Array | null;
  /** Suggested top of overpressure from `topOfOverpressure` on porePa. */
  suggestedTop: TopOfOverpressure | null;
  top: TopSettings;
  poreMisfit: Misfit | null;
  /** Fracture curve against leak-off tests. */
  fractureMisfit: Misfit | null;
  /** Formation-integrity tests (lower bounds of fracture pressure) that exceed the fracture curve. */
  fitAboveCurve: number;
  window: DrillingWindow;
  /** Plain sentences about what could not be computed and why. */
  notes: string[];
}

/** The log grid with samples every `step` m from the surface to the first log sample and from the last one to `base`. */
function extendGrid(tvdM: NumericArray, mdM: NumericArray | undefined, levels: number[], base: number, step: number) {
  const tvd: number[] = [];
  const md: number[] = [];
  const first = tvdM.length ? tvdM[0] : Infinity;
  const last = tvdM.length ? tvdM[tvdM.length - 1] : -Infinity;
  // Above the log the bore is taken as straight from the surface to the first sample (MD scaled linearly).
  const mdScale = tvdM.length && mdM && first > 0 ? mdM[0] / first : 1;
  const stops = new Set<number>([0, ...levels]);
  for (let z = 0; z < Math.min(first, base + step); z += step) stops.add(z);
  for (const z of [...stops].filter((z) => z < first && z <= Math.max(base, last)).sort((a, b) => a - b)) {
    tvd.push(z);
    md.push(z * mdScale);
  }
  const fromLog = tvd.length;
  for (let i = 0; i < tvdM.length; i++) {
    tvd.push(tvdM[i]);
    md.push(mdM ? mdM[i] : tvdM[i]);
  }
  const lastMdOffset = tvdM.length ? md[md.length - 1] - last : 0;
  const startBelow = tvdM.length ? Math.ceil((last + 1e-9) / step) * step : base + step;
  for (let z = startBelow; z <= base; z += step) {
    tvd.push(z);
    md.push(z + lastMdOffset);
  }
  if (tvd.length && tvd[tvd.length - 1] < base) {
    tvd.push(base);
    md.push(base + lastMdOffset);
  }
  return { tvd: Float64Array.from(tvd), md: Float64Array.from(md), fromLog, count: tvdM.length };
}

function onGrid(values: NumericArray | undefined, n: number, offset: number, total: number): Float64Array | undefined {
  if (!values) return undefined;
  if (values.length !== n) throw new Error(`buildProfile: a log has ${values.length} samples but tvdM has ${n}`);
  const out = new Float64Array(total).fill(NaN);
  for (let i = 0; i < n; i++) out[offset + i] = values[i];
  return out;
}

function checkAscending(tvdM: NumericArray): void {
  for (let i = 0; i < tvdM.length; i++) {
    const z = tvdM[i];
    if (typeof z !== 'number' || !Number.isFinite(z) || z < 0)
      throw new Error(`buildProfile: tvdM[${i}] must be a finite depth >= 0 (got ${z})`);
    if (i > 0 && z < tvdM[i - 1]) throw new Error(`buildProfile: tvdM must be sorted ascending (tvdM[${i}] = ${z} after ${tvdM[i - 1]})`);
  }
}

/**
 * One well's pressure profile from its logs and an interpretation, built only from shared/pressure:
 * hydrostatic (one column of the normal fluid from sea level, or the ground, down), overburden (density log
 * where present, else the Sclater & Christie 1980 shale compaction trend, beneath the water column), the normal
 * compaction trend, pore pressure by Eaton (1975) or Bowers (1995), fracture pressure by Eaton (1969) or
 * Matthews & Kelly (1967), the suggested top of overpressure, the fit to measured pressures and the window.
 * Samples are added every `fillStepM` above and below the logged interval so the columns start at the surface.
 * @example
 * const p = buildProfile({ well: { datumElevationM: 25, waterDepthM: 100, airGapM: 25 }, tvdM, logs,
 *   interpretation: { normalDensityKgM3: 1030, trend, pore: { method: 'eaton-sonic', exponent: 3 }, fracture: null } });
 * p.suggestedTop?.tvdM; // 2450
 */
export function buildProfile(input: BuildProfileInput): Profile {
  const fn = 'buildProfile';
  const { well, interpretation } = input;
  const { seaLevelTvdM, mudlineTvdM } = wellDatums(well);
  checkAscending(input.tvdM);
  if (input.mdM && input.mdM.length !== input.tvdM.length) {
    throw new Error(`${fn}: mdM has length ${input.mdM.length} but tvdM has length ${input.tvdM.length}`);
  }
  const normalKgM3 = interpretation.normalDensityKgM3;
  if (!(normalKgM3 > 0)) throw new Error(`${fn}: normalDensityKgM3 must be > 0 (got ${normalKgM3})`);
  const step = input.fillStepM ?? PROFILE_DEFAULTS.fillStepM;
  if (!(step > 0)) throw new Error(`${fn}: fillStepM must be > 0 (got ${step})`);
  const top = input.top ?? PROFILE_DEFAULTS.top;
  const observations = input.observations ?? [];
  const deepestObs = observations.reduce((m, o) => Math.max(m, o.tvdM), 0);
  const base = Math.max(input.baseTvdM ?? 0, deepestObs, mudlineTvdM + step);

  const grid = extendGrid(
    input.tvdM,
    input.mdM,
    [well.airGapM, seaLevelTvdM, mudlineTvdM].filter((z) => z > 0),
    base,
    step,
  );
  const tvdM = grid.tvd;
  const n = tvdM.length;
  const at = (v: NumericArray | undefined) => onGrid(v, grid.count, grid.fromLog, n);
  const logs: ProfileLogs = {
    sonicUsFt: at(input.logs.sonicUsFt),
    resistivityOhmM: at(input.logs.resistivityOhmM),
    densityKgM3: at(input.logs.densityKgM3),
    gammaApi: at(input.logs.gammaApi),
  };
  for (const k of Object.keys(logs) as (keyof ProfileLogs)[]) if (!logs[k]) delete logs[k];
  const notes: string[] = [];

  // Density: the log where it reads, the normal shale compaction trend elsewhere; nothing above the mudline.
  const belowMudline = tvdM.map((z) => Math.max(0, z - mudlineTvdM));
  const trendDensity = compactionDensity(belowMudline, { ...SHALE_COMPACTION, fluidKgM3: normalKgM3 });
  const densityKgM3 = new Float64Array(n);
  const densityFromLog = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    if (tvdM[i] < mudlineTvdM) densityKgM3[i] = NaN;
    else if (logs.densityKgM3 && logs.densityKgM3[i] > 0) {
      densityKgM3[i] = logs.densityKgM3[i];
      densityFromLog[i] = 1;
    } else densityKgM3[i] = trendDensity[i];
  }
  if (!logs.densityKgM3) notes.push('No density log: the overburden uses the shale compaction trend (Sclater & Christie 1980).');
  const overburdenPa = overburden({
    depthM: tvdM,
    densityKgM3,
    waterDepthM: well.waterDepthM,
    airGapM: well.airGapM,
    seawaterDensityKgM3: input.seawaterDensityKgM3 ?? OVERBURDEN_DEFAULTS.seawaterDensityKgM3,
  });
  const hydrostaticPa = hydrostatic(tvdM, normalKgM3, { datumOffsetM: well.airGapM });

  // Normal trend and the log it belongs to.
  const trend = interpretation.trend;
  const trendLog = trend ? (trend.curve === 'sonic' ? logs.sonicUsFt : logs.resistivityOhmM) : undefined;
  let normalTrend: Float64Array | null = null;
  let trendFit: Profile['trendFit'] = null;
  if (trend && Object.keys(trend.params).length > 0) {
    normalTrend = trendValues(trend, tvdM, mudlineTvdM);
    if (trendLog) {
      const samples = { tvdM, mudlineTvdM, values: trendLog, gammaApi: logs.gammaApi };
      trendFit = trend.gammaCutoffApi !== null && !logs.gammaApi ? null : trendR2(samples, trend);
    } else notes.push(`The trend is on the ${trend.curve} log, which this well does not have.`);
  }

  // Pore pressure from logs, on shale samples when the trend carries a gamma-ray cut-off.
  let porePa: Float64Array | null = null;
  let poreLog: Float64Array | null = null;
  const pore = interpretation.pore;
  if (pore) {
    const needs = pore.method === 'eaton-resistivity' ? 'resistivity' : 'sonic';
    const log = needs === 'sonic' ? logs.sonicUsFt : logs.resistivityOhmM;
    const isEaton = pore.method !== 'bowers';
    if (!log) notes.push(`Pore pressure by ${pore.method} needs a ${needs} log, which this well does not have.`);
    else if (isEaton && (!normalTrend || trend?.curve !== needs)) {
      notes.push(`Pore pressure by ${pore.method} needs a normal compaction trend fitted on the ${needs} log.`);
    } else {
      const cutoff = trend?.gammaCutoffApi ?? null;
      const used = Float64Array.from(log, (v, i) => {
        if (tvdM[i] <= mudlineTvdM) return NaN;
        if (cutoff !== null && logs.gammaApi && !(logs.gammaApi[i] >= cutoff)) return NaN;
        return v;
      });
      const smoothed = pore.smoothingM ? runningMedian(tvdM, used, pore.smoothingM) : used;
      poreLog = smoothed;
      porePa = porePressure(pore, { overburdenPa, normalPa: hydrostaticPa, log: smoothed, trend: isEaton ? normalTrend : null });
    }
  }

  let poreFilledPa: Float64Array | null = null;
  if (porePa) {
    poreFilledPa = bridgeGaps(tvdM, porePa);
    const first = poreFilledPa.findIndex((v) => !Number.isNaN(v));
    for (let i = 0; i < (first === -1 ? n : first); i++) poreFilledPa[i] = hydrostaticPa[i];
  }

  let fracturePa: Float64Array | null = null;
  if (interpretation.fracture) {
    const poreForFracture = poreFilledPa ?? hydrostaticPa;
    if (!poreFilledPa) notes.push('No log-derived pore pressure: the fracture curve assumes normal pore pressure.');
    fracturePa = fracturePressure(interpretation.fracture, { overburdenPa, porePa: poreForFracture, tvdM, mudlineTvdM });
    for (let i = 0; i < n; i++) if (tvdM[i] <= mudlineTvdM) fracturePa[i] = NaN;
  }

  // Sub-hydrostatic pressure over much of a basin's shales is rare; a curve there usually means the method's
  // constants (Bowers' A and B, Eaton's trend) do not fit this basin, and a fracture curve built on it is too low.
  const { marginKgM3: belowMargin, minFraction } = PROFILE_DEFAULTS.belowNormal;
  if (porePa && pore) {
    const share = shareBelowNormal(tvdM, porePa, hydrostaticPa, belowMargin);
    if (share.count > 0 && share.fraction > minFraction) {
      const fix =
        pore.method === 'bowers'
          ? "calibrate A and B to this basin's formation tests"
          : 'check the normal trend and the exponent against formation tests';
      notes.push(
        `Pore pressure from ${PORE_METHOD_LABELS[pore.method].short} is below hydrostatic over ${Math.round(share.fraction * 100)} % of the logged interval: ${fix}.`,
      );
    }
  }
  if (fracturePa && porePa) {
    const logged = Float64Array.from(fracturePa, (v, i) => (Number.isNaN(porePa![i]) ? NaN : v));
    const share = shareBelowNormal(tvdM, logged, hydrostaticPa, belowMargin);
    if (share.count > 0 && share.fraction > 0) {
      notes.push(
        `Fracture pressure is below hydrostatic over ${Math.max(1, Math.round(share.fraction * 100))} % of the logged interval: it follows the pore pressure, so fix that first.`,
      );
    }
  }

  const suggestedTop = porePa
    ? topOfOverpressure({
        tvdM,
        porePa,
        normalGradientPaM: normalKgM3 * G,
        marginPaM: top.marginKgM3 * G,
        minThicknessM: top.minThicknessM,
        datumOffsetM: well.airGapM,
      })
    : null;

  const poreMisfit = poreFilledPa ? misfit(tvdM, poreFilledPa, observations, isGoodPoreMeasurement) : null;
  const fractureMisfit = fracturePa ? misfit(tvdM, fracturePa, observations, (o) => o.kind === 'lot') : null;
  const fitAboveCurve = fracturePa
    ? misfit(tvdM, fracturePa, observations, (o) => o.kind === 'fit').points.filter((p) => p.measuredPa > p.modelPa).length
    : 0;
  const window = porePa && fracturePa ? curveWindow(tvdM, porePa, fracturePa) : curveWindow([], [], []);

  return {
    tvdM,
    mdM: grid.md,
    seaLevelTvdM,
    mudlineTvdM,
    logs,
    densityKgM3,
    densityFromLog,
    hydrostaticPa,
    overburdenPa,
    normalTrend,
    normalTrendCurve: normalTrend && trend ? trend.curve : null,
    trendFit,
    porePa,
    poreLog,
    poreFilledPa,
    fracturePa,
    suggestedTop,
    top,
    poreMisfit,
    fractureMisfit,
    fitAboveCurve,
    window,
    notes,
  };
}
