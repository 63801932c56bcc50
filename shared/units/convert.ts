import { UNIT_TABLE, type UnitName } from './unitTable';

/** Plain arrays and typed arrays are both accepted wherever a curve is. */
export type NumericArray = ArrayLike<number>;
export type Numeric = number | NumericArray;
/** A number when every numeric input is a number, a Float64Array as soon as one is an array. */
export type ResultOf<U> = [Extract<U, NumericArray>] extends [never] ? number : Float64Array;

/**
 * Whether `name` is a unit `convert` knows (exact spelling, case-sensitive: mD is not MD).
 * @example isUnitName('psi/ft') // true
 */
export function isUnitName(name: string): name is UnitName {
  return Object.prototype.hasOwnProperty.call(UNIT_TABLE, name);
}

function lookUp(name: string) {
  if (!isUnitName(name)) throw new Error(`Unknown unit "${name}"`);
  return UNIT_TABLE[name];
}

/**
 * The factor f with value[toUnit] = f · value[fromUnit].
 * @example unitFactor('ft', 'm') // 0.3048
 */
export function unitFactor(fromUnit: UnitName | (string & {}), toUnit: UnitName | (string & {})): number {
  const from = lookUp(fromUnit);
  const to = lookUp(toUnit);
  if (from.dimension !== to.dimension) throw new Error(`Cannot convert "${fromUnit}" to "${toUnit}"`);
  return from.toBase === to.toBase ? 1 : from.toBase / to.toBase;
}

/**
 * Converts a number or a curve between units of the same dimension. Equivalent densities
 * (ppg, sg, g/cc, kg/m3) and gradients (Pa/m, kPa/m, psi/ft) interconvert through g = 9.80665.
 * NaN samples stay NaN: a missing log value is not an error.
 * @example
 * convert(1, 'psi', 'Pa');          // 6894.757293168361
 * convert(10, 'ppg', 'psi/ft');     // 0.519480…
 * convert([1000, 2000], 'm', 'ft'); // Float64Array [3280.84…, 6561.68…]
 */
export function convert<V extends Numeric>(value: V, fromUnit: UnitName | (string & {}), toUnit: UnitName | (string & {})): ResultOf<V> {
  const from = lookUp(fromUnit);
  const to = lookUp(toUnit);
  if (from.dimension !== to.dimension) throw new Error(`Cannot convert "${fromUnit}" to "${toUnit}"`);
  // Through the base unit, (v·from)/to, so that conversions to or from a base unit round once
  // (0.3048 m is exactly 1 ft); units sharing a base factor (kPa/m, MPa/km) pass values untouched.
  const same = from.toBase === to.toBase;
  const one = (v: number) => (same ? v : (v * from.toBase) / to.toBase);
  if (typeof value === 'number') return one(value) as ResultOf<V>;
  const values = value as NumericArray;
  const out = new Float64Array(values.length);
  for (let i = 0; i < values.length; i++) out[i] = one(values[i]);
  return out as ResultOf<V>;
}
