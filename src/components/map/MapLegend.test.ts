// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import { WELL_STATUSES } from '@shared/schemas/wells';
import { WELL_STATUS_LABELS } from '@/components/well/wellLabels';
import MapLegend from './MapLegend.vue';

describe('MapLegend', () => {
  it('names the well statuses with the same words as the wells table and its filter', () => {
    const wrapper = mount(MapLegend, { props: { theme: 'light' } });
    const statusItems = wrapper
      .findAll('ul')[0]
      .findAll('li')
      .map((li) => li.text());
    expect(statusItems).toEqual(WELL_STATUSES.map((s) => WELL_STATUS_LABELS[s]));
    expect(statusItems).toContain('Abandoned');
    expect(statusItems).toContain('Planned');
    expect(wrapper.text()).not.toMatch(/Plugged|spudded/);
  });
});
