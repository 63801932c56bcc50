import type { Problem } from '../../../shared/formats/problem';
import type { MappedRecord } from '../../../shared/imports/mapRows';
import type { PressureKind, PressureQuality, WellStatus } from '../../../shared/schemas/wells';
import { computeSurvey, minimumCurvature, type StationInput } from '../../../shared/trajectory';
import { pressureAndEmw } from './pressureValue';
import { offshoreFromWaterDepth, placeWell, type PlannedWellFields } from './wellPlacement';
import { tvdFromSurvey, type WellLookup } from './wellLookup';

/** What a commit will do with each valid record; built without writing anything. */
export interface WellPlanRow extends PlannedWellFields {
  line: number;
  existingId: string | null;
  airGapM: number | null;
  spudDate: string | null;
  tdTvdM: number | null;
  status: WellStatus | null;
  note: string | null;
}

export interface SurveyPlan {
  wellId: string;
  wellName: string;
  lines: number[];
  stations: { mdM: number; incDeg: number; aziDeg: number; tvdM: number; northM: number; eastM: number; doglegDegPer30m: number }[];
}

export interface PressurePlanRow {
  line: number;
  wellId: string;
  wellName: string;
  kind: PressureKind;
  mdM: number;
  tvdM: number;
  tvdFromSurvey: boolean;
  valueEntered: number;
  unitEntered: string;
  pressurePa: number;
  emwKgM3: number;
  quality: PressureQuality;
  fluid: string | null;
  observedOn: string | null;
  source: string | null;
}

export interface TopPlanRow {
  line: number;
  wellId: string;
  wellName: string;
  name: string;
  mdM: number;
  tvdM: number;
  tvdFromSurvey: boolean;
  lithology: string | null;
}

export interface PlanResult<T> {
  rows: T;
  problems: Problem[];
  /** Lines dropped by planning (on top of those the field mapping dropped). */
  invalidLines: number[];
  /** Not blocking: the row imports, but the user should look at it. */
  warnings?: Problem[];
}

/** A depth below the well's TD is usually a unit or well mix-up, yet may be real (TD not updated): warn, don't block. */
function warnBelowTd(well: { name: string; tdMdM?: number | null }, mdM: number, line: number, warnings: Problem[]) {
  if (well.tdMdM == null || !(mdM > well.tdMdM + 0.01)) return;
  warnings.push({
    line,
    column: 'md',
    message: `MD ${mdM.toFixed(1)} m is deeper than the TD of well "${well.name}" (${well.tdMdM.toFixed(1)} m MD): check the depth, its unit, or the well's TD`,
  });
}

const str = (v: unknown) => (v === null || v === undefined ? null : String(v));
const num = (v: unknown) => (typeof v === 'number' ? v : null);

/** Resolves the well a record names, or reports the line. */
function resolveWell(r: MappedRecord, lookup: WellLookup, problems: Problem[], column = 'well') {
  const name = String(r.values.well);
  const well = lookup.find(name);
  if (!well) problems.push({ line: r.line, column, message: `no well named or numbered "${name}" in this team; import its header first` });
  return well;
}

/**
 * `rejected` are the records the field mapping already refused (bad cells left null): they are checked
 * too, so a row's coordinate problem is listed with its bad date rather than after it is fixed.
 */
export function planWells(
  records: MappedRecord[],
  lookup: WellLookup,
  defaultEpsg: number,
  rejected: MappedRecord[] = [],
): PlanResult<WellPlanRow[]> {
  const problems: Problem[] = [];
  const invalid: number[] = [];
  const rows: WellPlanRow[] = [];
  const firstLineOf = new Map<string, number>();
  const refused = new Set(rejected);
  for (const r of [...records, ...rejected].sort((a, b) => a.line - b.line)) {
    const v = r.values;
    const isRejected = refused.has(r);
    const name = v.name === null || v.name === undefined ? '' : String(v.name);
    const uwi = str(v.uwi);
    const lineProblems: Problem[] = [];
    for (const key of [name.toLowerCase(), uwi?.toLowerCase()]) {
      if (!key) continue;
      const first = firstLineOf.get(key);
      if (first !== undefined)
        lineProblems.push({
          line: r.line,
          column: key === uwi?.toLowerCase() ? 'uwi' : 'name',
          message: `duplicate well "${key === uwi?.toLowerCase() ? uwi : name}" (first at line ${first})`,
        });
    }
    const epsg = num(v.epsg) ?? defaultEpsg;
    const x = v.x as number;
    const y = v.y as number;
    let lonLat: { lon: number; lat: number } | null = null;
    // A coordinate that did not read is already reported by the mapping.
    if (typeof x === 'number' && typeof y === 'number') {
      const placed = placeWell(x, y, epsg);
      if ('axis' in placed) lineProblems.push({ line: r.line, column: placed.axis, message: placed.message });
      else lonLat = placed;
    }
    const byName = name ? lookup.find(name) : undefined;
    const byUwi = uwi ? lookup.find(uwi) : undefined;
    if (byName && byUwi && byName.id !== byUwi.id) {
      lineProblems.push({ line: r.line, column: 'uwi', message: `UWI "${uwi}" belongs to well "${byUwi.name}", not "${name}"` });
    }
    const waterDepthM = num(v.waterDepth);
    if (waterDepthM !== null && waterDepthM < 0)
      lineProblems.push({ line: r.line, column: 'waterDepth', message: 'water depth cannot be negative' });
    const tdMdM = num(v.tdMd);
    const tdTvdM = num(v.tdTvd);
    if (tdMdM !== null && tdMdM <= 0) lineProblems.push({ line: r.line, column: 'tdMd', message: 'total depth must be above zero' });
    if (tdMdM !== null && tdTvdM !== null && tdTvdM > tdMdM + 0.01)
      lineProblems.push({ line: r.line, column: 'tdTvd', message: 'TVD cannot exceed MD' });
    if (isRejected || lineProblems.length || !lonLat) {
      problems.push(...lineProblems);
      invalid.push(r.line);
      continue;
    }
    firstLineOf.set(name.toLowerCase(), r.line);
    if (uwi) firstLineOf.set(uwi.toLowerCase(), r.line);
    rows.push({
      line: r.line,
      existingId: (byName ?? byUwi)?.id ?? null,
      name,
      uwi,
      operator: str(v.operator),
      lon: lonLat.lon,
      lat: lonLat.lat,
      surfaceX: x,
      surfaceY: y,
      surfaceEpsg: epsg,
      datumElevationM: num(v.datumElevation),
      datumKind: str(v.datumKind),
      groundElevationM: num(v.groundElevation),
      waterDepthM,
      airGapM: num(v.airGap),
      offshore: offshoreFromWaterDepth(waterDepthM, typeof v.offshore === 'boolean' ? v.offshore : null),
      spudDate: str(v.spudDate),
      tdMdM,
      tdTvdM,
      status: (str(v.status) as WellStatus | null) ?? null,
      note: str(v.note),
    });
  }
  return { rows, problems, invalidLines: invalid };
}

/** Groups stations by well, checks their order, and computes minimum-curvature positions. */
export function planSurveys(records: MappedRecord[], lookup: WellLookup): PlanResult<SurveyPlan[]> {
  const problems: Problem[] = [];
  const invalid: number[] = [];
  const byWell = new Map<string, { wellName: string; items: { line: number; st: StationInput }[] }>();
  for (const r of records) {
    const well = resolveWell(r, lookup, problems);
    const st = { mdM: r.values.md as number, incDeg: r.values.inc as number, aziDeg: r.values.azi as number };
    const lineProblems: string[] = [];
    if (st.mdM < 0) lineProblems.push('md: measured depth cannot be negative');
    if (st.incDeg < 0 || st.incDeg > 180) lineProblems.push(`inc: inclination ${st.incDeg} is outside 0..180°`);
    if (st.aziDeg < 0 || st.aziDeg >= 360) lineProblems.push(`azi: azimuth ${st.aziDeg} is outside 0..360°`);
    for (const m of lineProblems) {
      const [column, message] = m.split(': ');
      problems.push({ line: r.line, column, message });
    }
    if (!well || lineProblems.length) {
      invalid.push(r.line);
      continue;
    }
    const group = byWell.get(well.id) ?? { wellName: well.name, items: [] };
    group.items.push({ line: r.line, st });
    byWell.set(well.id, group);
  }
  const plans: SurveyPlan[] = [];
  for (const [wellId, group] of byWell) {
    let ok = true;
    // A station listed shallower than the one before is most often a typo or two surveys merged:
    // re-sorting would hide it, so it is a problem of its line, like the other survey problems.
    for (let i = 1; i < group.items.length; i++) {
      const [prev, cur] = [group.items[i - 1], group.items[i]];
      if (cur.st.mdM < prev.st.mdM) {
        problems.push({
          line: cur.line,
          column: 'md',
          message: `MD ${cur.st.mdM} m is shallower than MD ${prev.st.mdM} m at line ${prev.line} for well "${group.wellName}": stations must increase in MD`,
        });
        ok = false;
      }
    }
    group.items.sort((a, b) => a.st.mdM - b.st.mdM);
    for (let i = 1; i < group.items.length; i++) {
      if (group.items[i].st.mdM === group.items[i - 1].st.mdM) {
        problems.push({
          line: group.items[i].line,
          column: 'md',
          message: `a second station at MD ${group.items[i].st.mdM} m for well "${group.wellName}" (also line ${group.items[i - 1].line})`,
        });
        ok = false;
      }
    }
    if (!ok) {
      invalid.push(...group.items.map((x) => x.line));
      continue;
    }
    const stations = minimumCurvature(group.items.map((x) => x.st));
    plans.push({ wellId, wellName: group.wellName, lines: group.items.map((x) => x.line), stations });
  }
  return { rows: plans, problems, invalidLines: invalid };
}

/** TVD (given, or from the survey), and the value in Pa and as EMW. */
export function planPressures(
  records: MappedRecord[],
  lookup: WellLookup,
  surveys: Map<string, StationInput[]>,
): PlanResult<PressurePlanRow[]> {
  const problems: Problem[] = [];
  const warnings: Problem[] = [];
  const invalid: number[] = [];
  const rows: PressurePlanRow[] = [];
  const computed = new Map<string, ReturnType<typeof computeSurvey> | null>();
  for (const r of records) {
    const well = resolveWell(r, lookup, problems);
    if (!well) {
      invalid.push(r.line);
      continue;
    }
    const v = r.values;
    const mdM = v.md as number;
    const given = num(v.tvd);
    let tvdM = given;
    if (tvdM === null) {
      if (!computed.has(well.id)) {
        const st = surveys.get(well.id);
        computed.set(well.id, st && st.length ? computeSurvey(st) : null);
      }
      const survey = computed.get(well.id);
      tvdM = tvdFromSurvey(survey, mdM);
    }
    const unit = r.valueUnit!;
    const lineProblems: Problem[] = [];
    if (mdM <= 0) lineProblems.push({ line: r.line, column: 'md', message: 'measured depth must be above zero' });
    if (given !== null && given > mdM + 0.01)
      lineProblems.push({ line: r.line, column: 'tvd', message: `TVD ${given.toFixed(2)} m is deeper than MD ${mdM.toFixed(2)} m` });
    const value = v.value as number;
    if (value <= 0) lineProblems.push({ line: r.line, column: 'value', message: 'the value must be above zero' });
    if (lineProblems.length || !(tvdM > 0)) {
      problems.push(...lineProblems);
      invalid.push(r.line);
      continue;
    }
    warnBelowTd(well, mdM, r.line, warnings);
    const { pressurePa, emwKgM3 } = pressureAndEmw(value, unit, tvdM);
    // Below 0.5 sg or above 3.0 sg EMW is not a subsurface pressure: almost always a wrong unit.
    if (emwKgM3 < 500 || emwKgM3 > 3000) {
      problems.push({
        line: r.line,
        column: 'value',
        message: `${value} ${unit} at ${tvdM.toFixed(0)} m TVD is an EMW of ${(emwKgM3 / 1000).toFixed(2)} sg — outside 0.5–3.0 sg; is the unit right?`,
      });
      invalid.push(r.line);
      continue;
    }
    rows.push({
      line: r.line,
      wellId: well.id,
      wellName: well.name,
      kind: v.kind as PressureKind,
      mdM,
      tvdM,
      tvdFromSurvey: given === null,
      valueEntered: value,
      unitEntered: unit,
      pressurePa,
      emwKgM3,
      quality: ((v.quality as PressureQuality | null) ?? 'unknown') as PressureQuality,
      fluid: str(v.fluid),
      observedOn: str(v.date),
      source: str(v.source),
    });
  }
  return { rows, problems, invalidLines: invalid, warnings };
}

export function planTops(records: MappedRecord[], lookup: WellLookup, surveys: Map<string, StationInput[]>): PlanResult<TopPlanRow[]> {
  const problems: Problem[] = [];
  const warnings: Problem[] = [];
  const invalid: number[] = [];
  const rows: TopPlanRow[] = [];
  for (const r of records) {
    const well = resolveWell(r, lookup, problems);
    const mdM = r.values.md as number;
    if (well && mdM < 0) problems.push({ line: r.line, column: 'md', message: 'measured depth cannot be negative' });
    if (!well || mdM < 0) {
      invalid.push(r.line);
      continue;
    }
    warnBelowTd(well, mdM, r.line, warnings);
    const given = num(r.values.tvd);
    rows.push({
      line: r.line,
      wellId: well.id,
      wellName: well.name,
      name: String(r.values.name),
      mdM,
      tvdM: given ?? tvdFromSurvey(surveys.get(well.id), mdM),
      tvdFromSurvey: given === null,
      lithology: str(r.values.lithology),
    });
  }
  return { rows, problems, invalidLines: invalid, warnings };
}
