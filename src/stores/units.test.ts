// @vitest-environment happy-dom
import { beforeEach, describe, expect, it } from 'vitest';
import { nextTick } from 'vue';
import { createPinia, setActivePinia } from 'pinia';
import { DEFAULT_UNITS, readUnitPreferences, UNITS_STORAGE_KEY, useUnitsStore } from './units';

describe('unit preferences', () => {
  beforeEach(() => {
    localStorage.clear();
    setActivePinia(createPinia());
  });

  it('starts from the defaults, remembers a change, and a fresh store (next visit) reads it back', async () => {
    const units = useUnitsStore();
    expect({ depth: units.depth, pressure: units.pressure, emw: units.emw }).toEqual(DEFAULT_UNITS);
    units.depth = 'ft';
    units.emw = 'ppg';
    await nextTick();
    expect(JSON.parse(localStorage.getItem(UNITS_STORAGE_KEY) ?? '{}')).toEqual({ depth: 'ft', pressure: 'MPa', emw: 'ppg' });

    setActivePinia(createPinia());
    expect(useUnitsStore().depth).toBe('ft');
    expect(useUnitsStore().emw).toBe('ppg');
  });

  it('falls back unit by unit on a garbled or partial stored value', () => {
    expect(readUnitPreferences('{"depth":"ft","pressure":"furlongs"}')).toEqual({ depth: 'ft', pressure: 'MPa', emw: 'sg' });
    expect(readUnitPreferences('not json')).toEqual(DEFAULT_UNITS);
    expect(readUnitPreferences(null)).toEqual(DEFAULT_UNITS);
  });
});
