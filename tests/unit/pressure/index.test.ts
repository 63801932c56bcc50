import { describe, expect, it } from 'vitest';
import * as pressure from '@shared/pressure';

describe('@shared/pressure public API', () => {
  it('re-exports the unit constants as their definitions give them', () => {
    // 12 in/ft ÷ 231 in³/gal: the psi/ft of 1 ppg, exact (docs/sources.md [units]).
    expect(pressure.PSI_PER_FT_PER_PPG).toBe(12 / 231);
    // Standard gravity, 9.80665 m/s² exactly (3rd CGPM 1901; NIST SP 811).
    expect(pressure.G).toBe(9.80665);
    // 1 psi = 1 lbf/in² = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² = 6894.757293168361 Pa (NIST SP 811: 6.894 757 E+03).
    expect(pressure.PSI_PA).toBe(6894.757293168361);
    // 1 ft = 0.3048 m exactly (international yard and pound, 1959; NIST SP 811).
    expect(pressure.FT_M).toBe(0.3048);
  });

  it('computes the oilfield hydrostatic check through the barrel: 10 ppg at 10,000 ft → 5194.8 psi', () => {
    // p[psi] = 0.051948 × MW[ppg] × TVD[ft] = 0.051948 × 10 × 10,000 = 5194.8 psi (12/231 × 10⁵ = 5194.805 psi).
    const pa = pressure.hydrostatic(pressure.convert(10_000, 'ft', 'm'), pressure.convert(10, 'ppg', 'kg/m3'));
    expect(pressure.convert(pa, 'Pa', 'psi')).toBeCloseTo((12 / 231) * 1e5, 6);
  });
});
