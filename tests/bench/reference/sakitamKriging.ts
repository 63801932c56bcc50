/**
 * Runs @sakitam-gis/kriging with a variogram we choose, through the library's own variogram functions, matrix
 * routines and `predict`. Its `train` always fits its own variogram first, so the last step of `train`
 * (Gram matrix → inverse → M = K⁻¹t) is repeated here with the library's exported routines.
 *
 * What the library computes (read from node_modules/@sakitam-gis/kriging/src): with its variogram function
 * γ_lib(h) = N + ((S − N)/R)·(1 − exp(−3h/R)) (exponential; A = 1/3, so R is the practical range as in GSLIB,
 * and note the partial sill is (S − N)/R, divided by the range) it builds K_ij = γ_lib(h_ij) + σ²·δ_ij with
 * γ_lib(0) = N, and predicts k₀ᵀK⁻¹t — no unbiasedness constraint, so it is not ordinary kriging as such.
 */
import kriging from '@sakitam-gis/kriging';
import type { Variogram } from '../../../shared/interpolation/index';

/** The library's own parameters for `train`-like use. */
export interface SakitamParameters {
  model: Variogram['model'];
  nugget: number;
  sill: number;
  range: number;
  sigma2: number;
}

/**
 * Our semivariogram in the library's terms: R = a, N = nugget, S = nugget + sill·a, and σ² = −nugget so that the
 * Gram diagonal is γ(0) = 0 (the library has no nugget jump at the origin). This is how the library is meant to
 * be used; its estimate k₀ᵀΓ⁻¹t differs from ordinary kriging by a term of order 1/(1 − 1ᵀR⁻¹1) (R the correlation
 * matrix; Sherman–Morrison on Γ = (nugget + sill)·11ᵀ − C).
 */
export function semivariogramParameters(v: Variogram): SakitamParameters {
  return { model: v.model, nugget: v.nugget, sill: v.nugget + v.sill * v.range, range: v.range, sigma2: -v.nugget };
}

/**
 * Parameters that make the library's "variogram" equal C(h) + L (our covariance plus a constant L): then its
 * estimate is simple kriging with covariance C + L and zero mean, which tends to ordinary kriging as L → ∞ with
 * an error O(1/(L·1ᵀC⁻¹1)) (Sherman–Morrison: the constant acts as a mean of infinite prior variance).
 * N = L + sill, S = N − sill·a, σ² = nugget so the diagonal is L + nugget + sill.
 */
export function shiftedCovarianceParameters(v: Variogram, shift: number): SakitamParameters {
  const nugget = shift + v.sill;
  return { model: v.model, nugget, sill: nugget - v.sill * v.range, range: v.range, sigma2: v.nugget };
}

type LibraryVariogram = ReturnType<typeof kriging.train>;

/** Builds the library's variogram object for fixed parameters, as the last part of its `train` does. */
export function trainWithParameters(t: number[], x: number[], y: number[], p: SakitamParameters): LibraryVariogram {
  const model =
    p.model === 'gaussian'
      ? kriging.variogramGaussian
      : p.model === 'spherical'
        ? kriging.variogramSpherical
        : kriging.variogramExponential;
  const A = 1 / 3;
  const n = x.length;
  const K: number[] = new Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < i; j++) {
      const h = Math.hypot(x[i] - x[j], y[i] - y[j]);
      K[i * n + j] = model(h, p.nugget, p.range, p.sill, A);
      K[j * n + i] = K[i * n + j];
    }
    K[i * n + i] = model(0, p.nugget, p.range, p.sill, A);
  }
  let C = kriging.matrixAdd(K, kriging.matrixDiag(p.sigma2, n), n, n);
  const cloneC = C.slice(0);
  if (kriging.matrixChol(C, n)) {
    kriging.matrixChol2inv(C, n);
  } else {
    kriging.matrixSolve(cloneC, n);
    C = cloneC;
  }
  const M = kriging.matrixMultiply(C, t, n, n, 1);
  return { t, x, y, nugget: p.nugget, range: p.range, sill: p.sill, A, n, model, K: C, M } as unknown as LibraryVariogram;
}

/** The library's `predict` at many targets. */
export function predictAll(variogram: LibraryVariogram, targets: readonly { x: number; y: number }[]): Float64Array {
  const out = new Float64Array(targets.length);
  const v = variogram as unknown as Parameters<typeof kriging.predict>[2];
  for (let i = 0; i < targets.length; i++) out[i] = kriging.predict(targets[i].x, targets[i].y, v);
  return out;
}
