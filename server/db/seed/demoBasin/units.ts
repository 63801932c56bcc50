import { convert } from '../../../../shared/units';
import { pressureAndEmw } from '../../../features/imports/pressureValue';
import type { PressureKind, PressureQuality } from '../../../../shared/schemas/wells';
import type { MudEntryUnit, PressureEntryUnit } from './names';

/** One pressure observation as the database stores it (columns of pressure_observations). */
export interface DemoPressure {
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

/** Decimals an operator's report keeps, per unit: the resolution of the gauge or the mud balance. */
const DECIMALS: Record<PressureEntryUnit | MudEntryUnit, number> = { psi: 1, kPa: 0, bar: 2, MPa: 3, ppg: 1, sg: 2, 'kg/m3': 0 };
/** kg/m3 mud weights are reported to the nearest 5 (common practice, no source). */
const KGM3_STEP = 5;

/**
 * A pressure (Pa) as an operator writes it down in its unit.
 * @example pressureEntry(34.47e6, 'psi'); // 4999.5
 */
export function pressureEntry(pressurePa: number, unit: PressureEntryUnit): number {
  return Number(convert(pressurePa, 'Pa', unit).toFixed(DECIMALS[unit]));
}

/**
 * A mud weight or EMW (kg/m3) as written in `unit`; `up` rounds up (a mud weight must not fall below
 * what the plan asks), otherwise to the nearest.
 * @example mudEntry(1210, 'ppg', 'up'); // 10.1
 */
export function mudEntry(emwKgM3: number, unit: MudEntryUnit, mode: 'up' | 'nearest' = 'nearest'): number {
  const roundTo = (v: number, step: number) => {
    const k = v / step;
    // 1e-9 keeps an exact step from being bumped up by floating-point dust
    return Number(((mode === 'up' ? Math.ceil(k - 1e-9) : Math.round(k)) * step).toFixed(DECIMALS[unit]));
  };
  if (unit === 'kg/m3') return roundTo(emwKgM3, KGM3_STEP);
  return roundTo(convert(emwKgM3, 'kg/m3', unit), 10 ** -DECIMALS[unit]);
}

/**
 * The EMW (kg/m3) a mud entry stands for.
 * @example mudEntryKgM3(10, 'ppg'); // 1198.26
 */
export function mudEntryKgM3(value: number, unit: MudEntryUnit): number {
  return convert(value, unit, 'kg/m3');
}

/**
 * A stored observation from the value as entered: SI through the importer's own conversion, so a seeded
 * row and an imported row of the same numbers are identical.
 * @example observation({ kind: 'lot', mdM: 900, tvdM: 900, tvdFromSurvey: false, valueEntered: 13.2, unitEntered: 'ppg', observedOn: null });
 */
export function observation(
  fields: Omit<DemoPressure, 'pressurePa' | 'emwKgM3' | 'quality' | 'fluid' | 'source'> &
    Partial<Pick<DemoPressure, 'quality' | 'fluid' | 'source'>>,
): DemoPressure {
  const { pressurePa, emwKgM3 } = pressureAndEmw(fields.valueEntered, fields.unitEntered, fields.tvdM);
  return { quality: 'unknown', fluid: null, source: null, ...fields, pressurePa, emwKgM3 };
}
