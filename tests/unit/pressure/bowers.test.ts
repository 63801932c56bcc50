import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bowersLoading, bowersUnloading, bowersVelocityLoading, bowersVelocityUnloading, convert } from '@shared/pressure';

// Illustrative coefficients in Bowers' published units (ft/s, psi); any calibration works for these checks.
const coeffs = { A: 10, B: 0.75 };
const psi = (v: number) => convert(v, 'psi', 'Pa');
const ftS = (v: number) => convert(v, 'ft/s', 'm/s');

describe('Bowers loading curve', () => {
  it('is V0 = 5000 ft/s at zero effective stress by default', () => {
    // Bowers 1995, SPE Drill. & Compl. 10(2): V = V0 + A σ^B with V0 ≈ 5000 ft/s.
    expect(bowersVelocityLoading(0, coeffs)).toBeCloseTo(ftS(5000), 9);
  });

  it('hand-computed: σ = 1000 psi, A = 10, B = 0.75 → 6778.28 ft/s', () => {
    // V = 5000 + 10 × 1000^0.75 = 5000 + 177.8279 × 10 = 6778.279 ft/s.
    expect(convert(bowersVelocityLoading(psi(1000), coeffs), 'm/s', 'ft/s')).toBeCloseTo(6778.2794, 3);
  });

  it('inverts its forward velocity (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 20_000, noNaN: true }),
        fc.double({ min: 0, max: 30_000, noNaN: true }),
        fc.double({ min: 1, max: 50, noNaN: true }),
        fc.double({ min: 0.5, max: 1, noNaN: true }),
        (sigmaPsi, extraPsi, A, B) => {
          const sigma = psi(sigmaPsi);
          const overburden = sigma + psi(extraPsi);
          const v = bowersVelocityLoading(sigma, { A, B });
          const pore = bowersLoading({ overburdenPa: overburden, velocityMs: v, A, B });
          return Math.abs(overburden - pore - sigma) <= 1e-6 * Math.max(1, overburden);
        },
      ),
    );
  });

  it('returns P = S at or below V0 (no grain load)', () => {
    const p = bowersLoading({ overburdenPa: [50e6, 50e6], velocityMs: [ftS(5000), 1400], ...coeffs });
    expect(Array.from(p)).toEqual([50e6, 50e6]);
  });
});

describe('Bowers unloading curve', () => {
  const unloading = { ...coeffs, vMax: ftS(9000), U: 3.13 };
  // σmax = ((9000 − 5000)/10)^(1/0.75) psi.
  const sigmaMaxPsi = 400 ** (1 / 0.75);

  it('meets the loading curve at σmax and is faster than it for σ < σmax', () => {
    // Bowers 1995: unloading V = V0 + A[σmax (σ/σmax)^(1/U)]^B, equal to loading at σ = σmax.
    expect(bowersVelocityUnloading(psi(sigmaMaxPsi), unloading)).toBeCloseTo(ftS(9000), 6);
    const s = psi(0.5 * sigmaMaxPsi);
    expect(bowersVelocityUnloading(s, unloading)).toBeGreaterThan(bowersVelocityLoading(s, coeffs));
    // Hand-computed at σ = σmax/2: V = 5000 + 10·[σmax·0.5^(1/3.13)]^0.75 ft/s.
    const expectedFtS = 5000 + 10 * (sigmaMaxPsi * 0.5 ** (1 / 3.13)) ** 0.75;
    expect(convert(bowersVelocityUnloading(s, unloading), 'm/s', 'ft/s')).toBeCloseTo(expectedFtS, 6);
  });

  it('U = 1 retraces the loading curve', () => {
    const s = psi(1500);
    expect(bowersVelocityUnloading(s, { ...unloading, U: 1 })).toBeCloseTo(bowersVelocityLoading(s, coeffs), 9);
  });

  it('inverts its forward velocity (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 1, max: 8, noNaN: true }), (fraction, U) => {
        const sigma = psi(fraction * sigmaMaxPsi);
        const overburden = psi(15_000);
        const v = bowersVelocityUnloading(sigma, { ...unloading, U });
        const pore = bowersUnloading({ overburdenPa: overburden, velocityMs: v, ...unloading, U });
        return Math.abs(overburden - pore - sigma) <= 1e-6 * overburden;
      }),
    );
  });

  it('uses the loading curve above vMax', () => {
    const v = ftS(9500);
    const S = psi(15_000);
    expect(bowersUnloading({ overburdenPa: S, velocityMs: v, ...unloading })).toBeCloseTo(
      bowersLoading({ overburdenPa: S, velocityMs: v, ...coeffs }),
      3,
    );
  });

  it('predicts more pore pressure than the loading curve for the same velocity', () => {
    const v = ftS(8000);
    const S = psi(15_000);
    expect(bowersUnloading({ overburdenPa: S, velocityMs: v, ...unloading })).toBeGreaterThan(
      bowersLoading({ overburdenPa: S, velocityMs: v, ...coeffs }),
    );
  });

  it('rejects bad parameters with exact messages', () => {
    expect(() => bowersVelocityUnloading(1e6, { ...unloading, U: 0.5 })).toThrow(
      new Error('bowersVelocityUnloading: U must be >= 1 (got 0.5)'),
    );
    expect(() => bowersUnloading({ overburdenPa: 1e7, velocityMs: 2000, ...coeffs, vMax: 1500, U: 3 })).toThrow(
      new Error('bowersUnloading: vMax must exceed v0 (got 1500 m/s = 4921.259842519685 ft/s, v0 5000 ft/s)'),
    );
    expect(() => bowersVelocityLoading(-1, coeffs)).toThrow(new Error('bowersVelocityLoading: sigmaPa must be >= 0 (got -1)'));
    expect(() => bowersLoading({ overburdenPa: 1e7, velocityMs: 2000, A: 0, B: 0.7 })).toThrow(
      new Error('bowersLoading: A must be > 0 (got 0)'),
    );
  });
});
