import {
  computeSurvey,
  minimumCurvature,
  positionAt,
  tvdAt,
  type StationInput,
  type Survey,
  type SurveyStation,
} from '../../../../shared/trajectory';

/**
 * Well paths of the demo: vertical, build-and-hold (J) and S-shaped, with stations every 30 m and
 * positions by minimum curvature (shared/trajectory). MD and TVD are from the rig datum.
 */
export type WellProfile = 'vertical' | 'build-and-hold' | 's-shape';

export interface PathDesign {
  profile: WellProfile;
  /** Kick-off point, MD, m. */
  kickOffMdM: number;
  buildDegPer30m: number;
  holdIncDeg: number;
  aziDeg: number;
  /** S-shape only: length of the tangent before the drop, m MD. */
  tangentM: number;
  dropDegPer30m: number;
  /** S-shape only: inclination after the drop. */
  finalIncDeg: number;
}

/**
 * Planned inclination at an MD: vertical, build at a constant rate, hold, (drop, hold).
 * @example inclinationAt({ ...design, profile: 'build-and-hold', kickOffMdM: 600, buildDegPer30m: 3, holdIncDeg: 30 }, 750); // 15
 */
export function inclinationAt(d: PathDesign, mdM: number): number {
  if (d.profile === 'vertical' || mdM <= d.kickOffMdM) return 0;
  const buildEnd = d.kickOffMdM + (d.holdIncDeg / d.buildDegPer30m) * 30;
  if (mdM <= buildEnd) return ((mdM - d.kickOffMdM) / 30) * d.buildDegPer30m;
  if (d.profile === 'build-and-hold') return d.holdIncDeg;
  const dropStart = buildEnd + d.tangentM;
  if (mdM <= dropStart) return d.holdIncDeg;
  return Math.max(d.finalIncDeg, d.holdIncDeg - ((mdM - dropStart) / 30) * d.dropDegPer30m);
}

/** A well's path: TVD and horizontal offset along MD, with its survey when it has one. */
export interface WellPath {
  profile: WellProfile;
  stations: SurveyStation[] | null;
  tvdAtMd(mdM: number): number;
  tvdAtMds(mdM: Float64Array): Float64Array;
  mdAtTvd(tvdM: number): number;
  /** Offset of the bore from the wellhead at a TVD, m north and east. */
  offsetAtTvd(tvdM: number): { northM: number; eastM: number };
}

const STATION_SPACING_M = 30;

function stationsFor(d: PathDesign, toMdM: number): StationInput[] {
  const out: StationInput[] = [];
  for (let md = 0; md < toMdM; md += STATION_SPACING_M) out.push({ mdM: md, incDeg: inclinationAt(d, md), aziDeg: d.aziDeg });
  out.push({ mdM: toMdM, incDeg: inclinationAt(d, toMdM), aziDeg: d.aziDeg });
  return out;
}

function bisectMd(survey: Survey | null, tvdM: number, maxMdM: number): number {
  if (!survey) return tvdM;
  let lo = 0;
  let hi = maxMdM;
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    if (tvdAt(survey, mid) < tvdM) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

function pathFrom(profile: WellProfile, stations: StationInput[] | null, maxMdM: number): WellPath {
  const survey = stations ? computeSurvey(stations) : null;
  return {
    profile,
    stations: stations ? minimumCurvature(stations) : null,
    tvdAtMd: (md) => (survey ? tvdAt(survey, md) : md),
    tvdAtMds: (mds) => (survey ? tvdAt(survey, mds) : new Float64Array(mds)),
    mdAtTvd: (tvd) => bisectMd(survey, tvd, maxMdM),
    offsetAtTvd: (tvd) => {
      if (!survey) return { northM: 0, eastM: 0 };
      const p = positionAt(survey, bisectMd(survey, tvd, maxMdM));
      return { northM: p.northM, eastM: p.eastM };
    },
  };
}

/**
 * The path drilled far enough for any TD (used to find where the bore meets the surfaces before the TD is known).
 * @example
 * draftPath({ ...design, profile: 'vertical' }, 6000).tvdAtMd(1000); // 1000
 */
export function draftPath(d: PathDesign, maxTvdM: number): WellPath {
  if (d.profile === 'vertical') return pathFrom('vertical', null, maxTvdM);
  const maxMdM = 3 * maxTvdM;
  return pathFrom(d.profile, stationsFor(d, maxMdM), maxMdM);
}

/**
 * The final path to a TD given in TVD: stations every 30 m to the TD's MD, a last station at the TD.
 * @example
 * const { path, tdMdM, tdTvdM } = finalPath(design, 3500);
 */
export function finalPath(d: PathDesign, tdTvdM: number): { path: WellPath; tdMdM: number; tdTvdM: number } {
  if (d.profile === 'vertical') return { path: pathFrom('vertical', null, tdTvdM), tdMdM: tdTvdM, tdTvdM };
  const draft = draftPath(d, tdTvdM);
  const tdMdM = Math.round(draft.mdAtTvd(tdTvdM) * 10) / 10;
  const path = pathFrom(d.profile, stationsFor(d, tdMdM), tdMdM * 1.5);
  return { path, tdMdM, tdTvdM: path.tvdAtMd(tdMdM) };
}
