import { bowersLoading, bowersUnloading } from '../pressure/bowers';
import { eatonResistivity, eatonSonic } from '../pressure/eaton';
import { fractureEaton, fractureMatthewsKelly } from '../pressure/fracture';
import { FT_M } from '../units/constants';

/** Pore-pressure method and parameters as the interpretation stores them. */
export type PoreSettings = (
  | { method: 'eaton-sonic'; exponent: number }
  | { method: 'eaton-resistivity'; exponent: number }
  | {
      method: 'bowers';
      /** Mudline velocity, ft/s, as stored and shown beside A (Bowers' published unit); converted to m/s for the method. */
      v0: number;
      /** (ft/s)/psi^B (Bowers' published unit). */
      A: number;
      B: number;
      unloading: { vMaxMs: number; U: number } | null;
    }
) & {
  /** Running-median window over the log before the method, m; 0 or absent: every reading as logged. */
  smoothingM?: number;
};

/** Each pore-pressure method's name in notes and tables, and its label where a user chooses it (with its source). */
export const PORE_METHOD_LABELS: Record<PoreSettings['method'], { short: string; choice: string }> = {
  'eaton-sonic': { short: 'Eaton (sonic)', choice: 'Eaton, sonic (Eaton 1975)' },
  'eaton-resistivity': { short: 'Eaton (resistivity)', choice: 'Eaton, resistivity (Eaton 1975)' },
  bowers: { short: 'Bowers', choice: 'Bowers, velocity–effective stress (Bowers 1995)' },
};

/** Fracture-pressure method as the interpretation stores it. */
export type FractureSettings =
  { method: 'eaton'; poissonTop: number; poissonGradientPerKm: number } | { method: 'matthews-kelly'; ki: number };

/**
 * Running-median window for new interpretations, m: long enough to take out spikes and thin beds, short against a
 * pressure ramp (common practice, no source).
 */
export const DEFAULT_SMOOTHING_M = 20;

/** Published defaults: Eaton (1975, SPE 5544) exponents 3 (sonic) and 1.2 (resistivity). */
export const EATON_DEFAULT_EXPONENT = { sonic: 3, resistivity: 1.2 } as const;

/**
 * Starting Bowers coefficients: Gulf of Mexico calibration attributed to Bowers 1995 (value recalled from memory);
 * U = 3.13 likewise. They must be calibrated per basin.
 */
export const BOWERS_STARTING = { v0: 5000, A: 4.4561, B: 0.8168, U: 3.13 } as const;

/**
 * The starting settings of a pore-pressure method: Eaton's published exponent, or Bowers' generic coefficients
 * without unloading; the log smoothing carries over from the settings being replaced, else the default.
 * @example startingPore('eaton-resistivity'); // { method: 'eaton-resistivity', exponent: 1.2, smoothingM: 20 }
 */
export function startingPore(
  method: PoreSettings['method'],
  previous?: { smoothingM?: number } | null,
): PoreSettings & { smoothingM: number } {
  const smoothingM = previous?.smoothingM ?? DEFAULT_SMOOTHING_M;
  if (method === 'eaton-sonic') return { method, exponent: EATON_DEFAULT_EXPONENT.sonic, smoothingM };
  if (method === 'eaton-resistivity') return { method, exponent: EATON_DEFAULT_EXPONENT.resistivity, smoothingM };
  return { method, v0: BOWERS_STARTING.v0, A: BOWERS_STARTING.A, B: BOWERS_STARTING.B, unloading: null, smoothingM };
}

/** Poisson's ratio is kept below 0.5 (incompressible), where Eaton's ν/(1 − ν) would blow up. */
const POISSON_MAX = 0.499;

/**
 * Velocity in m/s from slowness in µs/ft: V[ft/s] = 10⁶/Δt.
 * @example velocityFromSlowness(100); // 3048 m/s
 */
export function velocityFromSlowness(slownessUsFt: number): number {
  return slownessUsFt > 0 ? (1e6 / slownessUsFt) * FT_M : NaN;
}

export interface PoreInputs {
  overburdenPa: Float64Array;
  normalPa: Float64Array;
  /** The log the method reads (sonic µs/ft or resistivity ohm·m), NaN where it is not to be used. */
  log: Float64Array;
  /** The normal-trend value of that log (Eaton only). */
  trend: Float64Array | null;
}

/**
 * Pore pressure on every sample by the chosen method, NaN where the log is NaN.
 * @example porePressure({ method: 'eaton-sonic', exponent: 3 }, { overburdenPa, normalPa, log: dt, trend: dtn });
 */
export function porePressure(settings: PoreSettings, inputs: PoreInputs): Float64Array {
  const { overburdenPa, normalPa, log, trend } = inputs;
  if (settings.method === 'bowers') {
    const velocityMs = log.map(velocityFromSlowness);
    const common = { overburdenPa, velocityMs, v0Ms: settings.v0 * FT_M, A: settings.A, B: settings.B };
    return settings.unloading
      ? bowersUnloading({ ...common, vMaxMs: settings.unloading.vMaxMs, U: settings.unloading.U })
      : bowersLoading(common);
  }
  if (!trend) throw new Error(`porePressure: ${settings.method} needs a normal compaction trend`);
  return settings.method === 'eaton-sonic'
    ? eatonSonic({ overburdenPa, normalPa, normalSlowness: trend, observedSlowness: log, exponent: settings.exponent })
    : eatonResistivity({ overburdenPa, normalPa, normalResistivity: trend, observedResistivity: log, exponent: settings.exponent });
}

/**
 * Poisson's ratio on each sample, ν = top + gradient·(depth below mudline in km), held within 0 … 0.499.
 * @example poissonProfile(0.3, 0.05, [0, 2000], 0); // Float64Array [0.3, 0.4]
 */
export function poissonProfile(poissonTop: number, gradientPerKm: number, tvdM: ArrayLike<number>, mudlineTvdM: number): Float64Array {
  return Float64Array.from(tvdM, (z) =>
    Math.min(POISSON_MAX, Math.max(0, poissonTop + (gradientPerKm * Math.max(0, z - mudlineTvdM)) / 1000)),
  );
}

/**
 * Fracture pressure by Eaton (1969) with a Poisson's ratio profile, or Matthews & Kelly (1967) with a
 * constant matrix-stress coefficient. NaN where the pore pressure is NaN.
 * @example fracturePressure({ method: 'matthews-kelly', ki: 0.7 }, { overburdenPa, porePa, tvdM, mudlineTvdM });
 */
export function fracturePressure(
  settings: FractureSettings,
  inputs: { overburdenPa: Float64Array; porePa: Float64Array; tvdM: ArrayLike<number>; mudlineTvdM: number },
): Float64Array {
  const { overburdenPa, porePa } = inputs;
  if (settings.method === 'matthews-kelly') return fractureMatthewsKelly({ overburdenPa, porePa, ki: settings.ki });
  const poisson = poissonProfile(settings.poissonTop, settings.poissonGradientPerKm, inputs.tvdM, inputs.mudlineTvdM);
  return fractureEaton({ overburdenPa, porePa, poisson });
}
