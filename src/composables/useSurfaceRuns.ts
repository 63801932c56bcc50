import { ref, shallowRef } from 'vue';
import type { PlannedWell, Prospect } from '@shared/schemas/planning';
import type { Surface, SurfaceSummary } from '@shared/schemas/surfaces';
import { listPlannedWells } from '@/api/planning';
import { deleteSurface, getProspect, getSurface, listSurfaces, plannedWellSurfaceValue } from '@/api/surfaces';
import type { LoadState } from '@/stores/session';

/** The surface at one planned well of the prospect, in the surface's SI unit (m, kg/m³ or Pa); nulls outside the grid. */
export interface PlannedWellValue {
  plannedWellId: string;
  name: string;
  value: number | null;
  stdDev: number | null;
}

const message = (e: unknown) => (e instanceof Error ? e.message : String(e));

/**
 * A prospect's surface screen data: the prospect and its planned wells, the earlier runs, the run shown
 * and the surface at each planned well. Only the latest `show` may write, so quick clicks on the list settle
 * on the last one.
 * @example
 * const runs = useSurfaceRuns();
 * await runs.load(teamId, prospectId);
 * await runs.show(teamId, runs.list.value[0].id);
 */
export function useSurfaceRuns() {
  const prospect = shallowRef<Prospect | null>(null);
  const plannedWells = shallowRef<PlannedWell[]>([]);
  const list = shallowRef<SurfaceSummary[]>([]);
  const state = ref<LoadState>('idle');
  const error = ref<string | null>(null);
  const current = shallowRef<Surface | null>(null);
  const currentState = ref<LoadState>('idle');
  const currentError = ref<string | null>(null);
  const plannedValues = shallowRef<PlannedWellValue[]>([]);
  let latestShow = 0;

  async function load(teamId: string, prospectId: string): Promise<void> {
    state.value = 'loading';
    error.value = null;
    try {
      const [p, planned, runs] = await Promise.all([
        getProspect(teamId, prospectId),
        listPlannedWells(teamId),
        listSurfaces(teamId, prospectId),
      ]);
      prospect.value = p;
      plannedWells.value = planned.filter((w) => w.prospectId === prospectId);
      list.value = runs;
      state.value = 'done';
    } catch (e) {
      error.value = message(e);
      state.value = 'error';
    }
  }

  async function refreshList(teamId: string, prospectId: string): Promise<void> {
    try {
      list.value = await listSurfaces(teamId, prospectId);
    } catch (e) {
      error.value = message(e);
    }
  }

  async function loadPlannedValues(teamId: string, surface: Surface, call: number): Promise<void> {
    const values = await Promise.all(
      plannedWells.value.map(async (w) => {
        try {
          const v = await plannedWellSurfaceValue(teamId, surface.id, w.id);
          return { plannedWellId: w.id, name: w.name, value: v.value, stdDev: v.stdDev };
        } catch {
          return { plannedWellId: w.id, name: w.name, value: null, stdDev: null };
        }
      }),
    );
    if (call === latestShow) plannedValues.value = values;
  }

  /** Shows a stored run; `known` skips the fetch when the surface is already at hand (a run just finished). */
  async function show(teamId: string, surfaceId: string, known?: Surface): Promise<void> {
    const call = ++latestShow;
    currentState.value = 'loading';
    currentError.value = null;
    try {
      const surface = known ?? (await getSurface(teamId, surfaceId));
      if (call !== latestShow) return;
      current.value = surface;
      currentState.value = 'done';
      plannedValues.value = [];
      await loadPlannedValues(teamId, surface, call);
    } catch (e) {
      if (call !== latestShow) return;
      currentError.value = message(e);
      currentState.value = 'error';
    }
  }

  function clear(): void {
    latestShow++;
    current.value = null;
    currentState.value = 'idle';
    plannedValues.value = [];
  }

  async function remove(teamId: string, prospectId: string, surfaceId: string): Promise<void> {
    await deleteSurface(teamId, surfaceId);
    if (current.value?.id === surfaceId) clear();
    await refreshList(teamId, prospectId);
  }

  return {
    prospect,
    plannedWells,
    list,
    state,
    error,
    current,
    currentState,
    currentError,
    plannedValues,
    load,
    refreshList,
    show,
    clear,
    remove,
  };
}
