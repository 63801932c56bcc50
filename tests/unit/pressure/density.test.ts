import { describe, expect, it } from 'vitest';
import { athyPorosity, bulkDensityFromPorosity, compactionDensity, convert, gardnerDensity, SHALE_COMPACTION } from '@shared/pressure';

describe('gardnerDensity', () => {
  it('gives 2.300 g/cc at 10,000 ft/s', () => {
    // Gardner, Gardner & Gregory 1974, Geophysics 39: ρ = 0.23·V[ft/s]^0.25 → 0.23 × 10 = 2.300 g/cc.
    const rho = gardnerDensity(convert(10_000, 'ft/s', 'm/s'));
    expect(rho / 1000).toBeCloseTo(2.3, 9);
  });

  it('with the rounded metric coefficient 0.31 stays within 0.2 % of the published form', () => {
    // Gardner et al. 1974 in m/s, rounded (docs/sources.md [gardner1974]): 0.31·V[m/s]^0.25; 0.31 × 3048^0.25 = 2.3034 g/cc.
    const rho = gardnerDensity(3048, { a: 0.31 });
    expect(rho / 1000).toBeCloseTo(2.3034, 4);
    expect(Math.abs(rho / 2300 - 1)).toBeLessThan(0.002);
  });

  it('maps curves and rejects non-positive velocity', () => {
    const rho = gardnerDensity([1524, NaN]);
    expect(rho).toBeInstanceOf(Float64Array);
    expect(rho[0] / 1000).toBeCloseTo(0.23 * 5000 ** 0.25, 9); // 5000 ft/s in the ft/s form
    expect(Number.isNaN(rho[1])).toBe(true);
    expect(() => gardnerDensity(0)).toThrow(new Error('gardnerDensity: velocityMs must be > 0 (got 0)'));
  });
});

describe('Athy compaction', () => {
  it('falls to φ0/e at one decay length', () => {
    // Athy 1930, AAPG Bulletin 14: φ = φ0 exp(−c z); Sclater & Christie 1980 shale φ0 = 0.63, c = 0.51 /km.
    expect(athyPorosity(1 / 0.51e-3, 0.63, 0.51e-3)).toBeCloseTo(0.63 / Math.E, 12);
    expect(athyPorosity(0, 0.63, 0.51e-3)).toBe(0.63);
    expect(SHALE_COMPACTION.phi0).toBe(0.63);
    expect(SHALE_COMPACTION.cPerM).toBeCloseTo(0.51e-3, 15);
  });

  it('mixes grain and fluid by volume', () => {
    // ρ_b = φ ρ_f + (1 − φ) ρ_g: 0.3 × 1030 + 0.7 × 2650 = 2164 kg/m3.
    expect(bulkDensityFromPorosity(0.3, 2650, 1030)).toBeCloseTo(2164, 9);
    expect(() => bulkDensityFromPorosity(1.2, 2650, 1030)).toThrow(
      new Error('bulkDensityFromPorosity: phi must be between 0 and 1 (got 1.2)'),
    );
  });

  it('builds a density trend for synthetic wells', () => {
    const rho = compactionDensity([0, 1000, 3000], { ...SHALE_COMPACTION, fluidKgM3: 1030 });
    // At the mudline: 0.63 × 1030 + 0.37 × 2720 = 1655.3 kg/m3.
    expect(rho[0]).toBeCloseTo(1655.3, 9);
    expect(rho[1]).toBeGreaterThan(rho[0]);
    expect(rho[2]).toBeGreaterThan(rho[1]);
    expect(rho[2]).toBeLessThan(2720);
  });
});
