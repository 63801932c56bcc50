/** One survey station as measured: measured depth, inclination from vertical, azimuth from grid/true north. */
export interface StationInput {
  mdM: number;
  incDeg: number;
  aziDeg: number;
}

/**
 * Where the survey starts. Defaults to MD 0, vertical, at the surface origin (TVD 0, N 0, E 0).
 * `incDeg`/`aziDeg` give the direction at the tie-in (vertical when omitted).
 */
export interface TieIn {
  mdM: number;
  tvdM: number;
  northM: number;
  eastM: number;
  incDeg?: number;
  aziDeg?: number;
}

/** A station with its minimum-curvature position; azimuth normalised to [0, 360). */
export interface SurveyStation extends StationInput {
  tvdM: number;
  northM: number;
  eastM: number;
  /** Dogleg severity of the arc ending at this station, degrees per 30 m (0 when no arc ends here). */
  doglegDegPer30m: number;
}

export interface Position {
  tvdM: number;
  northM: number;
  eastM: number;
}

/** Positions for many MDs, as parallel typed arrays. */
export interface PositionArrays {
  tvdM: Float64Array;
  northM: Float64Array;
  eastM: Float64Array;
}

/**
 * A computed survey in typed arrays: the nodes of the path (the tie-in first when it lies above the first
 * station, then every station), each with its position and unit direction (north, east, down).
 * Build it once with `computeSurvey` and reuse it for many look-ups.
 */
export interface Survey {
  readonly kind: 'minimumCurvatureSurvey';
  readonly nodeCount: number;
  /** 1 when node 0 is the tie-in (it lies above the first station), else 0. */
  readonly firstStationNode: number;
  readonly mdM: Float64Array;
  readonly tvdM: Float64Array;
  readonly northM: Float64Array;
  readonly eastM: Float64Array;
  readonly dirNorth: Float64Array;
  readonly dirEast: Float64Array;
  readonly dirDown: Float64Array;
  /** Dogleg angle in radians of the arc ending at each node (0 at node 0). */
  readonly doglegRad: Float64Array;
}
