import { BASIN_HALF_M, toLocalM } from './frame';

/**
 * The smooth hidden surfaces of the invented basin, as pure functions of the local frame (m): sea
 * depth, the top of overpressure, how fast pressure ramps below it, and the formation tops. Depths are
 * TVD below sea level (TVDSS), m. Every shape is a sum of Gaussians and a regional tilt, so each is
 * smooth, cheap, and known exactly where a test needs the truth.
 */

/** Unit vector from the north-west coast out to the south-east slope. */
const BASINWARD = { x: Math.SQRT1_2, y: -Math.SQRT1_2 } as const;
const HALF_DIAGONAL_M = (BASIN_HALF_M.x + BASIN_HALF_M.y) * Math.SQRT1_2;

/** The delta-front depocentre (thickest, youngest fill; shallowest top of overpressure). */
export const DEPOCENTRE_M = { xM: 6_000, yM: -4_000 } as const;
/** A smaller western delta lobe. */
export const WEST_LOBE_M = { xM: -17_000, yM: 9_000 } as const;

/**
 * Distance basinward from the coast, 0 at the north-west corner, 1 at the south-east corner.
 * @example basinwardFraction(0, 0); // 0.5
 */
export function basinwardFraction(xM: number, yM: number): number {
  return ((xM * BASINWARD.x + yM * BASINWARD.y) / HALF_DIAGONAL_M + 1) / 2;
}

function gaussian(xM: number, yM: number, centre: { xM: number; yM: number }, sigmaM: number): number {
  const dx = xM - centre.xM;
  const dy = yM - centre.yM;
  return Math.exp(-(dx * dx + dy * dy) / (2 * sigmaM * sigmaM));
}

/**
 * Sea depth, m: a gently dipping shelf (40 m at the coast) that breaks into a slope towards 600 m.
 * @example
 * waterDepthAtM(-40_000, 30_000); // ≈ 40 (the north-west corner, by the coast)
 */
export function waterDepthAtM(xM: number, yM: number): number {
  const u = basinwardFraction(xM, yM);
  return 40 + 160 * u + 400 / (1 + Math.exp(-(u - 0.72) / 0.06));
}

/**
 * Hidden top of overpressure, TVDSS m, at a point of the local frame: about 1900 m under the delta
 * front, deepening away from it to about 3800 m on the south-east slope.
 * @example
 * hiddenTopTvdssAtM(6_000, -4_000); // ≈ 1902 (the depocentre)
 */
export function hiddenTopTvdssAtM(xM: number, yM: number): number {
  const tilt = 240 * (2 * basinwardFraction(xM, yM) - 1);
  return 3560 + tilt - 1690 * gaussian(xM, yM, DEPOCENTRE_M, 14_000) - 520 * gaussian(xM, yM, WEST_LOBE_M, 8_000);
}

/**
 * Hidden top of overpressure, TVDSS m, at a WGS 84 lon/lat: the truth that interpolation of the wells'
 * tops can be compared against.
 * @example
 * hiddenTopTvdssM(-101, -32.5); // ≈ 2051 (the basin centre, near the depocentre)
 */
export function hiddenTopTvdssM(lon: number, lat: number): number {
  const { xM, yM } = toLocalM(lon, lat);
  return hiddenTopTvdssAtM(xM, yM);
}

/**
 * λ = P/S_v that pore pressure tends to deep below the top of overpressure (Hubbert & Rubey 1959's
 * ratio), highest under the depocentre. Invented field, 0.80 … 0.87.
 * @example lambdaAtM(6_000, -4_000); // 0.87
 */
export function lambdaAtM(xM: number, yM: number): number {
  return 0.8 + 0.07 * gaussian(xM, yM, DEPOCENTRE_M, 20_000);
}

/**
 * Length scale of the pressure ramp below the top, m: steep (≈ 650 m) at the depocentre, gentle (≈ 1200 m) away.
 * @example rampLengthAtM(-40_000, 30_000); // ≈ 1.2 km
 */
export function rampLengthAtM(xM: number, yM: number): number {
  return 650 + 550 * (1 - gaussian(xM, yM, DEPOCENTRE_M, 18_000)) + 60 * Math.sin(xM / 9_000) * Math.cos(yM / 7_000);
}

/** One invented formation: its name, lithology, and whether it holds permeable sands. */
export interface FormationDef {
  name: string;
  lithology: string;
  sandy: boolean;
  /** Thickness of the unit above this top (from the previous top, or the seabed), m, at a point. */
  thicknessAboveM(xM: number, yM: number): number;
}

/** Formations from the seabed down; the depth of each top is the sum of the thicknesses above it. */
export const FORMATIONS: readonly FormationDef[] = [
  { name: 'Pellam Clay', lithology: 'soft grey claystone, unconsolidated near the seabed', sandy: false, thicknessAboveM: () => 35 },
  {
    name: 'Varrick Sand Member',
    lithology: 'fine to medium sandstone interbedded with claystone',
    sandy: true,
    thicknessAboveM: (x, y) => 780 + 260 * gaussian(x, y, DEPOCENTRE_M, 22_000) + 60 * Math.sin(x / 9_000),
  },
  {
    name: 'Orsel Shale',
    lithology: 'grey silty shale with thin siltstone stringers',
    sandy: false,
    thicknessAboveM: (_x, y) => 430 + 90 * Math.cos(y / 11_000),
  },
  {
    name: 'Dunmere Sandstone',
    lithology: 'stacked deltaic sandstone with shale breaks',
    sandy: true,
    thicknessAboveM: (x, y) => 520 + 320 * gaussian(x, y, DEPOCENTRE_M, 18_000),
  },
  {
    name: 'Hask Claystone',
    lithology: 'dark marine claystone',
    sandy: false,
    thicknessAboveM: (x, y) => 480 + 120 * gaussian(x, y, DEPOCENTRE_M, 25_000),
  },
  {
    name: 'Tarnby Sand Member',
    lithology: 'turbidite sandstone with mudstone interbeds',
    sandy: true,
    thicknessAboveM: (x, y) => 520 + 80 * Math.sin((x + y) / 13_000),
  },
  { name: 'Colvane Marl', lithology: 'calcareous mudstone', sandy: false, thicknessAboveM: () => 450 },
];

/**
 * TVDSS of every formation top at a point, in FORMATIONS order (the first is the seabed's clay).
 * @example
 * formationTopsTvdssAtM(0, 0).length; // 7
 */
export function formationTopsTvdssAtM(xM: number, yM: number): number[] {
  let depth = waterDepthAtM(xM, yM);
  return FORMATIONS.map((f) => (depth += f.thicknessAboveM(xM, yM)));
}
