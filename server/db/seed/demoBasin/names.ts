/**
 * Every name in the demo basin is invented and marked synthetic: no real basin, field, company or person.
 * Each operator enters its numbers in its own units, as real operators do, so imports and displays meet
 * oilfield and metric units side by side.
 */

export const BASIN_NAME = 'Ardvane Basin (synthetic)';
export const BASIN_DESCRIPTION =
  'An invented offshore deltaic basin in open South Pacific ocean, generated from the pressure physics for demonstration; not real data.';

export type PressureEntryUnit = 'psi' | 'kPa' | 'bar' | 'MPa';
export type MudEntryUnit = 'ppg' | 'sg' | 'kg/m3';

export interface DemoOperator {
  name: string;
  /** Unit in which it reports formation pressures and kicks. */
  pressureUnit: PressureEntryUnit;
  /** Unit in which it reports mud weights, leak-off tests and losses. */
  mudUnit: MudEntryUnit;
  /** Log index: metres at 1 m, or feet at 0.5 ft. */
  logDepthUnit: 'm' | 'ft';
}

export const DEMO_OPERATORS: readonly DemoOperator[] = [
  { name: 'Quillmere Petroleum (synthetic)', pressureUnit: 'psi', mudUnit: 'ppg', logDepthUnit: 'm' },
  { name: 'Osmerly Energy (synthetic)', pressureUnit: 'kPa', mudUnit: 'sg', logDepthUnit: 'm' },
  { name: 'Keldrith Offshore (synthetic)', pressureUnit: 'bar', mudUnit: 'sg', logDepthUnit: 'm' },
  { name: 'Varnholt Exploration (synthetic)', pressureUnit: 'psi', mudUnit: 'ppg', logDepthUnit: 'ft' },
  { name: 'Sorrelgate Oil & Gas (synthetic)', pressureUnit: 'MPa', mudUnit: 'kg/m3', logDepthUnit: 'm' },
];

/** Invented field names; their wells are "<Field>-<n>". Exploration wells between fields are "AVX-<nn>". */
export const DEMO_FIELDS: readonly { name: string; operator: number; centreM: { xM: number; yM: number }; wells: number }[] = [
  { name: 'Merrowick', operator: 0, centreM: { xM: 4_000, yM: -2_000 }, wells: 8 },
  { name: 'Tolsey', operator: 1, centreM: { xM: -16_000, yM: 8_000 }, wells: 7 },
  { name: 'Carrabel', operator: 2, centreM: { xM: 18_000, yM: -14_000 }, wells: 6 },
  { name: 'Dunfrith', operator: 3, centreM: { xM: -26_000, yM: -12_000 }, wells: 6 },
  { name: 'Yelvan', operator: 4, centreM: { xM: 24_000, yM: 14_000 }, wells: 6 },
  { name: 'Quorran', operator: 0, centreM: { xM: -4_000, yM: 20_000 }, wells: 5 },
];

/** Exploration wells fill the total up to this count. */
export const DEMO_WELL_COUNT = 60;
export const EXPLORATION_PREFIX = 'AVX';

/**
 * Invented UWI: "AVB" (Ardvane Block), the operator block, a four-digit serial, and a sidetrack suffix.
 * @example demoUwi(2, 37); // 'AVB-03-0037-00'
 */
export function demoUwi(operatorIndex: number, serial: number): string {
  return `AVB-${String(operatorIndex + 1).padStart(2, '0')}-${String(serial).padStart(4, '0')}-00`;
}
