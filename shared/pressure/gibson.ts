import { integratePanels } from './gaussLegendre';
import { param } from './inputs';

/**
 * Gibson (1958), Géotechnique 8, 171–182: a clay layer deposited at a constant rate m on an
 * impermeable base, drained at its top, consolidating with a constant c_v. With ζ = z/h(t) the relative
 * height above the base and T = m²t/c_v, his closed-form solution for the excess pore pressure is,
 * after substituting ξ = h·s in his integral,
 *
 *   u/(γ′h) = 1 − √(T/π)·exp(−Tζ²/4)·∫₀^∞ s·tanh(Ts/2)·cosh(Tζs/2)·exp(−Ts²/4) ds.
 *
 * Writing cosh·exp as two Gaussians centred on s = ±ζ and substituting s = ±ζ + 2v/√T leaves
 *
 *   u/(γ′h) = 1 − (1/√π)·[∫_{−a}^∞ f(ζ + 2v/√T)·e^{−v²} dv + ∫_{a}^∞ f(−ζ + 2v/√T)·e^{−v²} dv],
 *
 * a = ζ√T/2, f(s) = s·tanh(Ts/2): smooth integrands on a range of a few units for every T, which
 * composite Gauss–Legendre integrates to ~1e-10 in a few microseconds (no cache needed).
 */

/** e^{−v²} is below 1e-18 past this, so the tails add nothing at double precision. */
const V_CUT = 6.5;

/** Panels over [lo, V_CUT], graded near lo where tanh(Ts/2) turns over (width ~1/√T in v) when lo is s = 0. */
function panelBreaks(lo: number, T: number, gradeAtLo: boolean): number[] {
  const breaks = [lo];
  let x = lo;
  let width = gradeAtLo ? Math.min(0.5, 0.25 / Math.sqrt(T)) : 0.5;
  while (x < V_CUT) {
    x = Math.min(V_CUT, x + width);
    breaks.push(x);
    width = Math.min(0.5, width * 2);
  }
  return breaks;
}

function excessRatio(T: number, zeta: number): number {
  // The drained top is zero by its boundary condition; the integral would return rounding noise there.
  if (T === 0 || zeta === 1) return 0;
  if (T === Infinity) return 1 - zeta;
  const rootT = Math.sqrt(T);
  const a = (zeta * rootT) / 2;
  const f = (s: number) => s * Math.tanh((T * s) / 2);
  const gauss = (centre: number) => (v: number) => f(centre + (2 * v) / rootT) * Math.exp(-v * v);
  let sum = 0;
  const lo1 = Math.max(-a, -V_CUT);
  sum += integratePanels(gauss(zeta), panelBreaks(lo1, T, lo1 === -a));
  if (a < V_CUT) sum += integratePanels(gauss(-zeta), panelBreaks(a, T, true));
  // Rounding can leave a few 1e-16 below zero near the drained top; the physical ratio is never negative.
  return Math.max(0, 1 - sum / Math.sqrt(Math.PI));
}

export interface GibsonExcessInput {
  /** Dimensionless time T = m²t/c_v (m sedimentation rate, t time, c_v consolidation coefficient); Infinity allowed. */
  T: number;
  /** Relative height above the impermeable base, 0 (base) … 1 (drained top). */
  zeta: number;
}

/**
 * Excess pore pressure as a fraction of the full overload, u/(γ′h), at relative height ζ for Gibson's
 * (1958) constant-rate sedimentation. 0 at T = 0 (hydrostatic), 1 − ζ as T → ∞ (undrained: the
 * excess carries the whole buoyant weight above), always 0 at the drained top.
 * @example
 * gibsonExcessRatio({ T: 1, zeta: 0 }); // excess at the base after T = 1
 */
export function gibsonExcessRatio(input: GibsonExcessInput): number {
  const fn = 'gibsonExcessRatio';
  if (input.T !== Infinity) param(fn, 'T', input.T, { min: 0 });
  const zeta = param(fn, 'zeta', input.zeta, { min: 0, max: 1 });
  return excessRatio(input.T, zeta);
}

export interface GibsonExcessProfile {
  /** Relative heights 0 … 1, evenly spaced. */
  zeta: Float64Array;
  /** u/(γ′h) at each. */
  ratio: Float64Array;
}

/**
 * The excess-pressure profile at time T on `n` evenly spaced relative heights, base to top, for plots.
 * @example
 * gibsonExcessProfile(1, 101).ratio[0]; // same as gibsonExcessRatio({ T: 1, zeta: 0 })
 */
export function gibsonExcessProfile(T: number, n = 101): GibsonExcessProfile {
  const fn = 'gibsonExcessProfile';
  if (T !== Infinity) param(fn, 'T', T, { min: 0 });
  param(fn, 'n', n, { min: 2 });
  if (!Number.isInteger(n)) throw new Error(`${fn}: n must be an integer (got ${n})`);
  const zeta = new Float64Array(n);
  const ratio = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    zeta[i] = i / (n - 1);
    ratio[i] = excessRatio(T, zeta[i]);
  }
  return { zeta, ratio };
}
