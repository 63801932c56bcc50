import { convert } from '@shared/units';
import { SURFACE_QUANTITY_KINDS, type SurfaceQuantity } from '@shared/schemas/surfaces';
import type { UnitPreferences } from '@/stores/units';
import { emwIn, formatNumber } from '@/utils/quantities';

/** How one surface quantity reads on screen: its unit, the factor from SI, and digits. */
export interface SurfaceDisplay {
  /** Unit label shown beside numbers. */
  unit: string;
  /** Display value per SI value; every unit here is a pure scale (no offset), so it applies to differences too. */
  factor: number;
  digits: number;
  /** A value (or difference, or standard deviation) in SI, shown in the display unit without the unit. */
  format: (si: number | null | undefined) => string;
  /** Display value typed by the reader back to SI. */
  toSi: (shown: number) => number;
  /** What the colour ramp goes from and to. */
  lowHigh: string;
}

// Decimals at the scale surfaces are read at: whole metres/feet, 0.01 sg/ppg (common practice, no source), tenths of MPa.
const EMW_DIGITS = { sg: 2, ppg: 2, 'kPa/m': 2, 'psi/ft': 3 } as const;
const PRESSURE_DIGITS = { MPa: 2, bar: 1, psi: 0, kPa: 0 } as const;

/**
 * The display of a surface quantity in the reader's units: depths in m/ft, EMW in sg/ppg/kPa/m/psi/ft,
 * overpressure in MPa/bar/psi/kPa.
 * @example surfaceDisplay('emw_at_depth', { depth: 'm', pressure: 'MPa', emw: 'sg' }).format(1250) // '1.25'
 */
export function surfaceDisplay(quantity: SurfaceQuantity, units: UnitPreferences): SurfaceDisplay {
  const kind = SURFACE_QUANTITY_KINDS[quantity];
  let unit: string;
  let factor: number;
  let digits: number;
  let lowHigh: string;
  if (kind === 'emw') {
    unit = units.emw;
    factor = emwIn(1, units.emw);
    digits = EMW_DIGITS[units.emw];
    lowHigh = 'lighter → heavier';
  } else if (kind === 'pressure') {
    unit = units.pressure;
    factor = convert(1, 'Pa', units.pressure);
    digits = PRESSURE_DIGITS[units.pressure];
    lowHigh = 'normal → overpressured';
  } else {
    unit = units.depth;
    factor = units.depth === 'm' ? 1 : convert(1, 'm', units.depth);
    digits = 0;
    lowHigh = 'shallow → deep';
  }
  return {
    unit,
    factor,
    digits,
    format: (si) => (si === null || si === undefined ? formatNumber(si) : formatNumber(si * factor, digits)),
    toSi: (shown) => shown / factor,
    lowHigh,
  };
}
