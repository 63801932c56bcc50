import { describe, expect, it } from 'vitest';
import { topOfOverpressure } from '@shared/pressure';

// Synthetic profile, 10 m sampling from 0 to 4000 m: hydrostatic 10,500 Pa/m (0.465 psi/ft, docs/sources.md [hydrostatic])
// down to 2500 m, then a ramp of +3000 Pa/m of extra pressure below it (a true top at 2500 m).
const normal = 10_500;
const margin = 470; // ≈ 0.4 ppg, inside the 0.3–0.5 ppg of common practice, no source (docs/sources.md [margins])
const tvdM = Array.from({ length: 401 }, (_, i) => i * 10);
function profile(): number[] {
  return tvdM.map((z) => normal * z + (z > 2500 ? 3000 * (z - 2500) : 0));
}

describe('topOfOverpressure', () => {
  it('finds the true top, not a one-sample spike above it', () => {
    const porePa = profile();
    porePa[150] += 5e6; // 1500 m: one noisy sample far above the threshold
    const top = topOfOverpressure({ tvdM, porePa, normalGradientPaM: normal, marginPaM: margin, minThicknessM: 50 });
    // Threshold (10,500 + 470)·z is first exceeded where 3000·(z − 2500) > 470·z, i.e. z > 2967 m → 2970 m.
    expect(top).toEqual({ tvdM: 2970, index: 297 });
  });

  it('with zero thickness a single spike is enough, which is why the thickness exists', () => {
    const porePa = profile();
    porePa[150] += 5e6;
    const top = topOfOverpressure({ tvdM, porePa, normalGradientPaM: normal, marginPaM: margin, minThicknessM: 0 });
    expect(top).toEqual({ tvdM: 1500, index: 150 });
  });

  it('skips NaN samples without breaking a run', () => {
    const porePa = profile();
    for (let i = 298; i < 305; i++) porePa[i] = NaN;
    const top = topOfOverpressure({ tvdM, porePa, normalGradientPaM: normal, marginPaM: margin, minThicknessM: 50 });
    expect(top).toEqual({ tvdM: 2970, index: 297 });
  });

  it('is null for a normally pressured well and for a run cut off by the base of the log', () => {
    const hydro = tvdM.map((z) => normal * z);
    expect(topOfOverpressure({ tvdM, porePa: hydro, normalGradientPaM: normal, marginPaM: margin, minThicknessM: 50 })).toBeNull();
    const shortRun = hydro.slice();
    shortRun[399] += 5e6;
    shortRun[400] += 5e6; // 3990–4000 m: only 10 m thick at the base
    expect(topOfOverpressure({ tvdM, porePa: shortRun, normalGradientPaM: normal, marginPaM: margin, minThicknessM: 50 })).toBeNull();
  });

  it('measures normal pressure from the datum offset', () => {
    // Depths from a rig floor 25 m above sea level: hydrostatic from sea level is not overpressure.
    const porePa = tvdM.map((z) => normal * Math.max(0, z - 25));
    expect(topOfOverpressure({ tvdM, porePa, normalGradientPaM: normal, marginPaM: 0, minThicknessM: 50, datumOffsetM: 25 })).toBeNull();
  });

  it('rejects bad input with exact messages', () => {
    expect(() =>
      topOfOverpressure({ tvdM: [0, 20, 10], porePa: [0, 0, 0], normalGradientPaM: normal, marginPaM: 0, minThicknessM: 0 }),
    ).toThrow(new Error('topOfOverpressure: tvdM must be sorted ascending (tvdM[2] = 10 after 20)'));
    expect(() => topOfOverpressure({ tvdM: [0, 10], porePa: [0, 0], normalGradientPaM: normal, marginPaM: -1, minThicknessM: 0 })).toThrow(
      new Error('topOfOverpressure: marginPaM must be >= 0 (got -1)'),
    );
    expect(() => topOfOverpressure({ tvdM: [0, 10], porePa: [0], normalGradientPaM: normal, marginPaM: 0, minThicknessM: 0 })).toThrow(
      new Error('topOfOverpressure: porePa has length 1 but tvdM has length 2'),
    );
  });
});
