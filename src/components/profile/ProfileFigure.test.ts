// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import { G } from '@shared/units';
import { buildProfile } from '@shared/profile';
import type { PressureObservation } from '@shared/schemas/wells';
import ProfileFigure from './ProfileFigure.vue';

const tvdM = Float64Array.from({ length: 2000 }, (_, i) => 400 + i);
const profile = buildProfile({
  well: { datumElevationM: 25, waterDepthM: 100, airGapM: 25 },
  tvdM,
  logs: { sonicUsFt: tvdM.map((z) => 60 + 130 * Math.exp(-4.5e-4 * (z - 125))), gammaApi: tvdM.map(() => 90) },
  interpretation: {
    normalDensityKgM3: 1030,
    trend: { curve: 'sonic', model: 'exponential', fromM: 500, toM: 1500, params: { matrix: 60, surface: 190, cPerM: 4.5e-4 }, gammaCutoffApi: null },
    pore: { method: 'eaton-sonic', exponent: 3 },
    fracture: { method: 'eaton', poissonTop: 0.3, poissonGradientPerKm: 0.04 },
  },
});
const obs = (id: string, kind: PressureObservation['kind'], quality: PressureObservation['quality'], tvd: number, kgM3: number): PressureObservation => ({
  id, kind, quality, mdM: tvd, tvdM: tvd, valueEntered: 0, unitEntered: 'MPa', valueSi: kgM3 * G * tvd, emwKgM3: kgM3, fluid: null, observedOn: null, source: null,
});

function mountFigure(props: Record<string, unknown> = {}) {
  return mount(ProfileFigure, {
    props: {
      profile,
      observations: [obs('a', 'formation_test', 'good', 1200, 1040), obs('b', 'formation_test', 'tight', 1300, 1100), obs('c', 'lot', 'good', 800, 1600), obs('d', 'mud_weight', 'unknown', 900, 1100)],
      tops: [{ name: 'Pellam Clay', mdM: 700, tvdM: 700 }],
      frame: { mode: 'tvd', datum: 'sl', unit: 'ft' },
      view: 'pressure',
      units: { pressure: 'psi', emw: 'ppg' },
      title: 'Test well',
      trend: { curve: 'sonic', fromM: 500, toM: 1500 },
      pick: { tvdM: 1800, label: 'TOP 5,823 ft' },
      suggestedTvdM: null,
      editable: true,
      domain: null,
      ...props,
    },
  });
}

describe('ProfileFigure', () => {
  it('labels both axes with their units and carries the caution', () => {
    const w = mountFigure();
    expect(w.get('[data-testid="depth-axis-label"]').text()).toBe('TVD below sea level (ft)');
    expect(w.get('[data-testid="value-axis-label"]').text()).toBe('Pressure (psi)');
    expect(w.get('[data-testid="figure-caution"]').text()).toContain('verify with the responsible licensed engineer');
  });

  it('switches to EMW in the chosen unit', () => {
    const w = mountFigure({ view: 'emw', units: { pressure: 'psi', emw: 'ppg' } });
    expect(w.get('[data-testid="value-axis-label"]').text()).toBe('Equivalent mud weight from rotary table (ppg)');
  });

  it('draws each layer and legends only what is there, entries stacked without overlap', () => {
    const w = mountFigure();
    for (const id of ['curve-hydrostatic', 'curve-overburden', 'curve-pore', 'curve-fracture', 'curve-mud', 'trend-line', 'top-marker']) {
      expect(w.find(`[data-testid="${id}"]`).exists()).toBe(true);
    }
    const keys = w.findAll('[data-legend]').map((g) => g.attributes('data-legend'));
    expect(keys).toEqual(['hydrostatic', 'overburden', 'pore', 'fracture', 'mud', 'obs-Leak-off test', 'obs-Formation test (tight, supercharged or doubtful)', 'obs-Formation test (good)', 'top', 'trend', 'tops']);
    const ys = w.findAll('[data-legend]').map((g) => Number(/translate\([^,]+, ([\d.]+)\)/.exec(g.attributes('transform') ?? '')![1]));
    for (let i = 1; i < ys.length; i++) expect(ys[i] - ys[i - 1]).toBeGreaterThanOrEqual(14);
    // mud weights are a line, not points: three point observations
    expect(w.findAll('[data-testid="observations"] path')).toHaveLength(3);
    expect(w.get('[data-testid="top-marker"]').text()).toBe('TOP 5,823 ft');
  });
});
