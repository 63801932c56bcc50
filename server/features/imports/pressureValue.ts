import { G, UNITS_BY_QUANTITY, convert } from '../../../shared/units';

const PRESSURE_UNITS: readonly string[] = UNITS_BY_QUANTITY.pressure;

/**
 * An observation entered as a pressure (psi, kPa, …) or as an equivalent density/gradient
 * (ppg, sg, psi/ft, …) becomes absolute pressure in Pa at the TVD, and its EMW in kg/m³.
 * @example pressureAndEmw(5200, 'psi', 3048) // { pressurePa: 35852738, emwKgM3: 1199.5 }
 */
export function pressureAndEmw(value: number, unit: string, tvdM: number): { pressurePa: number; emwKgM3: number } {
  if (!(tvdM > 0)) throw new Error('TVD must be above zero to express a pressure as an equivalent mud weight');
  const pressurePa = PRESSURE_UNITS.includes(unit) ? convert(value, unit, 'Pa') : convert(value, unit, 'Pa/m') * tvdM;
  return { pressurePa, emwKgM3: pressurePa / (G * tvdM) };
}
