import { FT_M, PSI_PA } from '../units/constants';
import type { Numeric, ResultOf } from '../units/convert';
import { commonLength, mapSamples, param, sampleAt } from './inputs';

/**
 * Bowers (1995), SPE Drilling & Completion 10(2), 89–95 (SPE 27488): V = V0 + A·σ^B, published with V and V0 in
 * ft/s and σ in psi, so A is in (ft/s)/psi^B and B is dimensionless. Every velocity and stress these functions take
 * or return is SI (m/s, Pa), v0Ms and vMaxMs included; only A and B stay in the published units, so calibrations
 * from the paper and from field studies can be typed in unchanged. The conversion to ft/s and psi happens inside.
 * The A = 4.4561, B = 0.8168, U = 3.13 in the examples are Gulf of Mexico calibrations attributed to Bowers (value
 * recalled from memory); A, B and U must be calibrated per basin. See docs/sources.md [bowers1995].
 */
export interface BowersParams {
  /** Velocity at zero effective stress (mudline), m/s. Default 1524 m/s (5000 ft/s, Bowers 1995). */
  v0Ms?: number;
  /** (ft/s)/psi^B: Bowers' published unit, converted inside. */
  A: number;
  /** Dimensionless exponent. */
  B: number;
}

export interface BowersUnloadingParams extends BowersParams {
  /** Velocity where unloading began (the maximum past effective stress), m/s. */
  vMaxMs: number;
  /** Unloading parameter, >= 1; U = 1 retraces the loading curve, larger U is less reversible. */
  U: number;
}

/** Bowers' default mudline velocity, 5000 ft/s, in m/s. */
export const BOWERS_V0_MS = 5000 * FT_M;

/** The parameters in Bowers' units, where the published A and B apply. */
interface Checked {
  v0Ms: number;
  v0FtS: number;
  A: number;
  B: number;
}

function checkParams(fn: string, p: BowersParams): Checked {
  const v0Ms = param(fn, 'v0Ms', p.v0Ms ?? BOWERS_V0_MS, { min: 0 });
  return {
    v0Ms,
    v0FtS: v0Ms / FT_M,
    A: param(fn, 'A', p.A, { gt: 0 }),
    B: param(fn, 'B', p.B, { gt: 0 }),
  };
}

function checkUnloading(fn: string, p: BowersUnloadingParams): Checked & { sigmaMaxPsi: number; vMaxFtS: number; U: number } {
  const c = checkParams(fn, p);
  const vMaxMs = param(fn, 'vMaxMs', p.vMaxMs, { gt: 0 });
  if (!(vMaxMs > c.v0Ms)) throw new Error(`${fn}: vMaxMs must exceed v0Ms (got ${vMaxMs} m/s, v0Ms ${c.v0Ms} m/s)`);
  const U = param(fn, 'U', p.U, { min: 1 });
  const vMaxFtS = vMaxMs / FT_M;
  return { ...c, vMaxFtS, U, sigmaMaxPsi: ((vMaxFtS - c.v0FtS) / c.A) ** (1 / c.B) };
}

/** Effective stress on the virgin curve for a velocity; zero at or below V0, where the grains carry no load. */
function virginStressPsi(vFtS: number, c: Checked): number {
  return vFtS <= c.v0FtS ? 0 : ((vFtS - c.v0FtS) / c.A) ** (1 / c.B);
}

/**
 * Velocity on the loading (virgin compaction) curve, V = V0 + A·σ^B, m/s.
 * @example
 * bowersVelocityLoading(20e6, { A: 4.4561, B: 0.8168 }); // m/s at 20 MPa effective stress
 */
export function bowersVelocityLoading<S extends Numeric>(sigmaPa: S, params: BowersParams): ResultOf<S> {
  const fn = 'bowersVelocityLoading';
  const c = checkParams(fn, params);
  const n = commonLength(fn, { sigmaPa });
  return mapSamples(n, (i) => {
    const sigmaPsi = sampleAt(fn, 'sigmaPa', sigmaPa, i, 'nonNegative') / PSI_PA;
    return (c.v0FtS + c.A * sigmaPsi ** c.B) * FT_M;
  }) as ResultOf<S>;
}

/**
 * Velocity on the unloading curve, V = V0 + A·[σmax·(σ/σmax)^(1/U)]^B with σmax = ((Vmax − V0)/A)^(1/B),
 * m/s. At σ >= σmax the rock is back on the virgin curve and the loading velocity is returned.
 * @example
 * bowersVelocityUnloading(10e6, { A: 4.4561, B: 0.8168, vMaxMs: 3000, U: 3.13 });
 */
export function bowersVelocityUnloading<S extends Numeric>(sigmaPa: S, params: BowersUnloadingParams): ResultOf<S> {
  const fn = 'bowersVelocityUnloading';
  const c = checkUnloading(fn, params);
  const n = commonLength(fn, { sigmaPa });
  return mapSamples(n, (i) => {
    const sigmaPsi = sampleAt(fn, 'sigmaPa', sigmaPa, i, 'nonNegative') / PSI_PA;
    const onCurve = sigmaPsi >= c.sigmaMaxPsi ? sigmaPsi : c.sigmaMaxPsi * (sigmaPsi / c.sigmaMaxPsi) ** (1 / c.U);
    return (c.v0FtS + c.A * onCurve ** c.B) * FT_M;
  }) as ResultOf<S>;
}

export interface BowersLoadingInput extends BowersParams {
  overburdenPa: Numeric;
  velocityMs: Numeric;
}

/**
 * Pore pressure from velocity on the loading curve: σ = ((V − V0)/A)^(1/B), P = S − σ (Pa).
 * A velocity at or below V0 means zero effective stress, so P = S there.
 * @example
 * bowersLoading({ overburdenPa: 60e6, velocityMs: 3000, A: 4.4561, B: 0.8168 });
 */
export function bowersLoading<I extends BowersLoadingInput>(input: I): ResultOf<I['overburdenPa'] | I['velocityMs']> {
  const fn = 'bowersLoading';
  const c = checkParams(fn, input);
  const { overburdenPa, velocityMs } = input;
  const n = commonLength(fn, { overburdenPa, velocityMs });
  return mapSamples(n, (i) => {
    const s = sampleAt(fn, 'overburdenPa', overburdenPa, i, 'curve');
    const vFtS = sampleAt(fn, 'velocityMs', velocityMs, i, 'positive') / FT_M;
    return s - virginStressPsi(vFtS, c) * PSI_PA;
  }) as ResultOf<I['overburdenPa'] | I['velocityMs']>;
}

export interface BowersUnloadingInput extends BowersUnloadingParams {
  overburdenPa: Numeric;
  velocityMs: Numeric;
}

/**
 * Pore pressure from velocity on the unloading curve: σ = σmax·(σ_vc/σmax)^U, where σ_vc is the
 * virgin-curve stress for that velocity; P = S − σ (Pa). Velocities at or above vMaxMs use the loading curve.
 * @example
 * bowersUnloading({ overburdenPa: 60e6, velocityMs: 2800, A: 4.4561, B: 0.8168, vMaxMs: 3000, U: 3.13 });
 */
export function bowersUnloading<I extends BowersUnloadingInput>(input: I): ResultOf<I['overburdenPa'] | I['velocityMs']> {
  const fn = 'bowersUnloading';
  const c = checkUnloading(fn, input);
  const { overburdenPa, velocityMs } = input;
  const n = commonLength(fn, { overburdenPa, velocityMs });
  return mapSamples(n, (i) => {
    const s = sampleAt(fn, 'overburdenPa', overburdenPa, i, 'curve');
    const vFtS = sampleAt(fn, 'velocityMs', velocityMs, i, 'positive') / FT_M;
    const virgin = virginStressPsi(vFtS, c);
    const sigmaPsi = vFtS >= c.vMaxFtS ? virgin : c.sigmaMaxPsi * (virgin / c.sigmaMaxPsi) ** c.U;
    return s - sigmaPsi * PSI_PA;
  }) as ResultOf<I['overburdenPa'] | I['velocityMs']>;
}
