import { DARCY_M2, FT_M, G, MYR_S, PPG_KGM3, PSI_PA, SG_KGM3, YEAR_S } from './constants';

/**
 * Units offered per quantity, in the order a picker should show them.
 * ppg, sg and g/cc appear under both `gradient` (as equivalent mud weight) and `density`:
 * they are the same physical thing, turned into a gradient by multiplying with standard gravity.
 */
export const UNITS_BY_QUANTITY = {
  pressure: ['Pa', 'kPa', 'MPa', 'bar', 'psi'],
  depth: ['m', 'ft'],
  gradient: ['Pa/m', 'kPa/m', 'MPa/km', 'psi/ft', 'ppg', 'sg', 'g/cc'],
  density: ['kg/m3', 'g/cc', 'ppg', 'sg'],
  permeability: ['m2', 'D', 'mD', 'nD'],
  viscosity: ['Pa.s', 'cP'],
  compressibility: ['1/Pa', '1/MPa', '1/psi'],
  slowness: ['us/ft', 'us/m'],
  velocity: ['m/s', 'ft/s'],
  time: ['s', 'yr', 'Myr'],
} as const;

export type Quantity = keyof typeof UNITS_BY_QUANTITY;
export type PressureUnit = (typeof UNITS_BY_QUANTITY.pressure)[number];
export type DepthUnit = (typeof UNITS_BY_QUANTITY.depth)[number];
export type GradientUnit = (typeof UNITS_BY_QUANTITY.gradient)[number];
export type DensityUnit = (typeof UNITS_BY_QUANTITY.density)[number];
export type PermeabilityUnit = (typeof UNITS_BY_QUANTITY.permeability)[number];
export type ViscosityUnit = (typeof UNITS_BY_QUANTITY.viscosity)[number];
export type CompressibilityUnit = (typeof UNITS_BY_QUANTITY.compressibility)[number];
export type SlownessUnit = (typeof UNITS_BY_QUANTITY.slowness)[number];
export type VelocityUnit = (typeof UNITS_BY_QUANTITY.velocity)[number];
export type TimeUnit = (typeof UNITS_BY_QUANTITY.time)[number];
/** Every unit name `convert` knows. */
export type UnitName = (typeof UNITS_BY_QUANTITY)[Quantity][number];

export const PRESSURE_UNITS = UNITS_BY_QUANTITY.pressure;
export const DEPTH_UNITS = UNITS_BY_QUANTITY.depth;
export const GRADIENT_UNITS = UNITS_BY_QUANTITY.gradient;
export const DENSITY_UNITS = UNITS_BY_QUANTITY.density;
export const PERMEABILITY_UNITS = UNITS_BY_QUANTITY.permeability;
export const VISCOSITY_UNITS = UNITS_BY_QUANTITY.viscosity;
export const COMPRESSIBILITY_UNITS = UNITS_BY_QUANTITY.compressibility;
export const SLOWNESS_UNITS = UNITS_BY_QUANTITY.slowness;
export const VELOCITY_UNITS = UNITS_BY_QUANTITY.velocity;
export const TIME_UNITS = UNITS_BY_QUANTITY.time;

/**
 * Physical dimension of a unit. Density and gradient share one dimension (base Pa/m) because an
 * equivalent density ρ is the gradient ρ·g; that is what lets ppg convert to psi/ft and kg/m3 alike.
 */
export type Dimension =
  'pressure' | 'length' | 'gradient' | 'permeability' | 'viscosity' | 'compressibility' | 'slowness' | 'velocity' | 'time';

/** How many base units (Pa, m, Pa/m, m2, Pa.s, 1/Pa, us/m, m/s, s) one of this unit is. */
export const UNIT_TABLE: Readonly<Record<UnitName, { dimension: Dimension; toBase: number }>> = {
  Pa: { dimension: 'pressure', toBase: 1 },
  kPa: { dimension: 'pressure', toBase: 1e3 },
  MPa: { dimension: 'pressure', toBase: 1e6 },
  bar: { dimension: 'pressure', toBase: 1e5 },
  psi: { dimension: 'pressure', toBase: PSI_PA },
  m: { dimension: 'length', toBase: 1 },
  ft: { dimension: 'length', toBase: FT_M },
  'Pa/m': { dimension: 'gradient', toBase: 1 },
  'kPa/m': { dimension: 'gradient', toBase: 1e3 },
  'MPa/km': { dimension: 'gradient', toBase: 1e3 },
  'psi/ft': { dimension: 'gradient', toBase: PSI_PA / FT_M },
  ppg: { dimension: 'gradient', toBase: PPG_KGM3 * G },
  sg: { dimension: 'gradient', toBase: SG_KGM3 * G },
  'g/cc': { dimension: 'gradient', toBase: 1000 * G },
  'kg/m3': { dimension: 'gradient', toBase: G },
  m2: { dimension: 'permeability', toBase: 1 },
  D: { dimension: 'permeability', toBase: DARCY_M2 },
  mD: { dimension: 'permeability', toBase: DARCY_M2 * 1e-3 },
  nD: { dimension: 'permeability', toBase: DARCY_M2 * 1e-9 },
  'Pa.s': { dimension: 'viscosity', toBase: 1 },
  cP: { dimension: 'viscosity', toBase: 1e-3 },
  '1/Pa': { dimension: 'compressibility', toBase: 1 },
  '1/MPa': { dimension: 'compressibility', toBase: 1e-6 },
  '1/psi': { dimension: 'compressibility', toBase: 1 / PSI_PA },
  'us/m': { dimension: 'slowness', toBase: 1 },
  'us/ft': { dimension: 'slowness', toBase: 1 / FT_M },
  'm/s': { dimension: 'velocity', toBase: 1 },
  'ft/s': { dimension: 'velocity', toBase: FT_M },
  s: { dimension: 'time', toBase: 1 },
  yr: { dimension: 'time', toBase: YEAR_S },
  Myr: { dimension: 'time', toBase: MYR_S },
};
