/**
 * Porelith pressure physics: hydrostatics, overburden, compaction trends, pore pressure from logs
 * (Eaton, Bowers), fracture pressure, top of overpressure and disequilibrium-compaction screening.
 *
 * Conventions shared by every function here:
 * - SI inside: Pa, m, kg/m3, m/s, 1/Pa, m2, Pa.s, s; names carry the unit (`depthM`, `porePa`).
 *   Coefficients of published empirical laws keep their published units where stated (Bowers).
 * - Curves may be `number[]` or `Float64Array`; where a function takes "number or array", it returns a
 *   number when all such inputs are numbers and a Float64Array otherwise; arrays must share one length.
 * - NaN in a curve (a missing log sample) passes through as NaN; NaN or negative depths, infinities,
 *   unsorted depths, mismatched lengths and out-of-range parameters throw an Error whose message
 *   starts with the function name, e.g. "eatonSonic: exponent must be > 0 (got 0)".
 */
export * from '../units';
export * from './hydrostatic';
export * from './overburden';
export * from './density';
export * from './normalTrend';
export * from './eaton';
export * from './bowers';
export * from './fracture';
export * from './topOfOverpressure';
export * from './compaction';
export * from './gibson';
