import type { Numeric, NumericArray } from '../units/convert';

/**
 * Input checks shared by the pressure functions, so every function words its errors alike:
 * "<function>: <input>[<index>] must be …". Curves (pressures, logs) may hold NaN for a missing
 * sample, which passes through to NaN in the result; depths and parameters may not.
 */

function isNumericArray(value: unknown): value is NumericArray {
  return Array.isArray(value) || (ArrayBuffer.isView(value) && !(value instanceof DataView));
}

/**
 * The common length of the array inputs, or -1 when every input is a number.
 * Throws when an input is neither, or when two arrays differ in length.
 * @example commonLength('eatonSonic', { overburdenPa: [1, 2], exponent: 3 }) // 2
 */
export function commonLength(fn: string, inputs: Record<string, Numeric | undefined>): number {
  let length = -1;
  let lengthName = '';
  for (const [name, value] of Object.entries(inputs)) {
    if (typeof value === 'number') continue;
    if (!isNumericArray(value)) throw new Error(`${fn}: ${name} must be a number or an array of numbers`);
    if (length === -1) {
      length = value.length;
      lengthName = name;
    } else if (value.length !== length) {
      throw new Error(`${fn}: ${name} has length ${value.length} but ${lengthName} has length ${length}`);
    }
  }
  return length;
}

function label(name: string, input: Numeric, i: number): string {
  return typeof input === 'number' ? name : `${name}[${i}]`;
}

/** What a sample may be: any curve value, a positive one, a non-negative one, or a depth (never NaN). */
export type SampleRule = 'curve' | 'positive' | 'nonNegative' | 'depth' | 'fraction';

/**
 * Sample i of a number-or-array input, checked against `rule`. NaN is returned as is for
 * curve rules (a missing log sample); infinities and out-of-range values throw.
 * @example sampleAt('emw', 'tvdM', [10, -1], 1, 'depth') // throws "emw: tvdM[1] must be >= 0 (got -1)"
 */
export function sampleAt(fn: string, name: string, input: Numeric, i: number, rule: SampleRule): number {
  const v = typeof input === 'number' ? input : input[i];
  if (typeof v !== 'number') throw new Error(`${fn}: ${label(name, input, i)} must be a number (got ${String(v)})`);
  if (Number.isNaN(v) && rule !== 'depth') return v;
  if (!Number.isFinite(v)) throw new Error(`${fn}: ${label(name, input, i)} must be a finite number (got ${v})`);
  if (rule === 'positive' && !(v > 0)) throw new Error(`${fn}: ${label(name, input, i)} must be > 0 (got ${v})`);
  if ((rule === 'nonNegative' || rule === 'depth') && v < 0) {
    throw new Error(`${fn}: ${label(name, input, i)} must be >= 0 (got ${v})`);
  }
  if (rule === 'fraction' && (v < 0 || v > 1)) {
    throw new Error(`${fn}: ${label(name, input, i)} must be between 0 and 1 (got ${v})`);
  }
  return v;
}

/** Bounds for a scalar parameter; `gt`/`lt` are strict, `min`/`max` inclusive. */
export interface ParamBounds {
  gt?: number;
  min?: number;
  lt?: number;
  max?: number;
}

/**
 * A scalar parameter: finite and inside its bounds, else an exact error.
 * @example param('eatonSonic', 'exponent', 0, { gt: 0 }) // throws "eatonSonic: exponent must be > 0 (got 0)"
 */
export function param(fn: string, name: string, value: unknown, bounds: ParamBounds = {}): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`${fn}: ${name} must be a finite number (got ${String(value)})`);
  }
  if (bounds.gt !== undefined && !(value > bounds.gt)) throw new Error(`${fn}: ${name} must be > ${bounds.gt} (got ${value})`);
  if (bounds.min !== undefined && value < bounds.min) throw new Error(`${fn}: ${name} must be >= ${bounds.min} (got ${value})`);
  if (bounds.lt !== undefined && !(value < bounds.lt)) throw new Error(`${fn}: ${name} must be < ${bounds.lt} (got ${value})`);
  if (bounds.max !== undefined && value > bounds.max) throw new Error(`${fn}: ${name} must be <= ${bounds.max} (got ${value})`);
  return value;
}

/**
 * Runs `compute` per sample: a number back when every input was a number, a Float64Array otherwise.
 * `length` is what `commonLength` returned.
 * @example mapSamples(-1, () => 4) // 4; mapSamples(2, (i) => i) // Float64Array [0, 1]
 */
export function mapSamples(length: number, compute: (i: number) => number): number | Float64Array {
  if (length === -1) return compute(0);
  const out = new Float64Array(length);
  for (let i = 0; i < length; i++) out[i] = compute(i);
  return out;
}

/**
 * Depths must be finite, >= 0 and sorted ascending (equal neighbours allowed).
 * @example checkDepths('overburden', 'depthM', [0, 10, 5]) // throws "… must be sorted ascending …"
 */
export function checkDepths(fn: string, name: string, depthM: NumericArray): void {
  for (let i = 0; i < depthM.length; i++) {
    sampleAt(fn, name, depthM, i, 'depth');
    if (i > 0 && depthM[i] < depthM[i - 1]) {
      throw new Error(`${fn}: ${name} must be sorted ascending (${name}[${i}] = ${depthM[i]} after ${depthM[i - 1]})`);
    }
  }
}
