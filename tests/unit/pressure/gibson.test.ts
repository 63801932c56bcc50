import { describe, expect, it } from 'vitest';
import { gibsonExcessProfile, gibsonExcessRatio } from '@shared/pressure';
import { gibsonByFiniteDifference } from './gibsonFiniteDifference';

describe('gibsonExcessRatio', () => {
  it('agrees with a finite-difference solution of the moving-boundary problem to 1e-3', () => {
    // Gibson 1958, Géotechnique 8: the same PDE solved independently on a fixed domain (see the helper).
    for (const T of [0.01, 0.1, 1, 10, 100]) {
      const w = gibsonByFiniteDifference(T, 400, 0.01);
      for (let j = 0; j <= 400; j += 20) {
        expect(Math.abs(gibsonExcessRatio({ T, zeta: j / 400 }) - w[j]), `T=${T} ζ=${j / 400}`).toBeLessThan(1e-3);
      }
    }
  });

  it('tends to the steady loading-rate profile T(1 − ζ²)/2 for small T', () => {
    // Small-T limit of Gibson's problem: c_v u_zz = −γ′m with u_z(0) = 0, u(h) = 0 → u/(γ′h) = T(1 − ζ²)/2.
    for (const zeta of [0, 0.3, 0.7]) {
      expect(gibsonExcessRatio({ T: 1e-4, zeta }) / ((1e-4 * (1 - zeta * zeta)) / 2)).toBeCloseTo(1, 3);
    }
    expect(gibsonExcessRatio({ T: 0, zeta: 0.2 })).toBe(0); // hydrostatic before any load
  });

  it('tends to the undrained limit 1 − ζ for large T', () => {
    // No drainage: the excess carries the whole buoyant overload γ′(h − z), i.e. u/(γ′h) = 1 − ζ.
    for (const zeta of [0.25, 0.5, 0.75]) expect(gibsonExcessRatio({ T: 1e4, zeta })).toBeCloseTo(1 - zeta, 3);
    expect(gibsonExcessRatio({ T: 1e6, zeta: 0 })).toBeGreaterThan(0.998);
    expect(gibsonExcessRatio({ T: Infinity, zeta: 0.4 })).toBeCloseTo(0.6, 15);
  });

  it('is zero at the drained top, never negative, and increases with T', () => {
    const Ts = [0, 1e-3, 0.01, 0.1, 0.3, 1, 3, 10, 30, 100, 1000];
    for (const zeta of [0, 0.2, 0.5, 0.8, 0.95, 1]) {
      let previous = -1;
      for (const T of Ts) {
        const r = gibsonExcessRatio({ T, zeta });
        expect(r).toBeGreaterThanOrEqual(0);
        expect(r).toBeLessThanOrEqual(1 - zeta + 1e-12);
        expect(r).toBeGreaterThanOrEqual(previous);
        previous = r;
      }
    }
    // The closed form itself (not the boundary shortcut) vanishes at the top: ratio ≤ (1 − ζ) just below it.
    for (const T of [0.01, 1, 100]) {
      expect(gibsonExcessRatio({ T, zeta: 1 })).toBe(0);
      expect(gibsonExcessRatio({ T, zeta: 1 - 1e-6 })).toBeLessThan(1.01e-6);
    }
  });

  it('rejects bad input with exact messages', () => {
    expect(() => gibsonExcessRatio({ T: -1, zeta: 0 })).toThrow(new Error('gibsonExcessRatio: T must be >= 0 (got -1)'));
    expect(() => gibsonExcessRatio({ T: 1, zeta: 1.5 })).toThrow(new Error('gibsonExcessRatio: zeta must be <= 1 (got 1.5)'));
    expect(() => gibsonExcessRatio({ T: NaN, zeta: 0 })).toThrow(new Error('gibsonExcessRatio: T must be a finite number (got NaN)'));
  });
});

describe('gibsonExcessProfile', () => {
  it('samples the ratio base to top', () => {
    const { zeta, ratio } = gibsonExcessProfile(2, 11);
    expect(zeta.length).toBe(11);
    expect(zeta[0]).toBe(0);
    expect(zeta[10]).toBe(1);
    expect(ratio[3]).toBe(gibsonExcessRatio({ T: 2, zeta: zeta[3] }));
    for (let i = 1; i < 11; i++) expect(ratio[i]).toBeLessThan(ratio[i - 1]); // drains towards the top
    expect(() => gibsonExcessProfile(2, 1)).toThrow(new Error('gibsonExcessProfile: n must be >= 2 (got 1)'));
  });
});
