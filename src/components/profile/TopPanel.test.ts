// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import { PROFILE_DEFAULTS } from '@shared/profile';
import TopPanel from './TopPanel.vue';

const props = (emw: 'sg' | 'ppg' | 'kPa/m') => ({
  top: null,
  settings: PROFILE_DEFAULTS.top,
  suggestedTvdM: null,
  hasPore: true,
  frame: { mode: 'tvd', datum: 'rt', unit: 'm' } as const,
  datums: { seaLevelTvdM: 25, mudlineTvdM: 125 },
  units: { pressure: 'MPa', emw } as const,
  editable: true,
  savedBy: null,
});

describe('TopPanel margin hint', () => {
  it('gives the default in the field unit as well as in ppg', () => {
    // 0.3 ppg × 119.826 kg/m³ per ppg = 35.9 kg/m³ = 0.036 SG; × 9.80665 m/s² = 0.35 kPa/m (common practice, no source)
    expect(mount(TopPanel, { props: props('sg') }).text()).toContain('default 0.3 ppg = 0.036 SG; common practice, no source');
    expect(mount(TopPanel, { props: props('kPa/m') }).text()).toContain('default 0.3 ppg = 0.35 kPa/m; common practice, no source');
    expect(mount(TopPanel, { props: props('ppg') }).text()).toContain('default 0.3 ppg; common practice, no source');
  });
});
