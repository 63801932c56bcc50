/**
 * Porelith's well pressure profile: one pure builder that the page and the server's exports share.
 * Depths are TVD below the rig datum, m; pressures Pa; densities kg/m³ (SI inside, conversions at the edges).
 */
export * from './datums';
export * from './interpolate';
export * from './smooth';
export * from './logGrid';
export * from './trend';
export * from './methods';
export * from './calibration';
export * from './calibrate';
export * from './window';
export * from './buildProfile';
export * from './csv';
export * from './describe';
export * from './atDepth';
