import { describe, expect, it } from 'vitest';
import { G } from '@shared/pressure';
import { buildProfile, curveWindow, measuredWindow, PROFILE_CAUTION, profileCsv } from '@shared/profile';

describe('drilling window', () => {
  const emw = (kgM3: number, z: number) => kgM3 * G * z;

  it('from curves: heaviest pore, weakest fracture, and the narrowest margin at one depth', () => {
    const tvdM = [1000, 2000, 3000];
    const w = curveWindow(tvdM, [emw(1030, 1000), emw(1300, 2000), NaN], [emw(1600, 1000), emw(1700, 2000), emw(1000, 3000)]);
    expect(w.maxPoreKgM3).toBeCloseTo(1300, 9);
    expect(w.minFractureKgM3).toBeCloseTo(1600, 9);
    // 1600 − 1030 = 570 at 1000 m; 1700 − 1300 = 400 at 2000 m (3000 m has no pore value)
    expect(w.widthKgM3).toBeCloseTo(400, 9);
    expect(w.widthTvdM).toBe(2000);
  });

  it('as drilled: each shoe test against the heaviest mud below it, narrowest section', () => {
    const o = (kind: 'lot' | 'fit' | 'mud_weight', kgM3: number, z: number) => ({
      kind,
      quality: 'good' as const,
      tvdM: z,
      valueSi: emw(kgM3, z),
    });
    const w = measuredWindow([
      o('mud_weight', 1100, 800), // above the first shoe: no test to compare with
      o('lot', 1650, 1000),
      o('mud_weight', 1300, 1500),
      o('mud_weight', 1350, 2200), // section 1: 1650 − 1350 = 300
      o('lot', 1800, 2400),
      o('mud_weight', 1550, 2900), // section 2: 1800 − 1550 = 250
      o('fit', 1500, 3000),
    ]);
    expect(w.widthKgM3).toBeCloseTo(250, 9);
    expect(w.widthTvdM).toBe(2400);
    expect(w.maxPoreKgM3).toBeCloseTo(1550, 9);
    expect(w.minFractureKgM3).toBeCloseTo(1500, 9);
    expect(measuredWindow([o('fit', 1500, 3000), o('mud_weight', 1400, 3200)]).widthKgM3).toBeCloseTo(100, 9);
    expect(measuredWindow([o('mud_weight', 1400, 3200)]).widthKgM3).toBeNaN();
  });
});

describe('profileCsv', () => {
  const p = buildProfile({
    well: { datumElevationM: 25, waterDepthM: 100, airGapM: 25 },
    tvdM: [],
    logs: {},
    baseTvdM: 1000,
    interpretation: { normalDensityKgM3: 1030, trend: null, pore: null, fracture: null },
  });
  const csv = profileCsv(p, { wellName: 'Test, "one"', depthUnit: 'ft', pressureUnit: 'psi', emwUnit: 'ppg', meta: { Version: '3' } });
  const lines = csv.split('\r\n');

  it('starts with the caution and states the well and units', () => {
    expect(lines[0]).toBe(`# ${PROFILE_CAUTION}`);
    expect(lines[1]).toBe('# Well: Test, "one"');
    expect(lines[2]).toBe('# Version: 3');
    expect(lines[4]).toBe(
      'MD (ft),TVD (ft),TVDSS (ft),Below mudline (ft),Hydrostatic (psi),Overburden (psi),Hydrostatic EMW (ppg),Overburden EMW (ppg),Density (kg/m3),Density source',
    );
  });

  it('writes values in the chosen units: 1000 m of brine from sea level', () => {
    const last = lines[lines.length - 2].split(',');
    // 1000 m = 3280.84 ft; 1030·9.80665·975 Pa = 9,848,328 Pa = 1428.4 psi (1 psi = 6894.757 Pa)
    expect(last[1]).toBe('3280.84');
    expect(last[2]).toBe('3198.82');
    expect(Number(last[4])).toBeCloseTo(1428.4, 1);
    // EMW from the rig datum: 1030·975/1000 kg/m3 = 1004.25 kg/m3 = 8.3808 ppg (1 ppg = 119.8264 kg/m3)
    expect(Number(last[6])).toBeCloseTo(8.3808, 3);
    expect(last[9]).toBe('compaction trend');
  });

  it('says the data is synthetic on the second line when it is the demo basin', () => {
    const demo = profileCsv(p, { wellName: 'AVX-08', depthUnit: 'm', pressureUnit: 'MPa', emwUnit: 'sg', synthetic: true }).split('\r\n');
    expect(demo[0]).toBe(`# ${PROFILE_CAUTION}`);
    expect(demo[1]).toBe('# Synthetic demo data: an invented basin, not a real well.');
    expect(demo[2]).toBe('# Well: AVX-08');
    expect(lines.some((l) => l.includes('Synthetic'))).toBe(false);
  });

  it('gives the normal trend column the unit of its log', () => {
    const withTrend = (curve: 'sonic' | 'resistivity') =>
      buildProfile({
        well: { datumElevationM: 25, waterDepthM: 100, airGapM: 25 },
        tvdM: [],
        logs: {},
        baseTvdM: 1000,
        interpretation: {
          normalDensityKgM3: 1030,
          trend:
            curve === 'sonic'
              ? {
                  curve,
                  model: 'exponential',
                  fromM: 300,
                  toM: 900,
                  params: { matrix: 60, surface: 190, cPerM: 4.5e-4 },
                  gammaCutoffApi: null,
                }
              : { curve, model: 'loglinear', fromM: 300, toM: 900, params: { a: 0, b: 1e-4 }, gammaCutoffApi: null },
          pore: null,
          fracture: null,
        },
      });
    const header = (curve: 'sonic' | 'resistivity') =>
      profileCsv(withTrend(curve), { wellName: 'W', depthUnit: 'm', pressureUnit: 'MPa', emwUnit: 'sg' }).split('\r\n')[3];
    expect(header('sonic').endsWith(',Normal trend (µs/ft)')).toBe(true);
    expect(header('resistivity').endsWith(',Normal trend (ohm·m)')).toBe(true);
  });
});
