import { MYR_S, YEAR_S } from '../units/constants';
import type { Numeric, ResultOf } from '../units/convert';
import { gibsonExcessRatio } from './gibson';
import { commonLength, mapSamples, param, sampleAt } from './inputs';

export interface DiffusionTimeInput {
  /** Porosity, fraction. */
  porosity: Numeric;
  /** Pore-fluid compressibility β_f, 1/Pa. */
  fluidCompressibilityPerPa: Numeric;
  /** Pore-volume (rock) compressibility β_r, 1/Pa. */
  rockCompressibilityPerPa: Numeric;
  /** Fluid viscosity η, Pa.s. */
  viscosityPaS: Numeric;
  /** Drainage length L, m. */
  lengthM: Numeric;
  permeabilityM2: Numeric;
}

/**
 * Pressure-diffusion time τ = (φβ_f + β_r)·η·L²/k = L²/c_v, in seconds: Darcy flow with specific
 * storage S_s = φβ_f + β_r and hydraulic diffusivity c_v = k/(η·S_s).
 * @example
 * // 100 m of 10 nD shale: ≈ 1.1e12 s ≈ 35,000 years
 * diffusionTime({ porosity: 0.2, fluidCompressibilityPerPa: 4.5e-10, rockCompressibilityPerPa: 1e-9,
 *                 viscosityPaS: 1e-3, lengthM: 100, permeabilityM2: 9.869233e-21 });
 */
export function diffusionTime<I extends DiffusionTimeInput>(input: I): ResultOf<I[keyof I]> {
  const fn = 'diffusionTime';
  const { porosity, fluidCompressibilityPerPa, rockCompressibilityPerPa, viscosityPaS, lengthM, permeabilityM2 } = input;
  const n = commonLength(fn, { porosity, fluidCompressibilityPerPa, rockCompressibilityPerPa, viscosityPaS, lengthM, permeabilityM2 });
  return mapSamples(n, (i) => {
    const phi = sampleAt(fn, 'porosity', porosity, i, 'fraction');
    const bf = sampleAt(fn, 'fluidCompressibilityPerPa', fluidCompressibilityPerPa, i, 'nonNegative');
    const br = sampleAt(fn, 'rockCompressibilityPerPa', rockCompressibilityPerPa, i, 'nonNegative');
    const eta = sampleAt(fn, 'viscosityPaS', viscosityPaS, i, 'positive');
    const L = sampleAt(fn, 'lengthM', lengthM, i, 'nonNegative');
    const k = sampleAt(fn, 'permeabilityM2', permeabilityM2, i, 'positive');
    return ((phi * bf + br) * eta * L * L) / k;
  }) as ResultOf<I[keyof I]>;
}

export type CompactionVerdict = 'likely-retained' | 'transitional' | 'likely-drained';

export interface CompactionScreenInput {
  /** Sedimentation rate m, metres per million (Julian) years. */
  sedimentationRateMPerMyr: number;
  /** Thickness h of the layer deposited on an impermeable base, m; also the drainage length. */
  thicknessM: number;
  permeabilityM2: number;
  /** Porosity, fraction. */
  porosity: number;
  /** 1/Pa; default 4.5e-10 (water). */
  fluidCompressibilityPerPa?: number;
  /** 1/Pa; default 1e-9, the soft end of 1e-10 … 1e-9 for young mud. */
  rockCompressibilityPerPa?: number;
  /** Pa.s; default 1e-3 (water). */
  viscosityPaS?: number;
  /** Relative height where the excess ratio is reported, 0 (base, where it is largest) … 1; default 0. */
  zeta?: number;
}

/** Defaults for `compactionScreen` (typical values, docs/sources.md [diffusion]; common practice, no source). */
export const COMPACTION_SCREEN_DEFAULTS = {
  fluidCompressibilityPerPa: 4.5e-10,
  rockCompressibilityPerPa: 1e-9,
  viscosityPaS: 1e-3,
  zeta: 0,
} as const;

/** Gibson's (1958) regimes: T ≲ 0.1 stays near hydrostatic, T ≳ 1 keeps a large excess. */
export const GIBSON_T_DRAINED = 0.1;
export const GIBSON_T_RETAINED = 1;

export interface CompactionScreen {
  /** Diffusion time of the layer, τ = h²/c_v, years. */
  tauYears: number;
  /** Time to deposit it, h/m, years. */
  burialYears: number;
  /** Gibson's T = m²t/c_v = m·h/c_v = τ/t_burial. */
  T: number;
  /** u/(γ′h) at `zeta`. */
  excessRatio: number;
  /** Consolidation coefficient c_v = k/(η·S_s), m²/s. */
  cvM2PerS: number;
  /** Specific storage S_s = φβ_f + β_r, 1/Pa. */
  storagePerPa: number;
  /** 'likely-drained' for T <= 0.1, 'likely-retained' for T >= 1, else 'transitional'. */
  verdict: CompactionVerdict;
}

/**
 * Disequilibrium-compaction screen: could a layer buried at this rate keep its pore fluid?
 * Compares burial time with pressure-diffusion time through Gibson's T and reports his excess ratio.
 * @example
 * compactionScreen({ sedimentationRateMPerMyr: 500, thicknessM: 2000, permeabilityM2: 1e-20, porosity: 0.3 });
 * // { T ≈ 3.6, verdict: 'likely-retained', … }
 */
export function compactionScreen(input: CompactionScreenInput): CompactionScreen {
  const fn = 'compactionScreen';
  const rate = param(fn, 'sedimentationRateMPerMyr', input.sedimentationRateMPerMyr, { gt: 0 });
  const h = param(fn, 'thicknessM', input.thicknessM, { gt: 0 });
  const k = param(fn, 'permeabilityM2', input.permeabilityM2, { gt: 0 });
  const phi = param(fn, 'porosity', input.porosity, { min: 0, max: 1 });
  const bf = param(
    fn,
    'fluidCompressibilityPerPa',
    input.fluidCompressibilityPerPa ?? COMPACTION_SCREEN_DEFAULTS.fluidCompressibilityPerPa,
    { min: 0 },
  );
  const br = param(fn, 'rockCompressibilityPerPa', input.rockCompressibilityPerPa ?? COMPACTION_SCREEN_DEFAULTS.rockCompressibilityPerPa, {
    min: 0,
  });
  const eta = param(fn, 'viscosityPaS', input.viscosityPaS ?? COMPACTION_SCREEN_DEFAULTS.viscosityPaS, { gt: 0 });
  const zeta = param(fn, 'zeta', input.zeta ?? COMPACTION_SCREEN_DEFAULTS.zeta, { min: 0, max: 1 });
  const storagePerPa = phi * bf + br;
  if (!(storagePerPa > 0)) throw new Error(`${fn}: storage φβf + βr must be > 0 (got ${storagePerPa})`);

  const cvM2PerS = k / (eta * storagePerPa);
  const rateMPerS = rate / MYR_S;
  const burialS = h / rateMPerS;
  const tauS = (h * h) / cvM2PerS;
  const T = (rateMPerS * rateMPerS * burialS) / cvM2PerS;
  const verdict: CompactionVerdict = T <= GIBSON_T_DRAINED ? 'likely-drained' : T >= GIBSON_T_RETAINED ? 'likely-retained' : 'transitional';
  return {
    tauYears: tauS / YEAR_S,
    burialYears: burialS / YEAR_S,
    T,
    excessRatio: gibsonExcessRatio({ T, zeta }),
    cvM2PerS,
    storagePerPa,
    verdict,
  };
}
