import { describe, expect, it } from 'vitest';
import { convert, eatonDexp, eatonResistivity, eatonSonic } from '@shared/pressure';

// Worked input for all three: 10,000 ft, S/D = 1.0 psi/ft (S = 10,000 psi), P_n/D = 0.465 psi/ft (4650 psi).
const S = convert(10_000, 'psi', 'Pa');
const PN = convert(4650, 'psi', 'Pa');
const toGradient = (pPa: number) => convert(pPa, 'Pa', 'psi') / 10_000;

describe('eatonSonic', () => {
  it('hand-computed: Δt_n/Δt = 80/100 → 0.72608 psi/ft', () => {
    // Eaton 1975, SPE 5544: P/D = 1.0 − (1.0 − 0.465)·(80/100)^3 = 1 − 0.535 × 0.512 = 0.72608 psi/ft.
    const p = eatonSonic({ overburdenPa: S, normalPa: PN, normalSlowness: 80, observedSlowness: 100 });
    expect(toGradient(p)).toBeCloseTo(0.72608, 9);
  });

  it('gives the normal pressure on the normal trend and works in gradients too', () => {
    // Eaton 1975: ratio 1 → P = P_n; the method holds in gradients or absolute values alike.
    expect(eatonSonic({ overburdenPa: S, normalPa: PN, normalSlowness: 90, observedSlowness: 90 })).toBeCloseTo(PN, 6);
    expect(eatonSonic({ overburdenPa: 1, normalPa: 0.465, normalSlowness: 80, observedSlowness: 100 })).toBeCloseTo(0.72608, 12);
  });

  it('maps curves with scalars broadcast, NaN passing through', () => {
    const p = eatonSonic({
      overburdenPa: [S, S, S],
      normalPa: PN,
      normalSlowness: new Float64Array([80, 80, 80]),
      observedSlowness: [80, 100, NaN],
    });
    expect(p).toBeInstanceOf(Float64Array);
    expect(p[0]).toBeCloseTo(PN, 6);
    expect(toGradient(p[1])).toBeCloseTo(0.72608, 9);
    expect(Number.isNaN(p[2])).toBe(true);
  });

  it('honours a calibrated exponent', () => {
    // n = 2: 1 − 0.535 × 0.64 = 0.6576 psi/ft.
    const p = eatonSonic({ overburdenPa: 1, normalPa: 0.465, normalSlowness: 80, observedSlowness: 100, exponent: 2 });
    expect(p).toBeCloseTo(0.6576, 12);
  });

  it('rejects bad input with exact messages', () => {
    expect(() => eatonSonic({ overburdenPa: [1, 1], normalPa: 0.465, normalSlowness: 80, observedSlowness: [1, 2, 3] })).toThrow(
      new Error('eatonSonic: observedSlowness has length 3 but overburdenPa has length 2'),
    );
    expect(() => eatonSonic({ overburdenPa: 1, normalPa: 0.465, normalSlowness: 80, observedSlowness: 0 })).toThrow(
      new Error('eatonSonic: observedSlowness must be > 0 (got 0)'),
    );
    expect(() => eatonSonic({ overburdenPa: 1, normalPa: 0.465, normalSlowness: 80, observedSlowness: 90, exponent: 0 })).toThrow(
      new Error('eatonSonic: exponent must be > 0 (got 0)'),
    );
  });
});

describe('eatonResistivity', () => {
  it('hand-computed: R/R_n = 0.5 → 0.76713 psi/ft', () => {
    // Eaton 1975: P/D = 1 − 0.535 × 0.5^1.2 = 1 − 0.535 × 0.435275 = 0.767128 psi/ft.
    const p = eatonResistivity({ overburdenPa: S, normalPa: PN, normalResistivity: 2, observedResistivity: 1 });
    expect(toGradient(p)).toBeCloseTo(0.767128, 6);
  });
});

describe('eatonDexp', () => {
  it('hand-computed: dc/dc_n = 1.2/1.6 → 0.62118 psi/ft', () => {
    // Eaton 1975: P/D = 1 − 0.535 × 0.75^1.2 = 1 − 0.535 × 0.708066 = 0.621185 psi/ft.
    const p = eatonDexp({ overburdenPa: S, normalPa: PN, normalDexp: 1.6, observedDexp: 1.2 });
    expect(toGradient(p)).toBeCloseTo(0.621185, 6);
  });

  it('rejects a non-positive d-exponent', () => {
    expect(() => eatonDexp({ overburdenPa: S, normalPa: PN, normalDexp: [1.6, -1], observedDexp: 1.2 })).toThrow(
      new Error('eatonDexp: normalDexp[1] must be > 0 (got -1)'),
    );
  });
});
