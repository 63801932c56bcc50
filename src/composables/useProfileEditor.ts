import { computed, ref, watch, type Ref } from 'vue';
import type { Interpretation, InterpretationContent } from '@shared/schemas/interpretations';
import { PROFILE_DEFAULTS, startingPore, type TopSettings } from '@shared/profile';
import * as profileApi from '@/api/profile';
import { ApiClientError } from '@/api/client';

/**
 * A new interpretation: brine 1030 kg/m³, Eaton on sonic with the published exponent 3, and an Eaton (1969)
 * fracture curve with ν rising from 0.30 at the mudline by 0.04 per km — starting values to be calibrated against
 * leak-off tests (common practice, no source). No trend and no top until the interpreter makes them.
 * @example defaultContent().pore; // { method: 'eaton-sonic', exponent: 3, smoothingM: 20 }
 */
export function defaultContent(): InterpretationContent {
  return {
    normalDensityKgM3: PROFILE_DEFAULTS.normalDensityKgM3,
    trend: null,
    pore: startingPore('eaton-sonic'),
    fracture: { method: 'eaton', poissonTop: 0.3, poissonGradientPerKm: 0.04 },
    top: null,
  };
}

/**
 * Who saved a version and when, for the TOP tab. Versions written by the demo seed or imported have no recorded
 * author: say so, with the version's note where there is one, rather than a vague "someone".
 * @example savedByText({ version: 1, createdByName: null, createdAt: '2026-12-02T05:40:00Z', note: 'Synthetic demo: automatic pick' });
 * // 'saved in v1 (Synthetic demo: automatic pick), 2 Dec 2026, 05:40; author not recorded'
 */
export function savedByText(v: Pick<Interpretation, 'version' | 'createdByName' | 'createdAt' | 'note'>, timeZone?: string): string {
  const when = new Date(v.createdAt).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short', timeZone });
  if (v.createdByName) return `saved by ${v.createdByName}, ${when} (v${v.version})`;
  return `saved in v${v.version}${v.note ? ` (${v.note})` : ''}, ${when}; author not recorded`;
}

/** The content fields of a saved version (drops id, version, who and when). */
export function contentOf(v: Interpretation): InterpretationContent {
  return {
    normalDensityKgM3: v.normalDensityKgM3,
    trend: v.trend,
    pore: v.pore,
    fracture: v.fracture,
    top: v.top,
  };
}

const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

export type SaveState = 'idle' | 'saving' | 'saved' | 'stale' | 'error';

/**
 * The interpretation being edited on the profile page: its content, the version it started from (sent as
 * `baseVersion`, so a newer save by someone else comes back as 409 and the page asks to reload), opening an
 * earlier version, saving and restoring.
 * @example
 * const editor = useProfileEditor(teamId, wellId, versions, reloadVersions);
 * editor.content.value.pore = { method: 'eaton-resistivity', exponent: 1.2, smoothingM: 20 };
 * await editor.save({ status: 'accepted', note: 'calibrated to RFTs' });
 */
export function useProfileEditor(
  teamId: Ref<string | null>,
  wellId: Ref<string>,
  versions: Ref<Interpretation[]>,
  reloadVersions: () => Promise<Interpretation[]>,
) {
  const content = ref<InterpretationContent>(defaultContent());
  const topSettings = ref<TopSettings>({ ...PROFILE_DEFAULTS.top });
  /** The version shown (null: a new, unsaved interpretation). */
  const opened = ref<Interpretation | null>(null);
  const baseVersion = ref<number | null>(null);
  const saved = ref<string>(JSON.stringify(content.value));
  const saveState = ref<SaveState>('idle');
  const saveError = ref<string | null>(null);

  const newest = computed(() => versions.value[0] ?? null);
  const dirty = computed(() => JSON.stringify(content.value) !== saved.value);
  const viewingOlder = computed(() => opened.value !== null && newest.value !== null && opened.value.version !== newest.value.version);

  function open(v: Interpretation | null): void {
    content.value = v ? clone(contentOf(v)) : defaultContent();
    if (v?.top) topSettings.value = { marginKgM3: v.top.marginKgM3, minThicknessM: v.top.minThicknessM };
    opened.value = v;
    saved.value = JSON.stringify(content.value);
    saveState.value = 'idle';
    saveError.value = null;
  }

  /** Opens the newest version (or a fresh interpretation) whenever the list is replaced by a load. */
  function openNewest(): void {
    baseVersion.value = newest.value?.version ?? null;
    open(newest.value);
  }

  watch(
    versions,
    (now, before) => {
      if (before === undefined || now[0]?.version !== before[0]?.version || opened.value === null) {
        if (saveState.value !== 'saving') openNewest();
      }
    },
    { immediate: true },
  );

  async function run(task: () => Promise<Interpretation>): Promise<Interpretation | null> {
    if (!teamId.value) throw new Error('No team selected');
    saveState.value = 'saving';
    saveError.value = null;
    try {
      const result = await task();
      await reloadVersions();
      baseVersion.value = result.version;
      open(result);
      saveState.value = 'saved';
      return result;
    } catch (e) {
      if (profileApi.isStaleVersion(e)) {
        saveState.value = 'stale';
        return null;
      }
      saveState.value = 'error';
      saveError.value = e instanceof ApiClientError || e instanceof Error ? e.message : String(e);
      return null;
    }
  }

  function save(opts: { status: 'accepted' | 'draft'; note: string | null }): Promise<Interpretation | null> {
    return run(() =>
      profileApi.saveInterpretation(teamId.value!, wellId.value, {
        ...clone(content.value),
        baseVersion: baseVersion.value,
        status: opts.status,
        note: opts.note,
      }),
    );
  }

  function restore(version: number): Promise<Interpretation | null> {
    return run(() => profileApi.restoreInterpretation(teamId.value!, wellId.value, version, baseVersion.value));
  }

  return { content, topSettings, opened, baseVersion, newest, dirty, viewingOlder, saveState, saveError, open, openNewest, save, restore };
}
