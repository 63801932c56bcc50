import { describe, expect, it } from 'vitest';
import { buildProfile, pressureAtDepth, type ProfileInterpretation } from '../../../shared/profile';

/**
 * A constructed offshore well whose pore pressure is known: the sonic log is made by inverting Eaton's equation
 * P = S − (S − Pn)·(Δtn/Δt)³ (Eaton 1975, SPE 5544) for a chosen pressure, so reading it back must give that pressure.
 * Rig floor 25 m above the sea, 100 m of water, mudline at 125 m below the rig floor; bulk density 2300 kg/m³ logged
 * from the mudline to 3000 m; brine 1030 kg/m³; seawater 1025 kg/m³.
 */
const g = 9.80665; // standard gravity, m/s² (CGPM 1901, NIST SP 330)
const well = { datumElevationM: 25, waterDepthM: 100, airGapM: 25 };
const trend = { matrix: 60, surface: 190, cPerM: 4.5e-4 };
const interpretation: ProfileInterpretation = {
  normalDensityKgM3: 1030,
  trend: { curve: 'sonic', model: 'exponential', fromM: 125, toM: 1500, params: trend, gammaCutoffApi: null },
  pore: { method: 'eaton-sonic', exponent: 3 },
  fracture: null,
};

/** Normal pressure: brine from sea level (25 m below the rig floor). */
const normalPa = (z: number) => 1030 * g * (z - 25);
/** Overburden: 100 m of seawater, then 2300 kg/m³ of sediment below the mudline at 125 m. */
const overburdenPa = (z: number) => 1025 * g * 100 + 2300 * g * (z - 125);
/** The chosen share of the effective stress taken by overpressure: 0 to 1500 m, rising to 0.5 at 2500 m and below. */
const share = (z: number) => 0.5 * Math.min(1, Math.max(0, (z - 1500) / 1000));
const porePa = (z: number) => normalPa(z) + share(z) * (overburdenPa(z) - normalPa(z));
/** Eaton inverted: S − P = (1 − f)(S − Pn) ⇒ Δt = Δtn·(1 − f)^(−1/3). */
const sonicUsFt = (z: number) =>
  (trend.matrix + (trend.surface - trend.matrix) * Math.exp(-trend.cPerM * (z - 125))) * (1 - share(z)) ** (-1 / 3);

function constructed(gap?: [number, number]) {
  const tvdM = Float64Array.from({ length: 3000 - 125 + 1 }, (_, i) => 125 + i);
  const sonic = tvdM.map((z) => (gap && z > gap[0] && z < gap[1] ? NaN : sonicUsFt(z)));
  return buildProfile({ well, tvdM, logs: { sonicUsFt: sonic, densityKgM3: tvdM.map(() => 2300) }, interpretation });
}

describe('pressureAtDepth: a well’s pore pressure, EMW and overpressure at one depth', () => {
  const profile = constructed();

  it('reads back the pore pressure a sonic log was built for (Eaton 1975, SPE 5544)', () => {
    const r = pressureAtDepth(profile, 2000);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // By hand at 2000 m below the rig floor (1975 m TVDSS):
    //   Pn = 1030 · 9.80665 · 1975                    = 19,949,177.8 Pa
    //   S  = 1025 · 9.80665 · 100 + 2300 · 9.80665 · 1875 = 43,296,359.8 Pa
    //   f  = 0.5 · (2000 − 1500) / 1000               = 0.25
    //   P  = Pn + f · (S − Pn)                         = 25,785,973.3 Pa
    //   EMW = P / (g · 2000)                           = 1314.72 kg/m³
    expect(r.value.hydrostaticPa).toBeCloseTo(19_949_177.8, 0);
    expect(r.value.overburdenPa).toBeCloseTo(43_296_359.8, 0);
    expect(r.value.porePa / 25_785_973.3).toBeCloseTo(1, 7);
    expect(r.value.overpressurePa / (25_785_973.3 - 19_949_177.8)).toBeCloseTo(1, 6);
    expect(r.value.poreEmwKgM3).toBeCloseTo(1314.719, 2);
    expect(r.value.tvdM).toBe(2000);
  });

  it('gives zero overpressure and the brine EMW seen from the rig floor where the log sits on its trend', () => {
    const r = pressureAtDepth(profile, 1000);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(Math.abs(r.value.overpressurePa)).toBeLessThan(1);
    // 1030 · (1000 − 25) / 1000 = 1004.25 kg/m³
    expect(r.value.poreEmwKgM3).toBeCloseTo(1004.25, 6);
  });

  it('interpolates between samples and never extrapolates below the deepest one', () => {
    const r = pressureAtDepth(profile, 2999.5);
    expect(r.ok && r.value.porePa).toBeCloseTo(porePa(2999.5), -1);
    expect(pressureAtDepth(profile, 3000.5)).toEqual({
      ok: false,
      reason: 'its pore-pressure curve ends at 2975 m TVDSS, above the depth',
    });
    expect(pressureAtDepth(profile, 100)).toEqual({ ok: false, reason: 'the depth lies above its mudline (100 m TVDSS)' });
  });

  it('uses the bridged pore curve across a log gap: linear between the samples either side', () => {
    const gapped = constructed([1900, 2100]);
    const r = pressureAtDepth(gapped, 2000);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    // 2000 m is midway between the last sample above the gap (1900 m) and the first below it (2100 m).
    expect(r.value.porePa / ((porePa(1900) + porePa(2100)) / 2)).toBeCloseTo(1, 7);
  });

  it('says why there is no value for a well without a pore-pressure method or a usable log', () => {
    const tvdM = Float64Array.from([125, 1000, 2000]);
    const none = buildProfile({ well, tvdM, logs: { sonicUsFt: tvdM.map(sonicUsFt) }, interpretation: { ...interpretation, pore: null } });
    expect(pressureAtDepth(none, 1500)).toEqual({
      ok: false,
      reason: 'no log-derived pore pressure: the interpretation has no pore-pressure method',
    });
    const noSonic = buildProfile({ well, tvdM, logs: { densityKgM3: tvdM.map(() => 2300) }, interpretation });
    const r = pressureAtDepth(noSonic, 1500);
    expect(r).toEqual({
      ok: false,
      reason: 'no log-derived pore pressure: Pore pressure by eaton-sonic needs a sonic log, which this well does not have.',
    });
    expect(() => pressureAtDepth(none, Number.NaN)).toThrow('pressureAtDepth: tvdM must be a finite depth > 0 (got NaN)');
  });
});
