import { convert } from '../units/convert';
import { computeSurvey, tvdAt, type StationInput } from '../trajectory';
import { resample } from './interpolate';

/** The log roles the profile reads, and the unit each one is carried in. */
export const PROFILE_LOG_UNITS = {
  sonic: 'us/ft',
  resistivity: 'ohm.m',
  density: 'kg/m3',
  gamma: 'API',
} as const;
export type ProfileLogRole = keyof typeof PROFILE_LOG_UNITS;

/** Log samples on the profile's depth grid; NaN where a curve has no (or no usable) value. */
export interface ProfileLogs {
  /** Compressional slowness, µs/ft (the unit published trends and Eaton exponents are quoted for). */
  sonicUsFt?: Float64Array;
  resistivityOhmM?: Float64Array;
  densityKgM3?: Float64Array;
  gammaApi?: Float64Array;
}

/** One curve as the API sends it: MD samples and values with null for gaps, in the unit stated. */
export interface LogCurveInput {
  role: ProfileLogRole;
  unit: string;
  mdM: ArrayLike<number>;
  values: ArrayLike<number | null>;
}

export interface AlignedLogs {
  /** MD of each sample, m, ascending. */
  mdM: Float64Array;
  /** TVD below the rig datum of each sample, m, ascending (samples where the bore climbs are dropped). */
  tvdM: Float64Array;
  logs: ProfileLogs;
}

const UNIT_ALIASES: Record<ProfileLogRole, Record<string, (v: number) => number>> = {
  sonic: {
    'us/ft': (v) => v,
    'us/m': (v) => convert(v, 'us/m', 'us/ft'),
  },
  resistivity: { 'ohm.m': (v) => v, ohmm: (v) => v, 'ohm-m': (v) => v },
  density: {
    'g/cc': (v) => v * 1000,
    'g/cm3': (v) => v * 1000,
    'kg/m3': (v) => v,
  },
  gamma: { api: (v) => v, gapi: (v) => v },
};

function toProfileUnit(role: ProfileLogRole, unit: string): (v: number) => number {
  const f = UNIT_ALIASES[role][unit.trim().toLowerCase().replace('µ', 'u')];
  if (!f) throw new Error(`alignLogs: unknown ${role} unit "${unit}" (expected one of ${Object.keys(UNIT_ALIASES[role]).join(', ')})`);
  return f;
}

const KEY: Record<ProfileLogRole, keyof ProfileLogs> = {
  sonic: 'sonicUsFt',
  resistivity: 'resistivityOhmM',
  density: 'densityKgM3',
  gamma: 'gammaApi',
};

/**
 * Puts a well's sonic, resistivity, density and gamma-ray curves on one MD grid (that of the curve with the
 * most samples; the others interpolated linearly, never across a gap), converts them to the profile's units,
 * drops non-positive readings of sonic, resistivity and density (tool failures), and finds each sample's TVD by
 * minimum curvature from the survey (vertical when there is none). Where a deviated bore climbs, samples whose
 * TVD does not increase are dropped, because a pressure profile is a function of TVD.
 * @example
 * const { tvdM, logs } = alignLogs([{ role: 'sonic', unit: 'us/ft', mdM: [500, 501], values: [150, null] }], []);
 */
export function alignLogs(curves: readonly LogCurveInput[], stations: readonly StationInput[]): AlignedLogs {
  const fn = 'alignLogs';
  const roles = new Set<ProfileLogRole>();
  for (const c of curves) {
    if (roles.has(c.role)) throw new Error(`${fn}: more than one ${c.role} curve given; choose one`);
    roles.add(c.role);
    if (c.mdM.length !== c.values.length) {
      throw new Error(`${fn}: the ${c.role} curve has ${c.mdM.length} depths but ${c.values.length} values`);
    }
    for (let i = 1; i < c.mdM.length; i++) {
      if (!(c.mdM[i] > c.mdM[i - 1])) throw new Error(`${fn}: ${c.role} mdM must increase (mdM[${i}] = ${c.mdM[i]} after ${c.mdM[i - 1]})`);
    }
  }
  if (curves.length === 0) return { mdM: new Float64Array(0), tvdM: new Float64Array(0), logs: {} };
  const base = curves.reduce((a, b) => (b.mdM.length > a.mdM.length ? b : a));
  const md = Float64Array.from(base.mdM);
  const survey = stations.length > 0 ? computeSurvey(stations) : null;
  const tvdAll = survey ? tvdAt(survey, md) : Float64Array.from(md);

  const keep: number[] = [];
  let deepest = -Infinity;
  for (let i = 0; i < md.length; i++) {
    if (tvdAll[i] > deepest) {
      keep.push(i);
      deepest = tvdAll[i];
    }
  }
  const mdM = Float64Array.from(keep, (i) => md[i]);
  const tvdM = Float64Array.from(keep, (i) => tvdAll[i]);
  const logs: ProfileLogs = {};
  for (const c of curves) {
    const f = toProfileUnit(c.role, c.unit);
    const positiveOnly = c.role !== 'gamma';
    const values = Float64Array.from({ length: c.values.length }, (_, i) => {
      const v = c.values[i];
      if (v === null || !Number.isFinite(v)) return NaN;
      const converted = f(v);
      return positiveOnly && !(converted > 0) ? NaN : converted;
    });
    logs[KEY[c.role]] = c === base ? Float64Array.from(keep, (i) => values[i]) : resample(c.mdM, values, mdM);
  }
  return { mdM, tvdM, logs };
}
