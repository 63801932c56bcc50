import { FT_M, PPG_KGM3 } from '../../../../shared/units';
import type { WellStatus } from '../../../../shared/schemas/wells';
import type { SurveyStation } from '../../../../shared/trajectory';
import { DRILLING_RULES, chooseShoes, mudWeights, shoeTests, type CasingShoe, type DrillingContext } from './drilling';
import { formationTests } from './formationTests';
import { toLonLat } from './frame';
import { synthesiseLogs, type LogCurve, type LogOptions, type LogSamples, type SandBed } from './logs';
import { DEMO_OPERATORS } from './names';
import { draftPath, finalPath, type PathDesign, type WellPath, type WellProfile } from './path';
import { buildColumn, type PressureColumn } from './physics';
import { makeRng, subSeed, type Rng } from './prng';
import { FORMATIONS, formationTopsTvdssAtM, hiddenTopTvdssAtM, lambdaAtM, rampLengthAtM, waterDepthAtM } from './surfaces';
import type { DemoPressure } from './units';

/** What the layout decides about a well before its physics is worked out. */
export interface WellSpec {
  /** Stable index that seeds the well's own random stream. */
  index: number;
  name: string;
  uwi: string;
  operatorIndex: number;
  xM: number;
  yM: number;
  airGapM: number;
  spudDate: string;
  status: WellStatus;
  design: PathDesign;
  /** TD below the top of overpressure, m TVD (negative: the well stops above it). */
  tdBelowTopM: number;
  /** Kick well: the mud stops being raised this far below the top of overpressure, m TVD. */
  kickBelowTopM?: number;
  /** Loss well: where the loss happens, as a fraction of the hole from the surface shoe to TD. */
  lossAtFraction?: number;
}

export interface DemoTop {
  name: string;
  mdM: number;
  tvdM: number;
  tvdFromSurvey: boolean;
  lithology: string;
}

export interface DemoLog extends LogCurve {
  mdM: Float64Array;
  /** The unit of the index as the operator logged it (values here are always metres). */
  indexUnit: 'm' | 'ft';
}

/** A demo well: the columns of the wells table, its child rows, and the hidden truth it was made from. */
export interface DemoWell {
  name: string;
  uwi: string;
  operator: string;
  lon: number;
  lat: number;
  surfaceEpsg: 4326;
  datumKind: 'RT';
  /** Rig datum above sea level = air gap, m. */
  datumElevationM: number;
  airGapM: number;
  waterDepthM: number;
  offshore: true;
  spudDate: string;
  tdMdM: number;
  tdTvdM: number;
  status: WellStatus;
  note: string;
  extra: Record<string, string>;
  profile: WellProfile;
  survey: SurveyStation[] | null;
  pressures: DemoPressure[];
  tops: DemoTop[];
  logs: DemoLog[];
  truth: {
    xM: number;
    yM: number;
    topTvdssAtWellheadM: number;
    /** Where the bore meets the hidden top (the wellhead's value for a vertical well), TVDSS, m. */
    topTvdssM: number;
    lambda: number;
    rampLengthM: number;
    tripMarginKgM3: number;
    column: PressureColumn;
    logSamples: LogSamples;
    sands: SandBed[];
    shoes: CasingShoe[];
  };
}

export const WELL_NOTE = 'Synthetic demo well of the invented Ardvane Basin, generated from pressure physics: not a real well.';

/** TVDSS where the bore meets a surface: iterate on the bore's offset at the depth found (the surfaces are gentle, so it contracts fast). */
function meetSurface(path: WellPath, spec: WellSpec, surface: (xM: number, yM: number) => number) {
  let ss = surface(spec.xM, spec.yM);
  let at = { xM: spec.xM, yM: spec.yM };
  if (path.profile === 'vertical') return { ss, at };
  for (let k = 0; k < 6; k++) {
    const off = path.offsetAtTvd(ss + spec.airGapM);
    at = { xM: spec.xM + off.eastM, yM: spec.yM + off.northM };
    ss = surface(at.xM, at.yM);
  }
  return { ss, at };
}

/** Sand beds of the sandy formations: a few beds, 6–35 m thick, scattered through each unit. */
function sandBeds(rng: Rng, tops: { name: string; tvdM: number; sandy: boolean }[], tdTvdM: number): SandBed[] {
  const beds: SandBed[] = [];
  tops.forEach((top, k) => {
    if (!top.sandy) return;
    const base = Math.min(k + 1 < tops.length ? tops[k + 1].tvdM : Infinity, tdTvdM + 200);
    const count = rng.int(3, top.name.startsWith('Dunmere') ? 6 : 5);
    const unit: SandBed[] = [];
    for (let tries = 0; unit.length < count && tries < 40; tries++) {
      const thickness = rng.uniform(6, top.name.startsWith('Dunmere') ? 35 : 25);
      const at = rng.uniform(top.tvdM + 5, base - thickness - 5);
      if (!(at > top.tvdM)) break;
      if (unit.some((b) => at < b.baseTvdM + 8 && at + thickness > b.topTvdM - 8)) continue;
      unit.push({ topTvdM: at, baseTvdM: at + thickness, formation: top.name });
    }
    beds.push(...unit.sort((a, b) => a.topTvdM - b.topTvdM));
  });
  return beds;
}

/** The MD grid of the logs: 1 m, or 0.5 ft for operators who log in feet, from 200 m below the mudline to TD. */
function logGrid(fromMdM: number, tdMdM: number, unit: 'm' | 'ft'): Float64Array {
  const out: number[] = [];
  if (unit === 'm') {
    for (let md = Math.ceil(fromMdM); md <= tdMdM; md += 1) out.push(md);
  } else {
    const startFt = Math.ceil((fromMdM / FT_M) * 2) / 2;
    for (let i = 0; ; i++) {
      const md = Math.round((startFt + 0.5 * i) * FT_M * 1e4) / 1e4;
      if (md > tdMdM) break;
      out.push(md);
    }
  }
  return Float64Array.from(out);
}

const isoDay = (iso: string, days: number) => new Date(Date.parse(`${iso}T00:00:00Z`) + days * 86_400_000).toISOString().slice(0, 10);

/**
 * Works out one well from its spec: path, pressure column, tops, sands, logs and observations.
 * @example
 * const well = buildWell(spec, 2026, { noise: false });
 */
export function buildWell(spec: WellSpec, seed: number, opts: LogOptions = {}): DemoWell {
  const rng = (purpose: string) => makeRng(subSeed(seed, 'well', spec.index, purpose));
  const operator = DEMO_OPERATORS[spec.operatorIndex];
  const waterDepthM = Math.round(waterDepthAtM(spec.xM, spec.yM) * 10) / 10;
  const mudlineTvdM = spec.airGapM + waterDepthM;
  const draft = draftPath(spec.design, 8000);

  const top = meetSurface(draft, spec, hiddenTopTvdssAtM);
  const tdTvdssM = Math.min(5200, Math.max(waterDepthM + 1500, top.ss + spec.tdBelowTopM));
  const { path, tdMdM, tdTvdM } = finalPath(spec.design, Math.round(tdTvdssM + spec.airGapM));
  const lambda = lambdaAtM(top.at.xM, top.at.yM);
  const rampLengthM = rampLengthAtM(top.at.xM, top.at.yM);
  const column = buildColumn({ tdTvdM, waterDepthM, airGapM: spec.airGapM, topTvdssM: top.ss, lambda, rampLengthM });
  const tvdFromSurvey = path.profile !== 'vertical';

  const formationTvds = FORMATIONS.map((f, k) => ({
    name: f.name,
    sandy: f.sandy,
    lithology: f.lithology,
    tvdM: meetSurface(path, spec, (x, y) => formationTopsTvdssAtM(x, y)[k]).ss + spec.airGapM,
  }));
  const tops: DemoTop[] = formationTvds
    .filter((f) => f.tvdM < tdTvdM)
    .map((f) => {
      const mdM = Math.round(path.mdAtTvd(f.tvdM) * 10) / 10;
      return { name: f.name, mdM, tvdM: path.tvdAtMd(mdM), tvdFromSurvey, lithology: f.lithology };
    });
  const sands = sandBeds(rng('sands'), formationTvds, tdTvdM);

  const logFromMdM = path.mdAtTvd(mudlineTvdM + 200);
  const mdM = logGrid(logFromMdM, tdMdM, operator.logDepthUnit);
  const { curves, samples } = synthesiseLogs(column, mdM, path.tvdAtMds(mdM), sands, rng('logs'), opts);

  const ctx: DrillingContext = {
    column,
    path,
    tdMdM,
    tdTvdM,
    operator,
    rng: rng('drilling'),
    tvdFromSurvey,
    dateAt: (md) => isoDay(spec.spudDate, Math.floor(md / 55)),
  };
  const tripMarginKgM3 = ctx.rng.uniform(...DRILLING_RULES.tripMarginPpg) * PPG_KGM3;
  const shoes = chooseShoes(ctx, tripMarginKgM3);
  const mud = mudWeights(ctx, tripMarginKgM3, shoes, {
    kickFromTvdM: spec.kickBelowTopM === undefined ? undefined : column.topTvdM + spec.kickBelowTopM,
    lossAtTvdM: spec.lossAtFraction === undefined ? undefined : shoes[0].tvdM + spec.lossAtFraction * (tdTvdM - shoes[0].tvdM),
  });
  const lotRows = shoeTests(ctx, shoes, mud.schedule);
  const tests = formationTests({ ...ctx, rng: rng('tests') }, sands, mud.schedule, shoes, mudlineTvdM + 200);
  const pressures = [...lotRows, ...mud.observations, ...tests].sort((a, b) => a.mdM - b.mdM);

  const { lon, lat } = toLonLat(spec.xM, spec.yM);
  return {
    name: spec.name,
    uwi: spec.uwi,
    operator: operator.name,
    lon: Math.round(lon * 1e6) / 1e6,
    lat: Math.round(lat * 1e6) / 1e6,
    surfaceEpsg: 4326,
    datumKind: 'RT',
    datumElevationM: spec.airGapM,
    airGapM: spec.airGapM,
    waterDepthM,
    offshore: true,
    spudDate: spec.spudDate,
    tdMdM,
    tdTvdM,
    status: spec.status,
    note: WELL_NOTE,
    extra: { synthetic: 'yes', profile: path.profile },
    profile: path.profile,
    survey: path.stations,
    pressures,
    tops,
    logs: curves.map((c) => ({ ...c, mdM, indexUnit: operator.logDepthUnit })),
    truth: {
      xM: spec.xM,
      yM: spec.yM,
      topTvdssAtWellheadM: hiddenTopTvdssAtM(spec.xM, spec.yM),
      topTvdssM: top.ss,
      lambda,
      rampLengthM,
      tripMarginKgM3,
      column,
      logSamples: samples,
      sands,
      shoes,
    },
  };
}
