import { shallowRef } from 'vue';
import type { PlannedWell, Prospect } from '@shared/schemas/planning';
import type { Surface, SurfaceSummary } from '@shared/schemas/surfaces';
import { listPlannedWells } from '@/api/planning';
import { deleteSurface, getProspect, getSurface, listSurfaces, plannedWellSurfaceValue } from '@/api/surfaces';
import { useRequest } from './useRequest';

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
  const plannedValues = shallowRef<PlannedWellValue[]>([]);
  const loading = useRequest(
    (teamId: string, prospectId: string) =>
      Promise.all([getProspect(teamId, prospectId), listPlannedWells(teamId), listSurfaces(teamId, prospectId)]),
    {
      onDone: ([p, planned, runs], _teamId, prospectId) => {
        prospect.value = p;
        plannedWells.value = planned.filter((w) => w.prospectId === prospectId);
        list.value = runs;
      },
    },
  );
  const showing = useRequest(
    (teamId: string, surfaceId: string, known?: Surface) => (known ? Promise.resolve(known) : getSurface(teamId, surfaceId)),
    { onDone: () => (plannedValues.value = []) },
  );

  async function load(teamId: string, prospectId: string): Promise<void> {
    await loading.run(teamId, prospectId);
  }

  async function refreshList(teamId: string, prospectId: string): Promise<void> {
    try {
      list.value = await listSurfaces(teamId, prospectId);
    } catch (e) {
      loading.error.value = message(e);
    }
  }

  async function loadPlannedValues(teamId: string, surface: Surface): Promise<void> {
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
    // A later show (or clear) has replaced the surface meanwhile: these values belong to another.
    if (showing.data.value === surface) plannedValues.value = values;
  }

  /** Shows a stored run; `known` skips the fetch when the surface is already at hand (a run just finished). */
  async function show(teamId: string, surfaceId: string, known?: Surface): Promise<void> {
    const surface = await showing.run(teamId, surfaceId, known);
    if (surface) await loadPlannedValues(teamId, surface);
  }

  function clear(): void {
    showing.reset();
    plannedValues.value = [];
  }

  async function remove(teamId: string, prospectId: string, surfaceId: string): Promise<void> {
    await deleteSurface(teamId, surfaceId);
    if (showing.data.value?.id === surfaceId) clear();
    await refreshList(teamId, prospectId);
  }

  return {
    prospect,
    plannedWells,
    list,
    state: loading.state,
    error: loading.error,
    current: showing.data,
    currentState: showing.state,
    currentError: showing.error,
    plannedValues,
    load,
    refreshList,
    show,
    clear,
    remove,
  };
}
