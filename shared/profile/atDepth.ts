import { G } from '../units/constants';
import type { Profile } from './buildProfile';
import { interpolateAt } from './interpolate';

/** One well's pressures at one depth, read off its profile. */
export interface PressureAtDepth {
  /** The depth read, TVD below the rig datum, m. */
  tvdM: number;
  /** Log-derived pore pressure (gaps between shale samples bridged), Pa. */
  porePa: number;
  /** Normal (hydrostatic) pore pressure of the interpretation's fluid, Pa. */
  hydrostaticPa: number;
  overburdenPa: number;
  /** Pore pressure as an equivalent density from the rig datum, porePa / (g · tvdM), kg/m³. */
  poreEmwKgM3: number;
  /** Pore pressure above normal, porePa − hydrostaticPa, Pa. */
  overpressurePa: number;
}

export type PressureAtDepthResult = { ok: true; value: PressureAtDepth } | { ok: false; reason: string };

const tvdss = (profile: Profile, tvdM: number) => `${Math.round(tvdM - profile.seaLevelTvdM)} m TVDSS`;

/**
 * TVD (below the rig datum) of the shallowest and deepest sample where the log-derived pore pressure has a value;
 * null without one. Outside it the profile's pore pressure is an assumption, not a reading.
 * @example poreIntervalTvdM(profile); // [320, 4810]
 */
export function poreIntervalTvdM(profile: Profile): [number, number] | null {
  const { porePa } = profile;
  if (!porePa) return null;
  let first = -1;
  let last = -1;
  for (let i = 0; i < porePa.length; i++) {
    if (Number.isNaN(porePa[i])) continue;
    if (first < 0) first = i;
    last = i;
  }
  return first < 0 ? null : [profile.tvdM[first], profile.tvdM[last]];
}

/**
 * A well's pore pressure, normal pressure and overburden at one TVD, or the reason there is none. The pore
 * pressure comes from the bridged curve (`poreFilledPa`) but only inside the interval where the log-derived
 * curve (`porePa`) has values: it is never extrapolated below the deepest (or above the shallowest) sample,
 * because the filled curve above the log is an assumption of normal pressure, not a reading.
 * @example
 * const r = pressureAtDepth(profile, 2525);
 * if (r.ok) r.value.poreEmwKgM3; // e.g. 1284
 * else r.reason; // 'its pore-pressure curve ends at 2300 m TVDSS, above the depth'
 */
export function pressureAtDepth(profile: Profile, tvdM: number): PressureAtDepthResult {
  if (typeof tvdM !== 'number' || !Number.isFinite(tvdM) || tvdM <= 0)
    throw new Error(`pressureAtDepth: tvdM must be a finite depth > 0 (got ${String(tvdM)})`);
  const { porePa, poreFilledPa } = profile;
  if (!porePa || !poreFilledPa) {
    const why = profile.notes.find((n) => /^Pore pressure by|needs a normal compaction trend/.test(n));
    return {
      ok: false,
      reason: why ? `no log-derived pore pressure: ${why}` : 'no log-derived pore pressure: the interpretation has no pore-pressure method',
    };
  }
  if (tvdM <= profile.mudlineTvdM)
    return { ok: false, reason: `the depth lies above its mudline (${tvdss(profile, profile.mudlineTvdM)})` };
  const interval = poreIntervalTvdM(profile);
  if (!interval) return { ok: false, reason: 'its pore-pressure method found no usable log samples (no shale samples or no readings)' };
  if (tvdM > interval[1]) return { ok: false, reason: `its pore-pressure curve ends at ${tvdss(profile, interval[1])}, above the depth` };
  if (tvdM < interval[0]) return { ok: false, reason: `its pore-pressure curve starts at ${tvdss(profile, interval[0])}, below the depth` };
  const pore = interpolateAt(profile.tvdM, poreFilledPa, tvdM);
  const hydrostaticPa = interpolateAt(profile.tvdM, profile.hydrostaticPa, tvdM);
  const overburdenPa = interpolateAt(profile.tvdM, profile.overburdenPa, tvdM);
  if (!Number.isFinite(pore) || !Number.isFinite(hydrostaticPa))
    return { ok: false, reason: 'its pore-pressure curve has no value at the depth' };
  return {
    ok: true,
    value: { tvdM, porePa: pore, hydrostaticPa, overburdenPa, poreEmwKgM3: pore / (G * tvdM), overpressurePa: pore - hydrostaticPa },
  };
}
