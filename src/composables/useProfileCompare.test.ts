import { describe, expect, it } from 'vitest';
import { G } from '@shared/units';
import { buildProfile } from '@shared/profile';
import type { PressureObservation } from '@shared/schemas/wells';
import { parseWellIds, summarise, windowBasisText } from './useProfileCompare';
import { pickCurves, profileWell } from './useProfileData';
import { readProfilePreferences } from './useProfileUnits';

const obs = (
  kind: PressureObservation['kind'],
  kgM3: number,
  tvdM: number,
  quality: PressureObservation['quality'] = 'good',
): PressureObservation => ({
  id: `${kind}-${tvdM}`,
  kind,
  quality,
  mdM: tvdM,
  tvdM,
  valueEntered: 0,
  unitEntered: 'MPa',
  valueSi: kgM3 * G * tvdM,
  emwKgM3: kgM3,
  fluid: null,
  observedOn: null,
  source: null,
});

describe('comparison helpers', () => {
  it('reads the wells query', () => {
    expect(parseWellIds(' a, b,a ,,c')).toEqual(['a', 'b', 'c']);
    expect(parseWellIds(['a,b', 'c'])).toEqual(['a', 'b', 'c']);
    expect(parseWellIds(undefined)).toEqual([]);
  });

  it('without an interpretation, reads max EMW from good tests and the window from shoe tests and mud', () => {
    const s = summarise(null, [
      obs('formation_test', 1250, 2000),
      obs('formation_test', 1400, 2100, 'tight'),
      obs('lot', 1700, 1500),
      obs('mud_weight', 1450, 2400),
    ]);
    expect(s.maxEmwKgM3).toBeCloseTo(1250, 9);
    expect(s.maxEmwBasis).toBe('measured');
    expect(s.window.widthKgM3).toBeCloseTo(250, 9);
    expect(s.windowBasis).toBe('LOT and mud weights');
  });

  it('with interpreted pore and fracture curves, uses them', () => {
    const tvdM = Float64Array.from({ length: 1000 }, (_, i) => 1000 + i);
    const profile = buildProfile({
      well: { datumElevationM: 25, waterDepthM: 100, airGapM: 25 },
      tvdM,
      logs: { sonicUsFt: tvdM.map(() => 100) },
      interpretation: {
        normalDensityKgM3: 1030,
        trend: null,
        pore: { method: 'bowers', v0: 5000, A: 4.4561, B: 0.8168, unloading: null },
        fracture: { method: 'matthews-kelly', ki: 0.6 },
      },
    });
    const s = summarise(profile, []);
    expect(s.maxEmwBasis).toBe('interpreted');
    expect(s.windowBasis).toBe('interpreted');
    expect(s.window.widthKgM3).toBe(profile.window.widthKgM3);
  });
});

describe('window basis text', () => {
  // Offshore: RT 25 m above the sea, mudline 546 m below RT.
  const datums = { seaLevelTvdM: 25, mudlineTvdM: 546 };
  it('names the depth of the narrowest window in the page unit and datum', () => {
    expect(windowBasisText('interpreted', 3655, { mode: 'tvd', datum: 'sl', unit: 'm' }, datums)).toBe(
      'fracture − pore at 3,630 m TVD below sea level (interpreted)',
    );
    // 3655 − 546 = 3109 m = 10,200 ft (1 ft = 0.3048 m)
    expect(windowBasisText('interpreted', 3655, { mode: 'tvd', datum: 'ml', unit: 'ft' }, datums)).toBe(
      'fracture − pore at 10,200 ft TVD below mudline (interpreted)',
    );
  });
  it('for a measured window, the shoe test depth', () => {
    expect(windowBasisText('LOT and mud weights', 1525, { mode: 'tvd', datum: 'sl', unit: 'm' }, datums)).toBe(
      'shoe test at 1,500 m TVD below sea level − heaviest mud below it',
    );
    expect(windowBasisText('none', NaN, { mode: 'tvd', datum: 'sl', unit: 'm' }, datums)).toBe('no data');
  });
});

describe('profile data helpers', () => {
  it('picks the longest curve of each role and ignores others', () => {
    const c = (id: string, role: 'sonic' | 'caliper', samples: number) => ({
      id,
      mnemonic: id,
      unit: 'us/ft',
      description: '',
      role,
      samples,
      topMdM: 0,
      baseMdM: 1,
      uploadId: null,
    });
    const picked = pickCurves([c('a', 'sonic', 10), c('b', 'sonic', 20), c('c', 'caliper', 99)]);
    expect(picked.sonic?.id).toBe('b');
    expect(Object.keys(picked)).toEqual(['sonic']);
  });
  it('fills a missing air gap from the datum offshore and 0 on land', () => {
    expect(profileWell({ datumElevationM: 25, waterDepthM: 100, airGapM: null, groundElevationM: null, offshore: true })).toEqual({
      datumElevationM: 25,
      waterDepthM: 100,
      airGapM: 25,
    });
    expect(profileWell({ datumElevationM: 310, waterDepthM: null, airGapM: null, groundElevationM: null, offshore: false })).toEqual({
      datumElevationM: 310,
      waterDepthM: 0,
      airGapM: 0,
    });
    // On land the rig floor stands above the ground: depths below the "mudline" start at the ground.
    expect(profileWell({ datumElevationM: 310, waterDepthM: null, airGapM: null, groundElevationM: 302, offshore: false })).toEqual({
      datumElevationM: 310,
      waterDepthM: 0,
      airGapM: 8,
    });
  });
  it('reads stored profile preferences field by field', () => {
    expect(readProfilePreferences('{"view":"emw","datum":"xx"}')).toEqual({ view: 'emw', mode: 'tvd', datum: 'rt' });
    expect(readProfilePreferences('not json')).toEqual({ view: 'pressure', mode: 'tvd', datum: 'rt' });
  });
});
