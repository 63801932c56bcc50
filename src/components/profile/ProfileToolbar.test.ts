// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import ProfileToolbar from './ProfileToolbar.vue';

const base = { view: 'pressure', mode: 'tvd', datum: 'rt', depthUnit: 'm', pressureUnit: 'MPa', emwUnit: 'sg', zoomed: false } as const;

describe('ProfileToolbar', () => {
  it('offers TVD and MD unless told not to', () => {
    expect(
      mount(ProfileToolbar, { props: { ...base } })
        .find('[data-testid="mode-md"]')
        .exists(),
    ).toBe(true);
    expect(
      mount(ProfileToolbar, { props: { ...base, allowMd: false } })
        .find('[data-testid="mode-md"]')
        .exists(),
    ).toBe(false);
  });
});
