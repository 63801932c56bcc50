import { ratioFactor, slerpCoefficient } from './arc';
import { computeSurvey } from './minimumCurvature';
import type { Position, PositionArrays, StationInput, Survey, TieIn } from './types';
import { requireFiniteMd } from './validate';

/** Stations as measured, or a survey already computed with `computeSurvey`. */
export type SurveySource = readonly StationInput[] | Survey;

function toSurvey(source: SurveySource, tieIn: TieIn | undefined): Survey {
  if (!Array.isArray(source) && (source as Survey).kind === 'minimumCurvatureSurvey') return source as Survey;
  return computeSurvey(source as readonly StationInput[], tieIn);
}

/**
 * Index of the node that starts the piece holding `md`: −1 above node 0, nodeCount − 1 beyond the last node.
 * Gallops forward from `hint` (the previous answer), so sorted MDs cost O(n + m) overall and unsorted ones
 * O(m·log n).
 */
function locate(md: number, mdNodes: Float64Array, hint: number): number {
  const last = mdNodes.length - 1;
  if (md < mdNodes[0]) return -1;
  if (md >= mdNodes[last]) return last;
  // invariant below: mdNodes[lo] <= md < mdNodes[hi]
  let lo = 0;
  let hi = last;
  if (hint >= 0 && hint < last && md >= mdNodes[hint]) {
    lo = hint;
    let step = 1;
    while (lo + step < last && md >= mdNodes[lo + step]) {
      lo += step;
      step *= 2;
    }
    hi = Math.min(lo + step, last);
  }
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (mdNodes[mid] <= md) lo = mid;
    else hi = mid;
  }
  return lo;
}

/** Writes the position at `md` (in piece `k`) into out[0..2] = tvd, north, east. */
function evaluate(s: Survey, k: number, md: number, out: Float64Array): void {
  const last = s.nodeCount - 1;
  if (k < 0 || k === last) {
    // beyond either end the path goes straight along the end tangent
    const j = k < 0 ? 0 : last;
    const ds = md - s.mdM[j];
    out[0] = s.tvdM[j] + ds * s.dirDown[j];
    out[1] = s.northM[j] + ds * s.dirNorth[j];
    out[2] = s.eastM[j] + ds * s.dirEast[j];
    return;
  }
  const ds = md - s.mdM[k];
  const beta = s.doglegRad[k + 1];
  const f = ds / (s.mdM[k + 1] - s.mdM[k]);
  // tangent a fraction f along the arc (spherical interpolation), then the sub-arc from node k to it is itself
  // a minimum-curvature step of length ds with dogleg f·β — so the point lies exactly on the circle
  const a = slerpCoefficient(1 - f, beta);
  const b = slerpCoefficient(f, beta);
  let tn = a * s.dirNorth[k] + b * s.dirNorth[k + 1];
  let te = a * s.dirEast[k] + b * s.dirEast[k + 1];
  let td = a * s.dirDown[k] + b * s.dirDown[k + 1];
  const norm = Math.sqrt(tn * tn + te * te + td * td);
  tn /= norm;
  te /= norm;
  td /= norm;
  const half = 0.5 * ds * ratioFactor(f * beta);
  out[0] = s.tvdM[k] + half * (s.dirDown[k] + td);
  out[1] = s.northM[k] + half * (s.dirNorth[k] + tn);
  out[2] = s.eastM[k] + half * (s.dirEast[k] + te);
}

/**
 * Position at one MD, or at many (returned as parallel Float64Arrays), on the minimum-curvature arcs
 * (exact point on each circular arc, not a linear blend). Beyond the last node the path continues straight along
 * the last direction; above the tie-in it extends straight back along the tie-in direction.
 * With no stations the well runs straight from the tie-in (by default vertical: TVD = MD).
 *
 * @example
 * const stations = [{ mdM: 0, incDeg: 0, aziDeg: 0 }, { mdM: 300, incDeg: 90, aziDeg: 90 }];
 * positionAt(stations, 300); // { tvdM: 190.99, northM: 0, eastM: 190.99 } — a quarter circle of radius 600/π
 */
export function positionAt(source: SurveySource, mdM: number, tieIn?: TieIn): Position;
export function positionAt(source: SurveySource, mdM: ArrayLike<number>, tieIn?: TieIn): PositionArrays;
export function positionAt(source: SurveySource, mdM: number | ArrayLike<number>, tieIn?: TieIn): Position | PositionArrays {
  const survey = toSurvey(source, tieIn);
  const out = new Float64Array(3);
  if (typeof mdM === 'number') {
    requireFiniteMd(mdM);
    evaluate(survey, locate(mdM, survey.mdM, -1), mdM, out);
    return { tvdM: out[0], northM: out[1], eastM: out[2] };
  }
  const m = mdM.length;
  const tvd = new Float64Array(m);
  const north = new Float64Array(m);
  const east = new Float64Array(m);
  let hint = -1;
  for (let i = 0; i < m; i++) {
    const md = mdM[i];
    requireFiniteMd(md, i);
    hint = locate(md, survey.mdM, hint);
    evaluate(survey, hint, md, out);
    tvd[i] = out[0];
    north[i] = out[1];
    east[i] = out[2];
  }
  return { tvdM: tvd, northM: north, eastM: east };
}

/**
 * True vertical depth at one MD (number) or at many (Float64Array), along the minimum-curvature arcs;
 * see `positionAt` for the behaviour beyond the ends. Sorted MDs are looked up in O(n + m).
 *
 * @example
 * tvdAt([], 1234); // 1234 — no stations: vertical from the surface
 * tvdAt([{ mdM: 1000, incDeg: 0, aziDeg: 0 }, { mdM: 2000, incDeg: 60, aziDeg: 0 }], [500, 1500, 2500]);
 */
export function tvdAt(source: SurveySource, mdM: number, tieIn?: TieIn): number;
export function tvdAt(source: SurveySource, mdM: ArrayLike<number>, tieIn?: TieIn): Float64Array;
export function tvdAt(source: SurveySource, mdM: number | ArrayLike<number>, tieIn?: TieIn): number | Float64Array {
  if (typeof mdM === 'number') return positionAt(source, mdM, tieIn).tvdM;
  return positionAt(source, mdM, tieIn).tvdM;
}
