import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  convert,
  unitFactor,
  isUnitName,
  UNITS_BY_QUANTITY,
  PSI_PER_FT_PER_PPG,
  G,
  PSI_PA,
  FT_M,
  YEAR_S,
  type UnitName,
} from '@shared/units';

/** Relative closeness, for constants quoted to a number of significant figures. */
function expectRel(actual: number, expected: number, relTol: number) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relTol * Math.abs(expected));
}

describe('exact constants', () => {
  it('pins the definitional constants', () => {
    // 3rd CGPM (1901): standard gravity 9.80665 m/s².
    expect(G).toBe(9.80665);
    // International yard and pound agreement (1959): 1 ft = 0.3048 m exactly.
    expect(FT_M).toBe(0.3048);
    expect(convert(1, 'ft', 'm')).toBe(0.3048);
    // 1 psi = 1 lbf/in² = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² = 6894.757293168 Pa (same agreement).
    expectRel(PSI_PA, 6894.757293168, 1e-12);
    expectRel(convert(1, 'psi', 'Pa'), (0.45359237 * 9.80665) / 0.0254 ** 2, 1e-15);
    // Oilfield constant 0.051948 = 12/231 exactly (1 US gal = 231 in³), docs/sources.md [units].
    expect(PSI_PER_FT_PER_PPG).toBe(12 / 231);
  });
});

describe('convert against handbook values', () => {
  it('pressure', () => {
    expectRel(convert(1, 'psi', 'Pa'), 6894.757293168, 1e-12); // lbf/in², as above
    expect(convert(1, 'bar', 'Pa')).toBe(1e5); // bar ≡ 100 kPa (SI brochure, non-SI units accepted)
    expect(convert(2.5, 'MPa', 'kPa')).toBe(2500);
    expectRel(convert(1000, 'psi', 'MPa'), 6.894757293168, 1e-12);
  });

  it('gradient and equivalent mud weight', () => {
    // docs/sources.md [units]: 1 ppg as EMW = 0.051948 psi/ft (12/231 exact).
    expectRel(convert(1, 'ppg', 'psi/ft'), 12 / 231, 1e-14);
    expect(convert(1, 'ppg', 'psi/ft')).toBeCloseTo(0.051948, 6);
    // docs/sources.md [units]: 1 psi/ft = 22.62059 kPa/m.
    expect(convert(1, 'psi/ft', 'kPa/m')).toBeCloseTo(22.62059, 5);
    // docs/sources.md [units]: 1 ppg = 1.175096 kPa/m.
    expect(convert(1, 'ppg', 'kPa/m')).toBeCloseTo(1.175096, 6);
    // docs/sources.md [units]: 1 MPa/km = 1 kPa/m.
    expect(convert(1, 'MPa/km', 'kPa/m')).toBe(1);
    // 1 g/cc column: ρg = 1000 × 9.80665 Pa/m (definition of the gradient of a fluid column).
    expectRel(convert(1, 'g/cc', 'Pa/m'), 9806.65, 1e-15);
    expectRel(convert(1, 'sg', 'kPa/m'), 9.80665, 1e-15);
    // Normal gradients, common practice (docs/sources.md [hydrostatic]): fresh water 0.433 psi/ft ≈ 9.79 kPa/m; brine 0.465 psi/ft ≈ 10.5 kPa/m ≈ 8.95 ppg.
    expect(convert(0.433, 'psi/ft', 'kPa/m')).toBeCloseTo(9.79, 2);
    expect(convert(0.465, 'psi/ft', 'kPa/m')).toBeCloseTo(10.5, 1);
    expect(convert(0.465, 'psi/ft', 'ppg')).toBeCloseTo(8.95, 2);
  });

  it('density', () => {
    // docs/sources.md [units]: 1 SG = 8.345404 ppg.
    expect(convert(1, 'sg', 'ppg')).toBeCloseTo(8.345404, 6);
    // NIST SP 811 (2008) App. B: 1 lb/gal (US) = 119.8264 kg/m³ (value recalled from memory); here from lb and 231 in³.
    expect(convert(1, 'ppg', 'kg/m3')).toBeCloseTo(119.8264, 4);
    expectRel(convert(1, 'ppg', 'kg/m3'), 0.45359237 / (231 * 0.0254 ** 3), 1e-15);
    expect(convert(2.3, 'g/cc', 'kg/m3')).toBeCloseTo(2300, 10);
    expect(convert(1.025, 'sg', 'g/cc')).toBe(1.025);
  });

  it('permeability, viscosity, compressibility', () => {
    // 1 D = 9.869233e-13 m² (conventional SI value of the darcy), docs/sources.md [units]: 1 mD = 9.869e-16 m².
    expect(convert(1, 'D', 'm2')).toBe(9.869233e-13);
    expectRel(convert(1, 'mD', 'm2'), 9.869233e-16, 1e-15);
    expectRel(convert(10, 'nD', 'm2'), 9.869233e-21, 1e-15); // 1 nD = 1e-9 D
    expectRel(convert(1000, 'mD', 'D'), 1, 1e-15);
    // 1 cP = 1 mPa·s (CGS poise = 0.1 Pa·s).
    expect(convert(1, 'cP', 'Pa.s')).toBe(1e-3);
    // 1/psi = 1/6894.757 per Pa → 1 /psi = 1.450377e-4 /Pa.
    expect(convert(1, '1/psi', '1/Pa')).toBeCloseTo(1.450377e-4, 10);
    expectRel(convert(1e-6, '1/psi', '1/MPa'), 1e-6 * (1e6 / 6894.757293168), 1e-12);
  });

  it('slowness, velocity, time', () => {
    // 1 us/ft = 1/0.3048 us/m.
    expectRel(convert(100, 'us/ft', 'us/m'), 100 / 0.3048, 1e-15);
    expect(convert(10000, 'ft/s', 'm/s')).toBeCloseTo(3048, 10);
    // Julian year = 365.25 d of 86,400 s (IAU) = 31,557,600 s.
    expect(convert(1, 'yr', 's')).toBe(31_557_600);
    expect(YEAR_S).toBe(31_557_600);
    expectRel(convert(1, 'Myr', 'yr'), 1e6, 1e-15);
  });
});

describe('convert kinds and errors', () => {
  it('returns a number for a number and a Float64Array for arrays, passing NaN through', () => {
    const n: number = convert(1, 'm', 'ft');
    expect(typeof n).toBe('number');
    const out = convert([0, 0.3048, NaN], 'm', 'ft');
    expect(out).toBeInstanceOf(Float64Array);
    expect(Array.from(out.slice(0, 2))).toEqual([0, 1]);
    expect(Number.isNaN(out[2])).toBe(true);
    const typed = convert(new Float64Array([1, 2]), 'MPa', 'Pa');
    expect(Array.from(typed)).toEqual([1e6, 2e6]);
  });

  it('throws exact messages for unknown units and mismatched quantities', () => {
    expect(() => convert(1, 'xyz', 'm')).toThrow(new Error('Unknown unit "xyz"'));
    expect(() => convert(1, 'm', 'xyz')).toThrow(new Error('Unknown unit "xyz"'));
    expect(() => convert(1, 'psi', 'm')).toThrow(new Error('Cannot convert "psi" to "m"'));
    expect(() => convert(1, 'mD', 'cP')).toThrow(new Error('Cannot convert "mD" to "cP"'));
    // Unit names are case-sensitive: MD (measured depth) must not pass as mD.
    expect(() => convert(1, 'MD', 'm2')).toThrow(new Error('Unknown unit "MD"'));
    expect(isUnitName('psi/ft')).toBe(true);
    expect(isUnitName('toString')).toBe(false);
    expect(unitFactor('ft', 'm')).toBe(0.3048);
  });

  it('converts among every pair of units in one picker list', () => {
    for (const [quantity, units] of Object.entries(UNITS_BY_QUANTITY)) {
      for (const a of units) for (const b of units) expect(Number.isFinite(convert(1, a, b)), `${quantity} ${a}→${b}`).toBe(true);
    }
  });
});

describe('convert properties (fast-check)', () => {
  const lists = Object.values(UNITS_BY_QUANTITY) as readonly (readonly UnitName[])[];
  const unitTriple = fc
    .constantFrom(...lists)
    .chain((units) => fc.tuple(fc.constantFrom(...units), fc.constantFrom(...units), fc.constantFrom(...units)));
  // Subnormal values lose digits in any multiplication, so they are left out.
  const value = fc.double({ min: -1e12, max: 1e12, noNaN: true }).filter((v) => v === 0 || Math.abs(v) > 1e-280);

  it('there and back returns the value', () => {
    fc.assert(
      fc.property(unitTriple, value, ([a, b], v) => {
        const back = convert(convert(v, a, b), b, a);
        return Math.abs(back - v) <= 1e-12 * Math.abs(v);
      }),
    );
  });

  it('a→b→c equals a→c', () => {
    fc.assert(
      fc.property(unitTriple, value, ([a, b, c], v) => {
        const direct = convert(v, a, c);
        return Math.abs(convert(convert(v, a, b), b, c) - direct) <= 1e-12 * Math.abs(direct);
      }),
    );
  });
});
