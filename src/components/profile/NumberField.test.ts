// @vitest-environment happy-dom
import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import NumberField from './NumberField.vue';
import { clampTyped } from './numberRange';

describe('typed numbers out of range', () => {
  it('are set to the nearest limit and say so', () => {
    expect(clampTyped(-2, 0.1, 10)).toEqual({ value: 0.1, message: '−2 is below the lowest allowed, 0.1: set to 0.1.' });
    expect(clampTyped(12, 0.1, 10)).toEqual({ value: 10, message: '12 is above the highest allowed, 10: set to 10.' });
    expect(clampTyped(3, 0.1, 10)).toEqual({ value: 3, message: null });
    expect(clampTyped(-5)).toEqual({ value: -5, message: null });
  });

  it('the field shows the message under the input and emits the clamped value', async () => {
    const w = mount(NumberField, { props: { label: 'Eaton exponent n', value: 3, min: 0.1, max: 10, testid: 'exp' } });
    const input = w.get('input');
    await input.setValue('-2');
    await input.trigger('blur');
    expect(w.emitted('update:value')?.at(-1)).toEqual([0.1]);
    expect(w.get('[data-testid="exp-clamped"]').text()).toBe('−2 is below the lowest allowed, 0.1: set to 0.1.');
  });

  it('drops the message when the person comes back to the field, even if the value stays the same', async () => {
    const w = mount(NumberField, { props: { label: 'Log smoothing', value: 0, min: 0, max: 500, testid: 'sm' } });
    await w.get('input').setValue('-5');
    await w.get('input').trigger('blur');
    expect(w.find('[data-testid="sm-clamped"]').exists()).toBe(true);
    await w.get('input').trigger('focus');
    expect(w.find('[data-testid="sm-clamped"]').exists()).toBe(false);
  });
});
