import { computed, ref, watch, type Ref } from 'vue';
import { storeToRefs } from 'pinia';
import { useUnitsStore } from '@/stores/units';
import { useSessionStore } from '@/stores/session';
import { readStored, writeStored } from '@/utils/storage';
import type { DepthDatum, DepthFrame, DepthMode } from '@/plots/depthFrame';
import type { PressureView, ValueUnits } from '@/plots/valueAxis';

export interface ProfilePreferences {
  view: PressureView;
  mode: DepthMode;
  datum: DepthDatum;
}

export const DEFAULT_PROFILE_PREFERENCES: ProfilePreferences = { view: 'pressure', mode: 'tvd', datum: 'rt' };

/** Per-user key, so two people sharing a browser keep their own views. */
export const profilePreferencesKey = (userId: string | null) => `porelith.profile.${userId ?? 'anonymous'}`;

/**
 * Stored preferences, each field checked on its own; anything garbled falls back to the default.
 * @example readProfilePreferences('{"view":"emw"}'); // { view: 'emw', mode: 'tvd', datum: 'rt' }
 */
export function readProfilePreferences(stored: string | null): ProfilePreferences {
  let raw: Record<string, unknown> = {};
  try {
    const parsed: unknown = stored ? JSON.parse(stored) : {};
    if (parsed && typeof parsed === 'object') raw = parsed as Record<string, unknown>;
  } catch {
    // forgotten, not an error
  }
  const pick = <T extends string>(allowed: readonly T[], v: unknown, d: T) => (allowed.includes(v as T) ? (v as T) : d);
  return {
    view: pick(['pressure', 'emw'], raw.view, DEFAULT_PROFILE_PREFERENCES.view),
    mode: pick(['tvd', 'md'], raw.mode, DEFAULT_PROFILE_PREFERENCES.mode),
    datum: pick(['rt', 'sl', 'ml'], raw.datum, DEFAULT_PROFILE_PREFERENCES.datum),
  };
}

/**
 * The reader's units (the app-wide unit preferences store: depth, pressure, EMW) plus the profile's own choices
 * (pressure or EMW view, TVD or MD, depth datum), remembered per user in localStorage.
 * @example const { frame, units, view } = useProfileUnits(); view.value = 'emw';
 */
export function useProfileUnits() {
  const store = useUnitsStore();
  const { depth, pressure, emw } = storeToRefs(store);
  const session = useSessionStore();
  const key = computed(() => profilePreferencesKey(session.user?.id ?? null));
  const initial = readProfilePreferences(readStored(key.value));
  const view = ref<PressureView>(initial.view);
  const mode = ref<DepthMode>(initial.mode);
  const datum = ref<DepthDatum>(initial.datum);
  watch(key, (k) => {
    const p = readProfilePreferences(readStored(k));
    [view.value, mode.value, datum.value] = [p.view, p.mode, p.datum];
  });
  watch([view, mode, datum], () => writeStored(key.value, JSON.stringify({ view: view.value, mode: mode.value, datum: datum.value })));

  const frame = computed<DepthFrame>(() => ({ mode: mode.value, datum: datum.value, unit: depth.value }));
  const units = computed<ValueUnits>(() => ({ pressure: pressure.value, emw: emw.value }));
  return { view, mode, datum, depthUnit: depth as Ref<typeof depth.value>, pressureUnit: pressure, emwUnit: emw, frame, units };
}
