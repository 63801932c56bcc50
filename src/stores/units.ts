import { ref, watch } from 'vue';
import { defineStore } from 'pinia';
import { readStored, writeStored } from '@/utils/storage';

/** Depth units a person can read depths in. */
export const DISPLAY_DEPTH_UNITS = ['m', 'ft'] as const;
export type DisplayDepthUnit = (typeof DISPLAY_DEPTH_UNITS)[number];

/** Pressure units offered for reading pressures (names as `convert` from @shared/units knows them). */
export const DISPLAY_PRESSURE_UNITS = ['MPa', 'bar', 'psi', 'kPa'] as const;
export type DisplayPressureUnit = (typeof DISPLAY_PRESSURE_UNITS)[number];

/** Equivalent-mud-weight units: densities (ppg, sg) and gradients (kPa/m, psi/ft). */
export const DISPLAY_EMW_UNITS = ['sg', 'ppg', 'kPa/m', 'psi/ft'] as const;
export type DisplayEmwUnit = (typeof DISPLAY_EMW_UNITS)[number];

export interface UnitPreferences {
  depth: DisplayDepthUnit;
  pressure: DisplayPressureUnit;
  emw: DisplayEmwUnit;
}

// Same `porelith.` prefix as the keys in utils/storage.ts.
export const UNITS_STORAGE_KEY = 'porelith.units';

export const DEFAULT_UNITS: UnitPreferences = { depth: 'm', pressure: 'MPa', emw: 'sg' };

const pick = <T extends string>(allowed: readonly T[], value: unknown, fallback: T): T =>
  allowed.includes(value as T) ? (value as T) : fallback;

/**
 * Preferences from their stored JSON; anything missing or garbled falls back to the default, one unit at a time.
 * @example readUnitPreferences('{"depth":"ft"}') // { depth: 'ft', pressure: 'MPa', emw: 'sg' }
 */
export function readUnitPreferences(stored: string | null): UnitPreferences {
  let raw: Record<string, unknown> = {};
  try {
    const parsed: unknown = stored ? JSON.parse(stored) : {};
    if (parsed && typeof parsed === 'object') raw = parsed as Record<string, unknown>;
  } catch {
    // A garbled value is forgotten, not an error.
  }
  return {
    depth: pick(DISPLAY_DEPTH_UNITS, raw.depth, DEFAULT_UNITS.depth),
    pressure: pick(DISPLAY_PRESSURE_UNITS, raw.pressure, DEFAULT_UNITS.pressure),
    emw: pick(DISPLAY_EMW_UNITS, raw.emw, DEFAULT_UNITS.emw),
  };
}

/**
 * The units a person reads depths, pressures and EMW in, remembered in localStorage across visits.
 * Values inside the app stay SI; these only decide how they are shown and typed.
 * @example
 * const units = useUnitsStore();
 * units.depth = 'ft'; // every depth column now reads in feet
 */
export const useUnitsStore = defineStore('units', () => {
  const initial = readUnitPreferences(readStored(UNITS_STORAGE_KEY));
  const depth = ref<DisplayDepthUnit>(initial.depth);
  const pressure = ref<DisplayPressureUnit>(initial.pressure);
  const emw = ref<DisplayEmwUnit>(initial.emw);

  watch([depth, pressure, emw], () => {
    writeStored(UNITS_STORAGE_KEY, JSON.stringify({ depth: depth.value, pressure: pressure.value, emw: emw.value }));
  });

  return { depth, pressure, emw };
});
