import type { CurveRole } from '../../../../shared/schemas/wells';
import { atTvd, type PressureColumn } from './physics';
import type { Rng } from './prng';

/**
 * Synthetic logs that a pore-pressure method can invert: each shale sample is built by inverting
 * Eaton's (1975, SPE 5544) relations on the column's pressures, so Eaton with the normal trends below
 * gives back the column's pore pressure exactly when noise and sands are off.
 */
export const DEMO_TRENDS = {
  /** Δt_n(z) = Δt_m + (Δt_ml − Δt_m)·exp(−c·z), z below the mudline, µs/ft (invented basin values). */
  sonic: { matrixUsFt: 60, mudlineUsFt: 190, cPerM: 4.5e-4, exponent: 3 },
  /** log10 R_n(z) = log10(mudline) + slope·z, z below the mudline, ohm·m (Hottmann & Johnson 1965 form). */
  resistivity: { mudlineOhmM: 0.7, log10PerM: 1.2e-4, exponent: 1.2 },
  /** Shale gamma ray, API: a slow rise with depth; sands read much lower. */
  gammaShaleApi: { shallow: 88, deep: 98, scaleM: 1500 },
  gammaSandApi: 42,
  /** Sands are faster (Δt × this) and, brine-filled, more conductive (R × this) than the shale around them. */
  sandSonicFactor: 0.86,
  sandResistivityFactor: 0.6,
} as const;

/**
 * Normal-compaction sonic slowness, µs/ft, at a depth below the mudline.
 * @example normalSlownessUsFt(0); // 190
 */
export function normalSlownessUsFt(depthBelowMudlineM: number): number {
  const t = DEMO_TRENDS.sonic;
  return t.matrixUsFt + (t.mudlineUsFt - t.matrixUsFt) * Math.exp(-t.cPerM * depthBelowMudlineM);
}

/**
 * Normal-compaction shale resistivity, ohm·m, at a depth below the mudline.
 * @example normalResistivityOhmM(0); // 0.7
 */
export function normalResistivityOhmM(depthBelowMudlineM: number): number {
  const t = DEMO_TRENDS.resistivity;
  return t.mudlineOhmM * 10 ** (t.log10PerM * depthBelowMudlineM);
}

/** A sand bed, TVD below the rig datum, m. */
export interface SandBed {
  topTvdM: number;
  baseTvdM: number;
  formation: string;
}

export interface LogCurve {
  mnemonic: string;
  unit: string;
  description: string;
  role: CurveRole;
  values: Float64Array;
}

/** What the logs were built from at each sample, for tests and for the truth of the demo. */
export interface LogSamples {
  mdM: Float64Array;
  tvdM: Float64Array;
  overburdenPa: Float64Array;
  normalPa: Float64Array;
  porePa: Float64Array;
}

export interface LogOptions {
  /** Measurement noise and value rounding (default true); off gives exact Eaton inverses. */
  noise?: boolean;
  /** Sand beds on GR, DT and resistivity (default true). */
  sands?: boolean;
}

/** Share of sand at a TVD: 1 inside a bed, with 1 m ramps at its edges for the tools' vertical resolution. */
function sandFraction(beds: readonly SandBed[], tvdM: number): number {
  let v = 0;
  for (const b of beds) {
    const inside = Math.min(tvdM - b.topTvdM, b.baseTvdM - tvdM);
    if (inside > -0.5) v = Math.max(v, Math.min(1, inside + 0.5));
  }
  return v;
}

/** Correlated Gaussian noise (first-order autoregressive), so a log wiggles like a tool rather than like dust. */
function correlatedNoise(rng: Rng, n: number, stepM: number, correlationM: number): Float64Array {
  const a = Math.exp(-stepM / correlationM);
  const b = Math.sqrt(1 - a * a);
  const out = new Float64Array(n);
  let e = rng.normal();
  for (let i = 0; i < n; i++) {
    e = a * e + b * rng.normal();
    out[i] = e;
  }
  return out;
}

// Math.round on a scaled value: several times faster than toFixed over millions of samples.
const round = (v: number, decimals: number) => {
  const k = 10 ** decimals;
  return Math.round(v * k) / k;
};

/**
 * DT (µs/ft), RDEP (ohm·m), RHOB (g/cc) and GR (API) on the given MD grid (TVD for each MD given).
 * Shale: Δt = Δt_n·((S − P_n)/(S − P))^(1/3) and R = R_n·((S − P)/(S − P_n))^(1/1.2), Eaton inverted;
 * RHOB is the column density that made the overburden (sands carry the shale density: at these depths
 * sand and shale densities cross over, common practice, no source).
 * @example
 * const { curves } = synthesiseLogs(column, mdM, tvdM, beds, rng, { noise: false, sands: false });
 */
export function synthesiseLogs(
  column: PressureColumn,
  mdM: Float64Array,
  tvdM: Float64Array,
  beds: readonly SandBed[],
  rng: Rng,
  opts: LogOptions = {},
): { curves: LogCurve[]; samples: LogSamples } {
  const noise = opts.noise ?? true;
  const sands = opts.sands ?? true;
  const n = mdM.length;
  const stepM = n > 1 ? mdM[1] - mdM[0] : 1;
  const t = DEMO_TRENDS;
  const [eDt, eRes, eRho, eGr] = [0, 1, 2, 3].map(() => correlatedNoise(rng, n, stepM, 1.5));
  const dt = new Float64Array(n);
  const res = new Float64Array(n);
  const rhob = new Float64Array(n);
  const gr = new Float64Array(n);
  const samples: LogSamples = {
    mdM,
    tvdM,
    overburdenPa: new Float64Array(n),
    normalPa: new Float64Array(n),
    porePa: new Float64Array(n),
  };
  for (let i = 0; i < n; i++) {
    const z = tvdM[i];
    const below = z - column.mudlineTvdM;
    const s = atTvd(column, column.overburdenPa, z);
    const pn = atTvd(column, column.normalPa, z);
    const pp = atTvd(column, column.porePa, z);
    samples.overburdenPa[i] = s;
    samples.normalPa[i] = pn;
    samples.porePa[i] = pp;
    const ratio = (s - pn) / (s - pp);
    const dtShale = normalSlownessUsFt(below) * ratio ** (1 / t.sonic.exponent);
    const resShale = normalResistivityOhmM(below) * ratio ** (-1 / t.resistivity.exponent);
    const grShale =
      t.gammaShaleApi.shallow + (t.gammaShaleApi.deep - t.gammaShaleApi.shallow) * (1 - Math.exp(-below / t.gammaShaleApi.scaleM));
    const v = sands ? sandFraction(beds, z) : 0;
    dt[i] = dtShale * (1 - v + v * t.sandSonicFactor);
    res[i] = resShale * t.sandResistivityFactor ** v;
    gr[i] = grShale * (1 - v) + t.gammaSandApi * v;
    rhob[i] = atTvd(column, column.densityKgM3, z) / 1000;
    if (noise) {
      dt[i] = round(dt[i] * (1 + 0.012 * eDt[i]), 2);
      res[i] = round(res[i] * Math.exp(0.05 * eRes[i]), 4);
      rhob[i] = round(rhob[i] + 0.015 * eRho[i], 4);
      gr[i] = round(gr[i] + 5 * eGr[i], 2);
    }
  }
  return {
    curves: [
      { mnemonic: 'DT', unit: 'us/ft', description: 'Compressional sonic slowness', role: 'sonic', values: dt },
      { mnemonic: 'RDEP', unit: 'ohm.m', description: 'Deep resistivity', role: 'resistivity', values: res },
      { mnemonic: 'RHOB', unit: 'g/cc', description: 'Bulk density', role: 'density', values: rhob },
      { mnemonic: 'GR', unit: 'gAPI', description: 'Gamma ray', role: 'gamma', values: gr },
    ],
    samples,
  };
}
