import { describe, expect, it } from 'vitest';
import * as pressure from '@shared/pressure';

describe('@shared/pressure public API', () => {
  it('re-exports the unit helpers and constants alongside the physics', () => {
    const functions = [
      'convert',
      'emw',
      'hydrostatic',
      'overburden',
      'gardnerDensity',
      'athyPorosity',
      'bulkDensityFromPorosity',
      'compactionDensity',
      'fitNormalTrend',
      'eatonSonic',
      'eatonResistivity',
      'eatonDexp',
      'bowersLoading',
      'bowersUnloading',
      'bowersVelocityLoading',
      'bowersVelocityUnloading',
      'fractureEaton',
      'fractureMatthewsKelly',
      'fractureHubbertWillis',
      'maxAllowableMudWeight',
      'topOfOverpressure',
      'diffusionTime',
      'gibsonExcessRatio',
      'gibsonExcessProfile',
      'compactionScreen',
    ] as const;
    for (const name of functions) expect(typeof pressure[name], name).toBe('function');
    // Constants as pinned in REFERENCES.md and the unit definitions.
    expect(pressure.PSI_PER_FT_PER_PPG).toBe(12 / 231);
    expect(pressure.G).toBe(9.80665);
    expect(pressure.PSI_PA).toBe(6894.757293168361);
    expect(pressure.FT_M).toBe(0.3048);
    expect(pressure.UNITS_BY_QUANTITY.pressure).toContain('psi');
  });
});
