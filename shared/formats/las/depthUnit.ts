import type { DepthUnit } from './types';

/** Metres per international foot, exact by definition (International Yard and Pound Agreement, 1959). */
export const METRES_PER_FOOT = 0.3048;

const METRE_SPELLINGS = new Set(['M', 'METER', 'METERS', 'METRE', 'METRES']);
const FOOT_SPELLINGS = new Set(['F', 'FT', 'FEET', 'FOOT']);

/**
 * The LAS 2.0 depth units are M, F and FT (CWLS LAS 2.0, §5.4); spelled-out forms are accepted too.
 * Returns null for anything else (a time index, an unknown unit).
 *
 * @example
 * normaliseDepthUnit('FT'); // → 'ft'
 * normaliseDepthUnit('S');  // → null
 */
export function normaliseDepthUnit(unit: string): DepthUnit | null {
  const key = unit.trim().toUpperCase();
  if (METRE_SPELLINGS.has(key)) return 'm';
  if (FOOT_SPELLINGS.has(key)) return 'ft';
  return null;
}

/**
 * Depths in metres; a new array.
 *
 * @example
 * depthsInMetres(new Float64Array([1000]), 'ft'); // → Float64Array [304.8]
 */
export function depthsInMetres(values: Float64Array, unit: DepthUnit): Float64Array {
  if (unit === 'm') return values.slice();
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = values[i] * METRES_PER_FOOT;
  return out;
}
