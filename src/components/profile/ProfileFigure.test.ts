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
    trend: {
      curve: 'sonic',
      model: 'exponential',
      fromM: 500,
      toM: 1500,
      params: { matrix: 60, surface: 190, cPerM: 4.5e-4 },
      gammaCutoffApi: null,
    },
    pore: { method: 'eaton-sonic', exponent: 3 },
    fracture: { method: 'eaton', poissonTop: 0.3, poissonGradientPerKm: 0.04 },
  },
});
const obs = (
  id: string,
  kind: PressureObservation['kind'],
  quality: PressureObservation['quality'],
  tvd: number,
  kgM3: number,
): PressureObservation => ({
  id,
  kind,
  quality,
  mdM: tvd,
  tvdM: tvd,
  valueEntered: 0,
  unitEntered: 'MPa',
  valueSi: kgM3 * G * tvd,
  emwKgM3: kgM3,
  fluid: null,
  observedOn: null,
  source: null,
});

function mountFigure(props: Record<string, unknown> = {}) {
  return mount(ProfileFigure, {
    props: {
      profile,
      observations: [
        obs('a', 'formation_test', 'good', 1200, 1040),
        obs('b', 'formation_test', 'tight', 1300, 1100),
        obs('c', 'lot', 'good', 800, 1600),
        obs('d', 'mud_weight', 'unknown', 900, 1100),
      ],
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
    expect(keys).toEqual([
      'hydrostatic',
      'overburden',
      'pore',
      'fracture',
      'mud',
      'obs-Leak-off test',
      'obs-Formation test (tight, supercharged or doubtful)',
      'obs-Formation test (good)',
      'top',
      'trend',
      'tops',
    ]);
    const ys = w.findAll('[data-legend]').map((g) => Number(/translate\([^,]+, ([\d.]+)\)/.exec(g.attributes('transform') ?? '')![1]));
    for (let i = 1; i < ys.length; i++) expect(ys[i] - ys[i - 1]).toBeGreaterThanOrEqual(14);
    // mud weights are a line, not points: three point observations
    expect(w.findAll('[data-testid="observations"] path')).toHaveLength(3);
    expect(w.get('[data-testid="top-marker"]').text()).toBe('TOP 5,823 ft');
  });

  it('says "Synthetic demo data" in the figure only for demo data', () => {
    expect(mountFigure({ synthetic: true }).get('[data-testid="figure-synthetic"]').text()).toBe('Synthetic demo data');
    expect(mountFigure().find('[data-testid="figure-synthetic"]').exists()).toBe(false);
  });

  it('draws formation-top names and the TOP label over the curves, each on a halo', () => {
    const w = mountFigure();
    const html = w.get('[data-testid="pressure-plot"]').html();
    const label = w.get('[data-testid="formation-top-label"]');
    expect(label.text()).toBe('Pellam Clay');
    expect(label.attributes('paint-order')).toBe('stroke');
    expect(label.attributes('stroke')).toBe('#FFFFFF');
    // drawn after (so over) the pore and fracture curves
    expect(html.indexOf('formation-top-label')).toBeGreaterThan(html.indexOf('curve-pore'));
    expect(w.get('[data-testid="top-label"]').attributes('paint-order')).toBe('stroke');
  });

  it('in MD mode plots on MD: the depth axis and the TOP line follow the bore', () => {
    const deviated = buildProfile({
      well: { datumElevationM: 25, waterDepthM: 100, airGapM: 25 },
      tvdM,
      // vertical to 1000 m, then 1.5 m along the hole per metre down (about 48° from vertical)
      mdM: tvdM.map((z) => (z < 1000 ? z : 1000 + 1.5 * (z - 1000))),
      logs: { sonicUsFt: tvdM.map((z) => 60 + 130 * Math.exp(-4.5e-4 * (z - 125))) },
      interpretation: { normalDensityKgM3: 1030, trend: null, pore: null, fracture: null },
    });
    const at = (mode: 'tvd' | 'md') => {
      const w = mountFigure({ profile: deviated, frame: { mode, datum: 'rt', unit: 'm' }, pick: { tvdM: 1500, label: 'TOP' } });
      const line = w.get('[data-testid="top-marker"] line');
      return { label: w.get('[data-testid="depth-axis-label"]').text(), y: Number(line.attributes('y1')) };
    };
    // plot area from y = 74 to 646 (profileLayout at 680 px); the axis runs from 0 to the deepest sample
    const yOf = (depth: number, deepest: number) => 74 + (depth / deepest) * (646 - 74);
    const tvd = at('tvd');
    const md = at('md');
    expect(tvd.label).toBe('TVD below rotary table (m)');
    expect(md.label).toBe('MD from rotary table (m)');
    expect(tvd.y).toBeCloseTo(yOf(1500, 2399), 6);
    // 1500 m TVD is 1750 m MD; the deepest sample 2399 m TVD is 3098.5 m MD
    expect(md.y).toBeCloseTo(yOf(1750, 3098.5), 6);
  });
});
