import { wellPatchBody, type WellDetail, type WellPatchBody, type WellStatus } from '@shared/schemas/wells';
import type { DisplayDepthUnit } from '@/stores/units';
import type { FieldErrors } from '@/utils/formErrors';
import { depthIn, depthToMetres, formatNumber } from '@/utils/quantities';

/** The header form as a person edits it: text as typed, depths in their depth unit. */
export interface WellEditModel {
  name: string;
  uwi: string;
  operator: string;
  status: WellStatus;
  note: string;
  datumElevation: number | null;
  waterDepth: number | null;
  airGap: number | null;
}

/** Form fields that hold a depth, with the patch key each becomes (in metres). */
const DEPTH_FIELDS = [
  ['datumElevation', 'datumElevationM'],
  ['waterDepth', 'waterDepthM'],
  ['airGap', 'airGapM'],
] as const;

// Depths are typed to a centimetre (or a hundredth of a foot); finer digits are noise from the unit conversion.
const roundForForm = (v: number | null) => (v === null ? null : Math.round(v * 100) / 100);

/**
 * The form's starting values for a well, depths converted to the reader's unit.
 * @example editModelFromWell(well, 'ft').waterDepth // 396.65 for 120.9 m
 */
export function editModelFromWell(well: WellDetail, unit: DisplayDepthUnit): WellEditModel {
  return {
    name: well.name,
    uwi: well.uwi ?? '',
    operator: well.operator ?? '',
    status: well.status,
    note: well.note ?? '',
    datumElevation: roundForForm(depthIn(well.datumElevationM, unit)),
    waterDepth: roundForForm(depthIn(well.waterDepthM, unit)),
    airGap: roundForForm(depthIn(well.airGapM, unit)),
  };
}

const textOrNull = (s: string) => (s.trim() === '' ? null : s.trim());

/**
 * The PATCH body for an edit: the version read, and only the fields that changed (so two people editing
 * different fields do not undo each other's work). A depth counts as changed only when it differs from
 * the starting value as shown, so viewing in feet and saving does not rewrite metres by rounding.
 * @example patchFromEdit(well, { ...editModelFromWell(well, 'm'), status: 'abandoned' }, 'm') // { version: 3, status: 'abandoned' }
 */
export function patchFromEdit(well: WellDetail, model: WellEditModel, unit: DisplayDepthUnit): WellPatchBody {
  const start = editModelFromWell(well, unit);
  const body: WellPatchBody = { version: well.version };
  if (model.name.trim() !== start.name) body.name = model.name.trim();
  if (textOrNull(model.uwi) !== well.uwi) body.uwi = textOrNull(model.uwi);
  if (textOrNull(model.operator) !== well.operator) body.operator = textOrNull(model.operator);
  if (model.status !== start.status) body.status = model.status;
  if ((model.note.trim() === '' ? null : model.note) !== well.note) body.note = model.note.trim() === '' ? null : model.note;
  for (const [field, key] of DEPTH_FIELDS) {
    const value = model[field];
    if (value === start[field]) continue;
    const metres = value === null ? null : depthToMetres(value, unit);
    // The datum elevation is not nullable on the server: clearing it means "leave it".
    if (key === 'datumElevationM') {
      if (metres !== null) body.datumElevationM = metres;
    } else {
      body[key] = metres;
    }
  }
  return body;
}

const FORM_FIELD_OF: Record<string, keyof WellEditModel> = {
  datumElevationM: 'datumElevation',
  waterDepthM: 'waterDepth',
  airGapM: 'airGap',
};

/** A limit of the contract (in metres) as the reader types it. */
function limitText(metres: number, unit: DisplayDepthUnit): string {
  return unit === 'm' ? `${metres} m` : `${formatNumber(depthIn(metres, unit), 1)} ft (${metres} m)`;
}

/**
 * Checks a PATCH body against the shared contract before sending; messages are keyed by form field
 * and depth limits are given in the reader's unit.
 * @example checkPatch({ version: 1, name: '', waterDepthM: 5000 }, 'm') // { name: 'is required', waterDepth: 'must be at most 4000 m' }
 */
export function checkPatch(body: WellPatchBody, unit: DisplayDepthUnit): FieldErrors {
  const parsed = wellPatchBody.safeParse(body);
  if (parsed.success) return {};
  const out: FieldErrors = {};
  for (const issue of parsed.error.issues) {
    const key = String(issue.path[0] ?? '');
    const field = FORM_FIELD_OF[key] ?? key;
    if (!field || field in out) continue;
    const isDepth = key in FORM_FIELD_OF;
    if (issue.code === 'too_small') {
      const min = Number(issue.minimum);
      out[field] =
        issue.origin === 'string'
          ? min <= 1
            ? 'is required'
            : `needs at least ${min} characters`
          : `must be at least ${isDepth ? limitText(min, unit) : min}`;
    } else if (issue.code === 'too_big') {
      const max = Number(issue.maximum);
      out[field] =
        issue.origin === 'string' ? `can have at most ${max} characters` : `must be at most ${isDepth ? limitText(max, unit) : max}`;
    } else {
      out[field] = issue.message;
    }
  }
  return out;
}

/** Whether a body changes anything besides carrying the version. */
export function hasChanges(body: WellPatchBody): boolean {
  return Object.keys(body).some((k) => k !== 'version');
}
