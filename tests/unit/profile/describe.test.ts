import { describe, expect, it } from 'vitest';
import { describeInterpretation, startingPore } from '@shared/profile';

describe('describeInterpretation', () => {
  it('writes every setting needed to reproduce the curves', () => {
    const facts = describeInterpretation(
      {
        normalDensityKgM3: 1030,
        trend: {
          curve: 'sonic',
          model: 'exponential',
          fromM: 747.5,
          toM: 3557,
          params: { matrix: 60, surface: 190, cPerM: 4.5e-4 },
          gammaCutoffApi: 70,
        },
        pore: { method: 'eaton-sonic', exponent: 3, smoothingM: 20 },
        fracture: { method: 'eaton', poissonTop: 0.25, poissonGradientPerKm: 0.05 },
      },
      { tvdM: 3657.2, method: 'auto', confidence: 'medium', marginKgM3: 35.95, minThicknessM: 50 },
    );
    expect(facts).toEqual({
      'Normal pore fluid': '1030 kg/m3',
      'Normal compaction trend':
        'sonic, Δt_n = 60 + (190 − 60)·exp(−0.00045·z) µs/ft, z below mudline in m; fitted over 747.5–3557 m TVD below the rig datum on shale samples (gamma ray ≥ 70 API)',
      'Pore pressure': 'Eaton (1975) on sonic, exponent 3; log smoothed by a 20 m running median',
      'Fracture pressure': "Eaton (1969), Poisson's ratio 0.25 at the mudline + 0.05 per km",
      'Top of overpressure': '3657.2 m TVD below the rig datum (auto, medium confidence; margin 35.95 kg/m3 EMW over at least 50 m)',
    });
  });

  it('names Bowers with its published units and says what is missing', () => {
    const facts = describeInterpretation(
      {
        normalDensityKgM3: 1030,
        trend: null,
        pore: { method: 'bowers', v0: 5000, A: 4.4561, B: 0.8168, unloading: { vMaxMs: 3500, U: 3.13 } },
        fracture: { method: 'matthews-kelly', ki: 0.7 },
      },
      null,
    );
    expect(facts['Normal compaction trend']).toBe('none');
    expect(facts['Pore pressure']).toBe(
      'Bowers (1995), V0 5000 ft/s, A 4.456, B 0.8168 (V in ft/s, σ in psi), unloading from 3500 m/s with U 3.13; log as recorded',
    );
    expect(facts['Fracture pressure']).toBe('Matthews & Kelly (1967), Ki 0.7');
    expect(facts['Top of overpressure']).toBe('not picked');
  });
});

describe('startingPore', () => {
  it('starts Eaton at the published exponents and keeps the smoothing of the settings it replaces', () => {
    // Eaton 1975, SPE 5544: exponent 3 on sonic, 1.2 on resistivity; 20 m smoothing is common practice, no source.
    expect(startingPore('eaton-sonic')).toEqual({ method: 'eaton-sonic', exponent: 3, smoothingM: 20 });
    expect(startingPore('eaton-resistivity', { smoothingM: 35 })).toEqual({ method: 'eaton-resistivity', exponent: 1.2, smoothingM: 35 });
    expect(startingPore('bowers', null)).toMatchObject({ method: 'bowers', unloading: null, smoothingM: 20 });
  });
});
