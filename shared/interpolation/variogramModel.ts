import type { Variogram, VariogramModel } from './types';

export const VARIOGRAM_MODELS: readonly VariogramModel[] = ['spherical', 'exponential', 'gaussian'];

/**
 * Unit-sill shape g(h) of each model, GSLIB convention with practical range a (Deutsch & Journel 1998, GSLIB).
 * @example
 * modelShape('spherical', 50, 100); // 0.6875
 */
export function modelShape(model: VariogramModel, h: number, range: number): number {
  const r = h / range;
  switch (model) {
    case 'spherical':
      return r >= 1 ? 1 : 1.5 * r - 0.5 * r * r * r;
    case 'exponential':
      return 1 - Math.exp(-3 * r);
    case 'gaussian':
      return 1 - Math.exp(-3 * r * r);
    default:
      throw new Error(`Unknown variogram model: ${String(model)}`);
  }
}

/**
 * Checks a variogram object; throws on the first fault.
 * @example
 * validateVariogram({ model: 'spherical', nugget: 0, sill: 1, range: 0 }); // throws "variogram.range must be > 0, got 0"
 */
export function validateVariogram(v: Variogram): void {
  if (v === null || typeof v !== 'object') throw new Error('variogram must be an object with model, nugget, sill, range');
  if (!VARIOGRAM_MODELS.includes(v.model)) throw new Error(`Unknown variogram model: ${String(v.model)}`);
  for (const key of ['nugget', 'sill', 'range'] as const) {
    const value = v[key];
    if (typeof value !== 'number' || !Number.isFinite(value))
      throw new Error(`variogram.${key} must be a finite number, got ${String(value)}`);
  }
  if (v.nugget < 0) throw new Error(`variogram.nugget must be ≥ 0, got ${v.nugget}`);
  if (v.sill < 0) throw new Error(`variogram.sill must be ≥ 0, got ${v.sill}`);
  if (v.range <= 0) throw new Error(`variogram.range must be > 0, got ${v.range}`);
  if (v.nugget + v.sill <= 0) throw new Error('variogram total sill (nugget + sill) must be > 0');
}

function requireDistance(h: number): void {
  if (typeof h !== 'number' || !Number.isFinite(h) || h < 0) throw new Error(`h must be a finite distance ≥ 0, got ${String(h)}`);
}

/**
 * Semivariance γ(h) = nugget + sill·g(h) for h > 0 and γ(0) = 0 (the nugget is a jump at the origin).
 *
 * @example
 * variogramValue({ model: 'exponential', nugget: 0, sill: 10, range: 10 }, 10); // 10·(1 − e^−3) ≈ 9.502
 */
export function variogramValue(v: Variogram, h: number): number {
  validateVariogram(v);
  requireDistance(h);
  return h === 0 ? 0 : v.nugget + v.sill * modelShape(v.model, h, v.range);
}

/**
 * Covariance C(h) = nugget + sill − γ(h); C(0) = nugget + sill (all three models are bounded).
 *
 * @example
 * covariance({ model: 'exponential', nugget: 0, sill: 10, range: 10 }, 1); // 10·e^−0.3 ≈ 7.408
 */
export function covariance(v: Variogram, h: number): number {
  validateVariogram(v);
  requireDistance(h);
  return v.nugget + v.sill - variogramValue(v, h);
}

/**
 * Fast covariance of an already validated variogram, for the hot loops.
 * @example
 * covarianceFunction({ model: 'exponential', nugget: 0, sill: 10, range: 10 })(1); // ≈ 7.408
 */
export function covarianceFunction(v: Variogram): (h: number) => number {
  const total = v.nugget + v.sill;
  const { sill, range } = v;
  const inv = 1 / range;
  switch (v.model) {
    case 'exponential':
      return (h) => (h === 0 ? total : sill * Math.exp(-3 * h * inv));
    case 'gaussian':
      return (h) => {
        const r = h * inv;
        return h === 0 ? total : sill * Math.exp(-3 * r * r);
      };
    case 'spherical':
      return (h) => {
        if (h === 0) return total;
        const r = h * inv;
        return r >= 1 ? 0 : sill * (1 - 1.5 * r + 0.5 * r * r * r);
      };
    default:
      throw new Error(`Unknown variogram model: ${String(v.model)}`);
  }
}
