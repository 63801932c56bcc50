/**
 * Circular-arc geometry shared by the station-to-station step and the look-up along an arc
 * (Sawaryn & Thorogood 2005, SPE Drill. & Compl. 20(1), 24–36).
 */

const DEG = Math.PI / 180;

/** Below this dogleg (rad) the closed forms lose digits, so their Taylor series are used instead. */
const SMALL_ANGLE_RAD = 1e-4;

/**
 * Unit tangent (north, east, down) written into out[offset], out[offset + step], out[offset + 2·step].
 * @example
 * const t = new Float64Array(3);
 * directionFromAngles(90, 90, t, 0, 1); // t ≈ [0, 1, 0]: horizontal, due east
 */
export function directionFromAngles(incDeg: number, aziDeg: number, out: Float64Array, offset: number, step: number): void {
  const inc = incDeg * DEG;
  const azi = aziDeg * DEG;
  const s = Math.sin(inc);
  out[offset] = s * Math.cos(azi);
  out[offset + step] = s * Math.sin(azi);
  out[offset + 2 * step] = Math.cos(inc);
}

/**
 * Dogleg angle between two unit tangents. The half-angle form 2·atan2(|t2 − t1|, |t2 + t1|) equals the
 * textbook cos β = cos(I2−I1) − sin I1 sin I2 (1 − cos(A2−A1)) but keeps full precision near 0 and π,
 * where acos of a number close to ±1 would not.
 * @example
 * doglegAngle(0, 0, 1, 1, 0, 0); // π/2: vertical to horizontal
 */
export function doglegAngle(n1: number, e1: number, d1: number, n2: number, e2: number, d2: number): number {
  const dn = n2 - n1;
  const de = e2 - e1;
  const dd = d2 - d1;
  const sn = n2 + n1;
  const se = e2 + e1;
  const sd = d2 + d1;
  return 2 * Math.atan2(Math.sqrt(dn * dn + de * de + dd * dd), Math.sqrt(sn * sn + se * se + sd * sd));
}

/**
 * Ratio factor RF = (2/β)·tan(β/2); its series 1 + β²/12 + β⁴/120 for tiny β avoids 0/0.
 * @example
 * ratioFactor(Math.PI / 2); // 4/π ≈ 1.2732
 */
export function ratioFactor(beta: number): number {
  if (beta < SMALL_ANGLE_RAD) {
    const b2 = beta * beta;
    return 1 + b2 / 12 + (b2 * b2) / 120;
  }
  return (2 / beta) * Math.tan(beta / 2);
}

/**
 * sin(x·β)/sin β, the spherical-interpolation coefficient for the tangent a fraction x along an arc;
 * series x·(1 + (1 − x²)·β²/6) for tiny β.
 * @example
 * slerpCoefficient(0.5, Math.PI / 2); // sin(π/4) ≈ 0.7071
 */
export function slerpCoefficient(x: number, beta: number): number {
  if (beta < SMALL_ANGLE_RAD) return x * (1 + ((1 - x * x) * beta * beta) / 6);
  return Math.sin(x * beta) / Math.sin(beta);
}

/**
 * Azimuth in [0, 360) for any real input.
 * @example
 * normaliseAzimuthDeg(-10); // 350
 */
export function normaliseAzimuthDeg(aziDeg: number): number {
  let a = aziDeg % 360;
  if (a < 0) a += 360;
  // −1e-15 % 360 + 360 rounds to exactly 360
  return a >= 360 ? 0 : a;
}
