/**
 * Unit conversion for Porelith. Everything inside the maths is SI (Pa, m, Pa/m, kg/m3, m2, Pa.s,
 * 1/Pa, s); these helpers convert at the edges (import, display, export).
 */
export * from './constants';
export * from './unitTable';
export * from './convert';
