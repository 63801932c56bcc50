import type { LasFile } from '../../../shared/formats/las';
import { suggestCurveRole } from '../../../shared/formats/las';
import type { Problem } from '../../../shared/formats/problem';
import { CURVE_ROLES, type CurveRole } from '../../../shared/schemas/wells';
import type { KnownWell, WellLookup } from './wellLookup';

export interface LasCurvePlan {
  mnemonic: string;
  unit: string;
  description: string;
  role: CurveRole;
  suggestedRole: CurveRole;
  samples: number;
  validSamples: number;
}

export interface LasPlan {
  well: KnownWell | null;
  wellLabel: string;
  /** How the well was matched: by the chosen id, the UWI/API, or the WELL name. */
  matchedBy: 'chosen' | 'uwi' | 'name' | null;
  indexUnit: string;
  topMdM: number;
  baseMdM: number;
  curves: LasCurvePlan[];
}

function headerLine(las: LasFile, mnemonic: string): number {
  return las.well.items.find((i) => i.mnemonic.toUpperCase() === mnemonic)?.line ?? 1;
}

/**
 * Matches the LAS file to a well of the team (chosen id, then UWI/API, then WELL name) and settles
 * each curve's role (as the user mapped it, else suggested from mnemonic and unit).
 */
export function planLas(las: LasFile, lookup: WellLookup, chosen: KnownWell | null, roles: Record<string, string>): { plan: LasPlan; problems: Problem[] } {
  const problems: Problem[] = [...las.errors];
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
  if (!well) {
    problems.push({
      line: headerLine(las, las.well.WELL ? 'WELL' : 'UWI'),
      column: 'WELL',
      message: `no well "${wellLabel}"${uwi ? ` or UWI/API "${uwi}"` : ''} in this team; import the well header first or choose the well`,
    });
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
    return { mnemonic: c.mnemonic, unit: c.unit, description: c.description, role, suggestedRole, samples: c.values.length, validSamples: valid };
  });
  if (curves.length === 0 && las.errors.length === 0) problems.push({ line: 1, message: 'the file has no curves besides the depth index' });
  const md = las.index.valuesM;
  const plan: LasPlan = {
    well,
    wellLabel,
    matchedBy,
    indexUnit: las.index.rawUnit,
    topMdM: md.length ? md[0] : NaN,
    baseMdM: md.length ? md[md.length - 1] : NaN,
    curves,
  };
  return { plan, problems };
}
