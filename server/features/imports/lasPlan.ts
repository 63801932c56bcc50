import type { LasFile, LasWellLocation } from '../../../shared/formats/las';
import { readLasLocation, suggestCurveRole } from '../../../shared/formats/las';
import type { Problem } from '../../../shared/formats/problem';
import { CURVE_ROLES, type CurveRole } from '../../../shared/schemas/wells';
import type { KnownWell, WellLookup } from './wellLookup';
import { offshoreFromWaterDepth, placeWell, type PlannedWellFields } from './wellPlacement';

export interface LasCurvePlan {
  mnemonic: string;
  unit: string;
  description: string;
  role: CurveRole;
  suggestedRole: CurveRole;
  samples: number;
  validSamples: number;
}

/** The well a LAS file creates when no well of the team matches it, from its own ~W/~P items. */
export interface LasNewWell extends PlannedWellFields {
  datumKind: 'KB' | 'DF' | 'RT' | null;
  /** The deepest depth of the file (the last sample or STOP), m MD: the well is at least this deep. */
  tdMdM: number | null;
  /** Null until settled: from the file (a water depth item), else from the nearest team well (see settleOffshore). */
  offshore: boolean | null;
  /** Why `offshore` has its value, in words for the preview. */
  offshoreFrom: string;
  /** Where the location came from, e.g. "LATI/LONG (lines 14, 15)". */
  locationFrom: string;
}

/** How far a team well may be for its onshore/offshore setting to stand for a new well's. Common practice, no source. */
export const NEIGHBOUR_RADIUS_M = 20_000;

export interface LasPlan {
  well: KnownWell | null;
  /** Set when no well matches and the file says enough to create one; the commit creates it. */
  createWell: LasNewWell | null;
  wellLabel: string;
  /** How the well was matched: by the chosen id, the UWI/API, or the WELL name. */
  matchedBy: 'chosen' | 'uwi' | 'name' | null;
  /** The file places its well by X/Y alone (no LATI/LONG), so the EPSG code of X/Y matters. */
  xyOnly: boolean;
  indexUnit: string;
  topMdM: number;
  baseMdM: number;
  curves: LasCurvePlan[];
}

function headerLine(las: LasFile, mnemonic: string): number {
  return las.well.items.find((i) => i.mnemonic.toUpperCase() === mnemonic)?.line ?? 1;
}

/**
 * The well to create from the file's name, UWI/API and location (LATI/LONG, else X/Y in `epsg`), or
 * the reason it cannot be created, naming what is missing.
 */
function newWellFrom(
  las: LasFile,
  loc: LasWellLocation,
  uwi: string,
  epsg: number,
): { well: LasNewWell | null; problems: Problem[]; missing: string | null } {
  const name = las.well.WELL.trim();
  const problems: Problem[] = [...loc.problems];
  if (!name) return { well: null, problems, missing: 'the file has no WELL name in ~W to create it under' };
  let at: { lon: number; lat: number; x: number; y: number; epsg: number; from: string } | null = null;
  if (loc.lat && loc.lon) {
    const placed = placeWell(loc.lon.value, loc.lat.value, 4326);
    if ('axis' in placed) {
      const item = placed.axis === 'y' ? loc.lat : loc.lon;
      problems.push({ line: item.line, column: item.mnemonic, message: placed.message });
    } else {
      // Other geodetic datums differ from WGS 84 by up to a few hundred metres: fine for screening, worth saying.
      const datum =
        loc.geodeticDatum && !/WGS\s*-?\s*84/i.test(loc.geodeticDatum) ? `, read as WGS 84 although GDAT says "${loc.geodeticDatum}"` : '';
      at = {
        lon: loc.lon.value,
        lat: loc.lat.value,
        x: loc.lon.value,
        y: loc.lat.value,
        epsg: 4326,
        from: `${loc.lat.mnemonic}/${loc.lon.mnemonic} (lines ${loc.lat.line}, ${loc.lon.line})${datum}`,
      };
    }
  } else if (loc.x && loc.y && !loc.lat && !loc.lon) {
    // The LAS header does not name the CRS of X/Y, so only the user's EPSG code can place them.
    if (epsg === 4326) {
      problems.push({
        line: loc.x.line,
        column: loc.x.mnemonic,
        message: `the file gives ${loc.x.mnemonic}/${loc.y.mnemonic} but no LATI/LONG: choose the EPSG code of ${loc.x.mnemonic}/${loc.y.mnemonic} to create well "${name}"`,
      });
    } else {
      const placed = placeWell(loc.x.value, loc.y.value, epsg);
      if ('axis' in placed) problems.push({ line: loc.x.line, column: loc.x.mnemonic, message: placed.message });
      else
        at = {
          ...placed,
          x: loc.x.value,
          y: loc.y.value,
          epsg,
          from: `${loc.x.mnemonic}/${loc.y.mnemonic} in EPSG:${epsg} (lines ${loc.x.line}, ${loc.y.line})`,
        };
    }
  }
  if (!at) {
    if (problems.length)
      return { well: null, problems, missing: `the location in the file cannot create it (see line ${problems[0].line})` };
    const one = loc.lat ?? loc.lon ?? loc.x ?? loc.y;
    const other = loc.lat ? 'LONG' : loc.lon ? 'LATI' : loc.x ? 'Y' : 'X';
    return {
      well: null,
      problems,
      missing: one
        ? `the file has ${one.mnemonic} but no ${other} to create it`
        : 'the file has no LATI/LONG (or X/Y) in ~W or ~P to create it',
    };
  }
  return {
    well: {
      name,
      uwi: uwi || null,
      operator: las.well.COMP.trim() || null,
      lon: at.lon,
      lat: at.lat,
      surfaceX: at.x,
      surfaceY: at.y,
      surfaceEpsg: at.epsg,
      datumElevationM: loc.datumElevation?.value ?? null,
      datumKind: loc.datumElevation?.kind ?? null,
      groundElevationM: loc.groundElevation?.value ?? null,
      waterDepthM: loc.waterDepth?.value ?? null,
      tdMdM: deepestMdM(las),
      offshore: offshoreFromWaterDepth(loc.waterDepth?.value ?? null),
      offshoreFrom: loc.waterDepth ? `${loc.waterDepth.mnemonic} (line ${loc.waterDepth.line})` : '',
      locationFrom: at.from,
    },
    problems,
    missing: null,
  };
}

/** The deepest finite depth of the index (in metres, whatever the file's unit), or null with no data. */
function deepestMdM(las: LasFile): number | null {
  let deepest = -Infinity;
  for (const v of las.index.valuesM) if (Number.isFinite(v) && v > deepest) deepest = v;
  return Number.isFinite(deepest) ? deepest : null;
}

/**
 * Settles whether a new well is offshore when the file does not say (the wells table needs a yes or no):
 * from the nearest team well within {@link NEIGHBOUR_RADIUS_M}, else onshore, saying which in `offshoreFrom`.
 */
export function settleOffshore(well: LasNewWell, nearest: { name: string; offshore: boolean; distanceM: number } | null): void {
  if (well.offshore !== null) return;
  if (nearest) {
    well.offshore = nearest.offshore;
    well.offshoreFrom = `assumed from the nearest team well "${nearest.name}", ${(nearest.distanceM / 1000).toFixed(1)} km away`;
  } else {
    well.offshore = false;
    well.offshoreFrom = `assumed: no water depth in the file and no team well within ${NEIGHBOUR_RADIUS_M / 1000} km`;
  }
}

/** The plain note of what a well created from a LAS file lacks and what was assumed, for the preview. */
export function newWellGapsNote(las: LasFile, well: LasNewWell): Problem {
  const lacks: string[] = [];
  if (well.datumElevationM === null && well.waterDepthM === null)
    lacks.push('no rotary-table elevation or water depth in the file: the well is created with RT 0 m and no water depth');
  else if (well.datumElevationM === null)
    lacks.push('no rotary-table elevation (EKB, EDF or EPD/APD) in the file: the well is created with RT 0 m');
  else if (well.waterDepthM === null && well.offshore) lacks.push('no water depth in the file');
  lacks.push(
    well.offshore
      ? `offshore ${well.offshoreFrom.startsWith('assumed') ? well.offshoreFrom : `from ${well.offshoreFrom}`}`
      : `onshore ${well.offshoreFrom.startsWith('assumed') ? well.offshoreFrom : `from ${well.offshoreFrom}`}`,
  );
  lacks.push(well.tdMdM === null ? 'no TD' : `TD ${well.tdMdM.toFixed(1)} m MD taken from the deepest depth of the file, no TD TVD`);
  lacks.push('no spud date; status "drilled"');
  return {
    line: headerLine(las, 'WELL'),
    column: 'WELL',
    message: `the new well "${well.name}" has ${lacks.join('; ')} — edit its header before interpreting it`,
  };
}

/**
 * Matches the LAS file to a well of the team (chosen id, then UWI/API, then WELL name), else plans to
 * create it from the file's header, and settles each curve's role (as the user mapped it, else
 * suggested from mnemonic and unit). `epsg` is the CRS of X/Y when the file gives no LATI/LONG.
 */
export function planLas(
  las: LasFile,
  lookup: WellLookup,
  chosen: KnownWell | null,
  roles: Record<string, string>,
  epsg = 4326,
): { plan: LasPlan; problems: Problem[]; notes: Problem[] } {
  const problems: Problem[] = [...las.errors];
  const notes: Problem[] = [];
  let well: KnownWell | null = chosen;
  let matchedBy: LasPlan['matchedBy'] = chosen ? 'chosen' : null;
  const uwi = (las.well.UWI || las.well.API).trim();
  if (!well && uwi) {
    well = lookup.find(uwi) ?? null;
    if (well) matchedBy = 'uwi';
  }
  if (!well && las.well.WELL.trim()) {
    well = lookup.find(las.well.WELL) ?? null;
    if (well) matchedBy = 'name';
  }
  const wellLabel = las.well.WELL.trim() || uwi || '(no WELL in ~W)';
  const loc = readLasLocation(las);
  let createWell: LasNewWell | null = null;
  if (!well) {
    const created = newWellFrom(las, loc, uwi, epsg);
    createWell = created.well;
    problems.push(...created.problems);
    if (createWell) {
      notes.push({
        line: headerLine(las, 'WELL'),
        column: 'WELL',
        message: `no well "${createWell.name}"${uwi ? ` or UWI/API "${uwi}"` : ''} in this team: the import creates it at lon ${createWell.lon.toFixed(5)}, lat ${createWell.lat.toFixed(5)} from ${createWell.locationFrom}`,
      });
    } else if (created.missing) {
      problems.push({
        line: headerLine(las, las.well.WELL ? 'WELL' : 'UWI'),
        column: 'WELL',
        message: `no well named "${wellLabel}"${uwi ? ` or with UWI/API "${uwi}"` : ''} in this team, and ${created.missing}; import the well header first or choose the well`,
      });
    }
  }
  const curves: LasCurvePlan[] = las.curves.map((c) => {
    const suggestedRole = suggestCurveRole(c.mnemonic, c.unit);
    const asked = roles[c.mnemonic];
    let role = suggestedRole;
    if (asked !== undefined) {
      if ((CURVE_ROLES as readonly string[]).includes(asked)) role = asked as CurveRole;
      else problems.push({ line: 1, column: c.mnemonic, message: `"${asked}" is not a curve role (${CURVE_ROLES.join(', ')})` });
    }
    let valid = 0;
    for (const v of c.values) if (!Number.isNaN(v)) valid++;
    return {
      mnemonic: c.mnemonic,
      unit: c.unit,
      description: c.description,
      role,
      suggestedRole,
      samples: c.values.length,
      validSamples: valid,
    };
  });
  if (curves.length === 0 && las.errors.length === 0) problems.push({ line: 1, message: 'the file has no curves besides the depth index' });
  const md = las.index.valuesM;
  const plan: LasPlan = {
    well,
    createWell,
    wellLabel,
    matchedBy,
    xyOnly: !!(loc.x && loc.y && !loc.lat && !loc.lon),
    indexUnit: las.index.rawUnit,
    topMdM: md.length ? md[0] : NaN,
    baseMdM: md.length ? md[md.length - 1] : NaN,
    curves,
  };
  return { plan, problems, notes };
}
