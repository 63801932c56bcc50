import { directionFromAngles, doglegAngle, normaliseAzimuthDeg, ratioFactor } from './arc';
import type { StationInput, Survey, SurveyStation, TieIn } from './types';
import { resolveTieIn, validateStations } from './validate';

const DEG = Math.PI / 180;

/** A 180° dogleg has no unique arc; |t1 + t2| below this means the tangents reverse. */
const REVERSAL_TOLERANCE = 1e-12;

/**
 * Minimum-curvature positions of a survey in typed arrays (Taylor & Mason 1972; Zaremba 1973;
 * Sawaryn & Thorogood 2005, SPE Drill. & Compl. 20(1), 24–36). The tie-in becomes node 0 when it lies above
 * the first station, so the arc from it (vertical unless its direction is given) is part of the path; when it
 * sits at the first station's MD, the station takes the tie-in position and its own measured direction.
 *
 * @example
 * const survey = computeSurvey([{ mdM: 100, incDeg: 0, aziDeg: 0 }, { mdM: 200, incDeg: 10, aziDeg: 45 }]);
 * survey.tvdM[survey.nodeCount - 1]; // ≈ 199.49
 */
export function computeSurvey(stations: readonly StationInput[], tieIn?: TieIn): Survey {
  validateStations(stations);
  const tie = resolveTieIn(tieIn);
  if (stations.length > 0 && stations[0].mdM < tie.mdM) {
    throw new Error(`Station 0: mdM (${stations[0].mdM}) is above the tie-in mdM (${tie.mdM})`);
  }
  const firstStationNode = stations.length === 0 || stations[0].mdM > tie.mdM ? 1 : 0;
  const nodeCount = stations.length + firstStationNode;

  const mdM = new Float64Array(nodeCount);
  const tvdM = new Float64Array(nodeCount);
  const northM = new Float64Array(nodeCount);
  const eastM = new Float64Array(nodeCount);
  const doglegRad = new Float64Array(nodeCount);
  // one buffer, three strided views: direction components stay adjacent in memory per component
  const dirs = new Float64Array(3 * nodeCount);
  const dirNorth = dirs.subarray(0, nodeCount);
  const dirEast = dirs.subarray(nodeCount, 2 * nodeCount);
  const dirDown = dirs.subarray(2 * nodeCount, 3 * nodeCount);

  if (firstStationNode === 1) {
    mdM[0] = tie.mdM;
    directionFromAngles(tie.incDeg, tie.aziDeg, dirs, 0, nodeCount);
  }
  for (let i = 0; i < stations.length; i++) {
    const k = i + firstStationNode;
    mdM[k] = stations[i].mdM;
    directionFromAngles(stations[i].incDeg, stations[i].aziDeg, dirs, k, nodeCount);
  }
  tvdM[0] = tie.tvdM;
  northM[0] = tie.northM;
  eastM[0] = tie.eastM;

  for (let k = 1; k < nodeCount; k++) {
    const n1 = dirNorth[k - 1],
      e1 = dirEast[k - 1],
      d1 = dirDown[k - 1];
    const n2 = dirNorth[k],
      e2 = dirEast[k],
      d2 = dirDown[k];
    const beta = doglegAngle(n1, e1, d1, n2, e2, d2);
    if (Math.hypot(n1 + n2, e1 + e2, d1 + d2) < REVERSAL_TOLERANCE) {
      const a = k - 1 - firstStationNode;
      const from = a < 0 ? 'the tie-in' : `station ${a}`;
      throw new Error(
        `Between ${from} and station ${k - firstStationNode} the direction reverses (dogleg 180°): no minimum-curvature arc exists`,
      );
    }
    const half = 0.5 * (mdM[k] - mdM[k - 1]) * ratioFactor(beta);
    northM[k] = northM[k - 1] + half * (n1 + n2);
    eastM[k] = eastM[k - 1] + half * (e1 + e2);
    tvdM[k] = tvdM[k - 1] + half * (d1 + d2);
    doglegRad[k] = beta;
  }

  return { kind: 'minimumCurvatureSurvey', nodeCount, firstStationNode, mdM, tvdM, northM, eastM, dirNorth, dirEast, dirDown, doglegRad };
}

/**
 * Minimum-curvature positions of every station (Sawaryn & Thorogood 2005, SPE Drill. & Compl. 20(1), 24–36):
 * ΔN = ΔMD/2·(sin I1 cos A1 + sin I2 cos A2)·RF, ΔE likewise with sin A, ΔTVD = ΔMD/2·(cos I1 + cos I2)·RF,
 * RF = (2/β)·tan(β/2). Default tie-in: MD 0, vertical, at the surface origin.
 *
 * @example
 * minimumCurvature([{ mdM: 1066.8, incDeg: 15, aziDeg: 20 }, { mdM: 1097.28, incDeg: 25, aziDeg: 45 }],
 *   { mdM: 1066.8, tvdM: 1050, northM: 0, eastM: 0 })[1].tvdM; // ≈ 1050 + 28.655 (94.01 ft)
 */
export function minimumCurvature(stations: readonly StationInput[], tieIn?: TieIn): SurveyStation[] {
  const survey = computeSurvey(stations, tieIn);
  const out: SurveyStation[] = new Array(stations.length);
  for (let i = 0; i < stations.length; i++) {
    const k = i + survey.firstStationNode;
    const arcLength = k > 0 ? survey.mdM[k] - survey.mdM[k - 1] : 0;
    out[i] = {
      mdM: stations[i].mdM,
      incDeg: stations[i].incDeg,
      aziDeg: normaliseAzimuthDeg(stations[i].aziDeg),
      tvdM: survey.tvdM[k],
      northM: survey.northM[k],
      eastM: survey.eastM[k],
      doglegDegPer30m: arcLength > 0 ? (survey.doglegRad[k] / DEG / arcLength) * 30 : 0,
    };
  }
  return out;
}
