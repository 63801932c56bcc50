/** Where a well's reference levels sit, in TVD below its rig datum (rotary table), m. */
export interface ProfileWell {
  /** Rig datum above sea level, m (for a land well, above sea level too). */
  datumElevationM: number;
  /** Sea depth at the well, m; 0 on land. */
  waterDepthM: number;
  /** Rig datum above the sea surface (offshore) or the ground (onshore): an air column that carries no load, m. */
  airGapM: number;
}

export interface WellDatums {
  /** TVD of sea level below the rig datum, m (= datum elevation). */
  seaLevelTvdM: number;
  /** TVD of the mudline (sea floor, or ground on land) below the rig datum, m (= air gap + water depth). */
  mudlineTvdM: number;
}

function check(fn: string, name: string, value: number, min: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value))
    throw new Error(`${fn}: ${name} must be a finite number (got ${String(value)})`);
  if (value < min) throw new Error(`${fn}: ${name} must be >= ${min} (got ${value})`);
  return value;
}

/**
 * Sea level and mudline of a well as TVD below its rig datum. Depths "below sea level" subtract the first,
 * depths "below mudline" the second.
 * @example
 * wellDatums({ datumElevationM: 25, waterDepthM: 100, airGapM: 25 }); // { seaLevelTvdM: 25, mudlineTvdM: 125 }
 */
export function wellDatums(well: ProfileWell): WellDatums {
  const fn = 'wellDatums';
  const datumElevationM = check(fn, 'datumElevationM', well.datumElevationM, -Infinity);
  const waterDepthM = check(fn, 'waterDepthM', well.waterDepthM, 0);
  const airGapM = check(fn, 'airGapM', well.airGapM, 0);
  return { seaLevelTvdM: datumElevationM, mudlineTvdM: airGapM + waterDepthM };
}

/** A well header's datum fields as stored and entered: any of them may be unknown. */
export interface WellHeaderDatums {
  datumElevationM: number;
  waterDepthM: number | null;
  airGapM: number | null;
  groundElevationM: number | null;
  offshore: boolean;
}

/**
 * A well's datums for the profile builder from its header, the one rule the profile page, the comparison and the
 * server's surfaces share: a missing water depth is land; a missing air gap is, offshore, the datum elevation (rig
 * datum above the sea) and, on land, the rig datum above the ground (0 when the ground elevation is unknown too),
 * so depths below the mudline start at the ground on land.
 * @example profileWellFromHeader({ datumElevationM: 310, waterDepthM: null, airGapM: null, groundElevationM: 302, offshore: false }); // airGapM 8
 */
export function profileWellFromHeader(h: WellHeaderDatums): ProfileWell {
  const waterDepthM = h.waterDepthM ?? 0;
  let airGapM: number;
  if (h.airGapM !== null) airGapM = h.airGapM;
  else if (h.offshore) airGapM = Math.max(0, h.datumElevationM);
  else airGapM = h.groundElevationM === null ? 0 : Math.max(0, h.datumElevationM - h.groundElevationM);
  return { datumElevationM: h.datumElevationM, waterDepthM, airGapM };
}
