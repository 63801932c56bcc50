import { convert } from '@shared/units';
import type { DisplayEmwUnit, DisplayPressureUnit } from '@/stores/units';

/** Across the plot: absolute pressure, or pressure as equivalent mud weight / gradient. */
export type PressureView = 'pressure' | 'emw';

export interface ValueUnits {
  pressure: DisplayPressureUnit;
  emw: DisplayEmwUnit;
}

export const EMW_UNIT_LABELS: Record<DisplayEmwUnit, string> = { sg: 'SG', ppg: 'ppg', 'kPa/m': 'kPa/m', 'psi/ft': 'psi/ft' };

/**
 * Equivalent mud weight (or gradient) of a pressure at a TVD below the rig datum, in the display unit:
 * p / TVD as Pa/m, converted through g = 9.80665 (so 1 ppg ↔ 0.051948 psi/ft = 12/231). NaN at TVD 0.
 * @example emwFromPressure(convert(5200, 'psi', 'Pa'), convert(10000, 'ft', 'm'), 'ppg'); // 10.01
 */
export function emwFromPressure(pressurePa: number, tvdM: number, unit: DisplayEmwUnit): number {
  if (!(tvdM > 0) || Number.isNaN(pressurePa)) return NaN;
  return convert(pressurePa / tvdM, 'Pa/m', unit);
}

/**
 * The x value of a pressure in the current view.
 * @example plotValue(30e6, 3000, 'pressure', { pressure: 'MPa', emw: 'sg' }); // 30
 */
export function plotValue(pressurePa: number, tvdM: number, view: PressureView, units: ValueUnits): number {
  if (view === 'emw') return emwFromPressure(pressurePa, tvdM, units.emw);
  return Number.isNaN(pressurePa) ? NaN : convert(pressurePa, 'Pa', units.pressure);
}

/**
 * A whole curve in the current view.
 * @example plotValues(profile.porePa, profile.tvdM, 'emw', units);
 */
export function plotValues(pressurePa: ArrayLike<number>, tvdM: ArrayLike<number>, view: PressureView, units: ValueUnits): Float64Array {
  return Float64Array.from({ length: pressurePa.length }, (_, i) => plotValue(pressurePa[i], tvdM[i], view, units));
}

/**
 * The x axis title with its unit.
 * @example valueAxisLabel('emw', { pressure: 'MPa', emw: 'ppg' }); // 'Equivalent mud weight from rotary table (ppg)'
 */
export function valueAxisLabel(view: PressureView, units: ValueUnits): string {
  if (view === 'pressure') return `Pressure (${units.pressure})`;
  const gradient = units.emw === 'kPa/m' || units.emw === 'psi/ft';
  return `${gradient ? 'Pressure gradient' : 'Equivalent mud weight'} from rotary table (${EMW_UNIT_LABELS[units.emw]})`;
}

const DIGITS: Record<DisplayEmwUnit | DisplayPressureUnit, number> = {
  sg: 3,
  ppg: 2,
  'kPa/m': 2,
  'psi/ft': 3,
  MPa: 2,
  bar: 1,
  psi: 0,
  kPa: 0,
};

/**
 * A value of the current view for the hover read-out, with its unit.
 * @example formatPlotValue(10.0123, 'emw', { pressure: 'MPa', emw: 'ppg' }); // '10.01 ppg'
 */
export function formatPlotValue(value: number, view: PressureView, units: ValueUnits): string {
  if (!Number.isFinite(value)) return '—';
  const unit = view === 'emw' ? units.emw : units.pressure;
  const label = view === 'emw' ? EMW_UNIT_LABELS[units.emw] : unit;
  return `${value.toLocaleString('en', { minimumFractionDigits: DIGITS[unit], maximumFractionDigits: DIGITS[unit] })} ${label}`;
}
