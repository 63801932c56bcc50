import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { bowersLoading, bowersUnloading, bowersVelocityLoading, bowersVelocityUnloading, convert } from '@shared/pressure';

// Illustrative coefficients in Bowers' published units (A in (ft/s)/psi^B, B dimensionless); B = 0.75 makes the
// powers below exact by hand. Bowers 1995, SPE 27488: V = V0 + A·σ^B (V, V0 ft/s; σ psi), V0 ≈ 5000 ft/s.
const coeffs = { A: 10, B: 0.75 };
const psi = (v: number) => convert(v, 'psi', 'Pa');
const ftS = (v: number) => convert(v, 'ft/s', 'm/s');

describe('Bowers loading curve', () => {
  it('is V0 = 5000 ft/s = 1524 m/s at zero effective stress by default', () => {
    // Bowers 1995, SPE 27488: V0 ≈ 5000 ft/s; 5000 × 0.3048 m/ft = 1524 m/s (NIST SP 811: 1 ft = 0.3048 m exactly).
    expect(bowersVelocityLoading(0, coeffs)).toBeCloseTo(1524, 9);
    expect(bowersVelocityLoading(0, { ...coeffs, v0Ms: 1524 })).toBeCloseTo(1524, 9);
  });

  it('hand-computed: σ = 1000 psi, A = 10, B = 0.75 → 6778.28 ft/s', () => {
    // V = 5000 + 10 × 1000^0.75 = 5000 + 177.8279 × 10 = 6778.279 ft/s.
    expect(convert(bowersVelocityLoading(psi(1000), coeffs), 'm/s', 'ft/s')).toBeCloseTo(6778.2794, 3);
  });

  it('hand-computed in SI: σ = 10,000 psi → 15,000 ft/s = 4572 m/s', () => {
    // 10,000^0.75 = 1000, so V = 5000 + 10 × 1000 = 15,000 ft/s; × 0.3048 = 4572 m/s.
    expect(bowersVelocityLoading(psi(10_000), coeffs)).toBeCloseTo(4572, 6);
  });

  it('hand-computed pore pressure in SI: S = 15,000 psi, V = 4572 m/s → P = 5000 psi', () => {
    // 4572 m/s = 15,000 ft/s; σ = ((15,000 − 5000)/10)^(1/0.75) = 1000^(4/3) = 10,000 psi; P = S − σ = 5000 psi.
    // 5000 psi × 6894.757293 Pa/psi = 34,473,786.47 Pa.
    expect(bowersLoading({ overburdenPa: psi(15_000), velocityMs: 4572, ...coeffs })).toBeCloseTo(34_473_786.47, 1);
  });

  it('takes the mudline velocity in m/s like every other velocity (no mixed units in one call)', () => {
    // Hand computation: v0Ms 1463.04 m/s = 4800 ft/s; V = 4511.04 m/s = 14,800 ft/s; V − V0 = 10,000 ft/s;
    // σ = (10,000/10)^(4/3) = 10,000 psi; P = 15,000 − 10,000 = 5000 psi = 34,473,786.47 Pa.
    // Read as ft/s, the 1463.04 would give σ ≈ 14,681 psi and P ≈ 320 psi: off by thousands of psi.
    const p = bowersLoading({ overburdenPa: psi(15_000), velocityMs: 4511.04, v0Ms: 1463.04, ...coeffs });
    expect(p).toBeCloseTo(34_473_786.47, 1);
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
  const unloading = { ...coeffs, vMaxMs: ftS(9000), U: 3.13 };
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

  it('hand-computed in SI: vMax 4572 m/s, U = 2, V = 3084.576 m/s, S = 15,000 psi → P = 13,322.2784 psi', () => {
    // Bowers 1995, SPE 27488, unloading: σ = σmax·(σ_vc/σmax)^U with σ_vc the virgin-curve stress for V.
    // vMax 4572 m/s = 15,000 ft/s → σmax = ((15,000 − 5000)/10)^(4/3) = 10,000 psi.
    // V 3084.576 m/s = 10,120 ft/s → σ_vc = (5120/10)^(4/3) = 512^(4/3) = 4096 psi.
    // σ = 10,000 × 0.4096² = 1677.7216 psi; P = 15,000 − 1677.7216 = 13,322.2784 psi = 91,853,876.16 Pa.
    const params = { ...coeffs, vMaxMs: 4572, U: 2 };
    expect(bowersUnloading({ overburdenPa: psi(15_000), velocityMs: 3084.576, ...params })).toBeCloseTo(91_853_876.16, 1);
    // And forward: σ = 1677.7216 psi on the unloading curve gives back 10,120 ft/s = 3084.576 m/s.
    expect(bowersVelocityUnloading(psi(1677.7216), params)).toBeCloseTo(3084.576, 6);
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
    expect(() => bowersUnloading({ overburdenPa: 1e7, velocityMs: 2000, ...coeffs, vMaxMs: 1500, U: 3 })).toThrow(
      new Error('bowersUnloading: vMaxMs must exceed v0Ms (got 1500 m/s, v0Ms 1524 m/s)'),
    );
    expect(() => bowersVelocityLoading(-1, coeffs)).toThrow(new Error('bowersVelocityLoading: sigmaPa must be >= 0 (got -1)'));
    expect(() => bowersLoading({ overburdenPa: 1e7, velocityMs: 2000, A: 0, B: 0.7 })).toThrow(
      new Error('bowersLoading: A must be > 0 (got 0)'),
    );
  });
});
