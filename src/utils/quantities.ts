import { convert, FT_M } from '@shared/units';
import type { DisplayDepthUnit, DisplayEmwUnit, DisplayPressureUnit } from '@/stores/units';

/** Shown where a value is missing; a blank cell could be mistaken for a zero or a rendering fault. */
export const MISSING = '—';

const formats = new Map<number, Intl.NumberFormat>();

/**
 * A number with thousands grouping and at most `digits` decimals (fixed English style so tables line up
 * the same for everyone and match the server's messages).
 * @example formatNumber(4593.990654, 1) // '4,594'
 * @example formatNumber(null) // '—'
 */
export function formatNumber(value: number | null | undefined, digits = 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  let format = formats.get(digits);
  if (!format) {
    format = new Intl.NumberFormat('en', { maximumFractionDigits: digits, minimumFractionDigits: 0 });
    formats.set(digits, format);
  }
  return format.format(value);
}

/**
 * A depth in metres read in the chosen unit.
 * @example depthIn(1000, 'ft') // 3280.839895013123
 */
export function depthIn(valueM: number | null | undefined, unit: DisplayDepthUnit): number | null {
  if (valueM === null || valueM === undefined || !Number.isFinite(valueM)) return null;
  return unit === 'm' ? valueM : convert(valueM, 'm', unit);
}

/**
 * A typed depth back to metres, for forms that accept the reader's unit.
 * @example depthToMetres(100, 'ft') // 30.48
 */
export function depthToMetres(value: number, unit: DisplayDepthUnit): number {
  return unit === 'm' ? value : convert(value, unit, 'm');
}

/**
 * A depth in metres, shown in the chosen unit to a tenth (the unit goes in the column title).
 * @example formatDepth(1441.5, 'ft') // '4,729.3'
 */
export function formatDepth(valueM: number | null | undefined, unit: DisplayDepthUnit, digits = 1): string {
  return formatNumber(depthIn(valueM, unit), digits);
}

// Decimals that keep a pressure readable at reservoir magnitudes (tens of MPa, thousands of psi).
const PRESSURE_DIGITS: Record<DisplayPressureUnit, number> = { MPa: 2, bar: 1, psi: 0, kPa: 0 };

/**
 * A pressure in Pa in the chosen unit.
 * @example formatPressure(27.5e6, 'psi') // '3,989'
 */
export function formatPressure(pressurePa: number | null | undefined, unit: DisplayPressureUnit): string {
  if (pressurePa === null || pressurePa === undefined) return MISSING;
  return formatNumber(convert(pressurePa, 'Pa', unit), PRESSURE_DIGITS[unit]);
}

// EMW is read to 0.01 sg / 0.01 ppg in drilling practice; gradients get one more decimal in psi/ft. Common practice, no source.
const EMW_DIGITS: Record<DisplayEmwUnit, number> = { sg: 2, ppg: 2, 'kPa/m': 2, 'psi/ft': 3 };

/**
 * An equivalent mud weight (a density in kg/m³) in the chosen unit.
 * @example emwIn(1000, 'ppg') // 8.345404…
 */
export function emwIn(emwKgM3: number, unit: DisplayEmwUnit): number {
  return convert(emwKgM3, 'kg/m3', unit);
}

/**
 * An equivalent mud weight in kg/m³, shown in the chosen unit.
 * @example formatEmw(1160, 'ppg') // '9.68'
 */
export function formatEmw(emwKgM3: number | null | undefined, unit: DisplayEmwUnit): string {
  if (emwKgM3 === null || emwKgM3 === undefined) return MISSING;
  return formatNumber(emwIn(emwKgM3, unit), EMW_DIGITS[unit]);
}

const UNIT_LABELS: Record<string, string> = { 'kg/m3': 'kg/m³', deg: '°', 'us/ft': 'µs/ft', 'us/m': 'µs/m', 'g/cc': 'g/cm³' };

/**
 * A unit name as people write it (superscripts, degree sign); unknown names pass through.
 * @example unitLabel('kg/m3') // 'kg/m³'
 */
export function unitLabel(unit: string): string {
  return UNIT_LABELS[unit] ?? unit;
}

/**
 * A dogleg severity stored per 30 m, read per 30 m or per 100 ft to match the depth unit
 * (100 ft = 30.48 m exactly, so °/100 ft = °/30 m × 1.016).
 * @example doglegIn(3, 'ft') // 3.048
 */
export function doglegIn(degPer30m: number, unit: DisplayDepthUnit): number {
  return unit === 'm' ? degPer30m : degPer30m * ((100 * FT_M) / 30);
}

/**
 * The unit label of a dogleg severity for the depth unit.
 * @example doglegUnit('ft') // '°/100 ft'
 */
export function doglegUnit(unit: DisplayDepthUnit): string {
  return unit === 'm' ? '°/30 m' : '°/100 ft';
}
