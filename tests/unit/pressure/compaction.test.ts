import { describe, expect, it } from 'vitest';
import { compactionScreen, convert, diffusionTime, gibsonExcessRatio } from '@shared/pressure';

const base = { porosity: 0.2, fluidCompressibilityPerPa: 4.5e-10, viscosityPaS: 1e-3, lengthM: 100 };
const years = (s: number) => convert(s, 's', 'yr');

describe('diffusionTime', () => {
  it('hand-computed τ = (φβf + βr)ηL²/k', () => {
    // (0.2 × 4.5e-10 + 1e-9) × 1e-3 × 100² / 9.869233e-16 = 1.09e-8 / 9.869233e-16 s.
    const tau = diffusionTime({ ...base, rockCompressibilityPerPa: 1e-9, permeabilityM2: convert(1, 'mD', 'm2') });
    expect(tau).toBeCloseTo(1.09e-8 / 9.869233e-16, 3);
  });

  it('1 mD drains 100 m in about a year or less', () => {
    // Fact of the trade (docs/sources.md [diffusion]): L = 100 m, k ≈ 1 mD → about a year or less.
    for (const rockCompressibilityPerPa of [1e-10, 1e-9]) {
      const tau = diffusionTime({ ...base, rockCompressibilityPerPa, permeabilityM2: convert(1, 'mD', 'm2') });
      expect(years(tau)).toBeLessThanOrEqual(1);
    }
  });

  it('10 nD takes 1e4–1e5 years', () => {
    // docs/sources.md [diffusion]: k ≈ 10 nD → 10⁴–10⁵ years. With βr = 1e-9 (soft shale) τ ≈ 35,000 yr; with the
    // stiff end βr = 1e-10 it is ≈ 6,100 yr, so the stated range is an order of magnitude, not a bound.
    const soft = years(diffusionTime({ ...base, rockCompressibilityPerPa: 1e-9, permeabilityM2: convert(10, 'nD', 'm2') }));
    const stiff = years(diffusionTime({ ...base, rockCompressibilityPerPa: 1e-10, permeabilityM2: convert(10, 'nD', 'm2') }));
    expect(soft).toBeGreaterThanOrEqual(1e4);
    expect(soft).toBeLessThanOrEqual(1e5);
    expect(stiff).toBeGreaterThan(5e3);
    expect(stiff).toBeLessThan(soft);
  });

  it('maps arrays and rejects non-positive permeability', () => {
    const tau = diffusionTime({ ...base, rockCompressibilityPerPa: 1e-9, permeabilityM2: [1e-15, 1e-20] });
    expect(tau).toBeInstanceOf(Float64Array);
    expect(tau[1] / tau[0]).toBeCloseTo(1e5, 6); // τ ∝ 1/k
    expect(() => diffusionTime({ ...base, rockCompressibilityPerPa: 1e-9, permeabilityM2: 0 })).toThrow(
      new Error('diffusionTime: permeabilityM2 must be > 0 (got 0)'),
    );
  });
});

describe('compactionScreen', () => {
  const shale = { thicknessM: 1000, porosity: 0.3, fluidCompressibilityPerPa: 4.5e-10, rockCompressibilityPerPa: 1e-9, viscosityPaS: 1e-3 };

  it('T = m²t/c_v equals τ/t_burial and uses c_v = k/(η S_s)', () => {
    const r = compactionScreen({ ...shale, sedimentationRateMPerMyr: 500, permeabilityM2: 1e-20 });
    // Gibson 1958: T = m² t / c_v; with t = h/m, T = m h / c_v = (h²/c_v)/(h/m) = τ/t.
    const Ss = 0.3 * 4.5e-10 + 1e-9;
    const cv = 1e-20 / (1e-3 * Ss);
    const m = 500 / convert(1, 'Myr', 's');
    expect(r.storagePerPa).toBeCloseTo(Ss, 20);
    expect(r.cvM2PerS).toBeCloseTo(cv, 20);
    expect(r.T).toBeCloseTo((m * 1000) / cv, 9);
    expect(r.T).toBeCloseTo(r.tauYears / r.burialYears, 9);
    expect(r.burialYears).toBeCloseTo(2e6, 3); // 1000 m at 500 m/Myr
    expect(r.excessRatio).toBeCloseTo(gibsonExcessRatio({ T: r.T, zeta: 0 }), 12);
  });

  it('sorts the regimes by Gibson T (≲ 0.1 drained, ≳ 1 retained; Gibson 1958, docs/sources.md [gibson1958])', () => {
    const sand = compactionScreen({ ...shale, sedimentationRateMPerMyr: 500, permeabilityM2: convert(1, 'mD', 'm2') });
    expect(sand.T).toBeLessThan(0.1);
    expect(sand.verdict).toBe('likely-drained');
    const tight = compactionScreen({ ...shale, sedimentationRateMPerMyr: 1000, permeabilityM2: convert(1, 'nD', 'm2') });
    expect(tight.T).toBeGreaterThan(1);
    expect(tight.verdict).toBe('likely-retained');
    expect(tight.excessRatio).toBeGreaterThan(0.3);
    // Choose k so that T = 0.3, between the two thresholds.
    const Ss = 0.3 * 4.5e-10 + 1e-9;
    const m = 100 / convert(1, 'Myr', 's');
    const k = (m * 1000 * 1e-3 * Ss) / 0.3;
    const middle = compactionScreen({ ...shale, sedimentationRateMPerMyr: 100, permeabilityM2: k });
    expect(middle.T).toBeCloseTo(0.3, 9);
    expect(middle.verdict).toBe('transitional');
  });

  it('rejects a zero sedimentation rate', () => {
    expect(() => compactionScreen({ ...shale, sedimentationRateMPerMyr: 0, permeabilityM2: 1e-20 })).toThrow(
      new Error('compactionScreen: sedimentationRateMPerMyr must be > 0 (got 0)'),
    );
  });
});
