import type { StationInput, TieIn } from './types';

function requireFinite(value: unknown, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`${what} must be a finite number, got ${String(value)}`);
  }
  return value;
}

function requireInclination(value: unknown, what: string): number {
  const inc = requireFinite(value, what);
  if (inc < 0 || inc > 180) throw new Error(`${what} must be within [0, 180] degrees, got ${inc}`);
  return inc;
}

/**
 * Checks every station and that MD strictly increases; throws on the first fault.
 * @example
 * validateStations([{ mdM: 10, incDeg: 0, aziDeg: 0 }, { mdM: 5, incDeg: 0, aziDeg: 0 }]);
 * // throws "Station 1: mdM must be strictly increasing (10 then 5)"
 */
export function validateStations(stations: readonly StationInput[]): void {
  if (!Array.isArray(stations)) throw new Error('stations must be an array');
  let previousMd = -Infinity;
  for (let i = 0; i < stations.length; i++) {
    const s = stations[i];
    if (s === null || typeof s !== 'object') throw new Error(`Station ${i} must be an object with mdM, incDeg, aziDeg`);
    const md = requireFinite(s.mdM, `Station ${i}: mdM`);
    requireInclination(s.incDeg, `Station ${i}: incDeg`);
    requireFinite(s.aziDeg, `Station ${i}: aziDeg`);
    if (md <= previousMd) {
      throw new Error(`Station ${i}: mdM must be strictly increasing (${previousMd} then ${md})`);
    }
    previousMd = md;
  }
}

/**
 * The tie-in with defaults filled (MD 0, vertical, surface origin).
 * @example
 * resolveTieIn(undefined); // { mdM: 0, tvdM: 0, northM: 0, eastM: 0, incDeg: 0, aziDeg: 0 }
 */
export function resolveTieIn(tieIn: TieIn | undefined): Required<TieIn> {
  if (tieIn === undefined) return { mdM: 0, tvdM: 0, northM: 0, eastM: 0, incDeg: 0, aziDeg: 0 };
  if (tieIn === null || typeof tieIn !== 'object') throw new Error('tieIn must be an object with mdM, tvdM, northM, eastM');
  return {
    mdM: requireFinite(tieIn.mdM, 'tieIn.mdM'),
    tvdM: requireFinite(tieIn.tvdM, 'tieIn.tvdM'),
    northM: requireFinite(tieIn.northM, 'tieIn.northM'),
    eastM: requireFinite(tieIn.eastM, 'tieIn.eastM'),
    incDeg: tieIn.incDeg === undefined ? 0 : requireInclination(tieIn.incDeg, 'tieIn.incDeg'),
    aziDeg: tieIn.aziDeg === undefined ? 0 : requireFinite(tieIn.aziDeg, 'tieIn.aziDeg'),
  };
}

/**
 * Checks one look-up MD (`index` names its place in an array).
 * @example
 * requireFiniteMd(Number.NaN, 3); // throws "mdM[3] must be a finite number, got NaN"
 */
export function requireFiniteMd(mdM: number, index?: number): void {
  if (typeof mdM !== 'number' || !Number.isFinite(mdM)) {
    const where = index === undefined ? 'mdM' : `mdM[${index}]`;
    throw new Error(`${where} must be a finite number, got ${String(mdM)}`);
  }
}
