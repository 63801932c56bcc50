import { computed, ref, shallowRef } from 'vue';
import { defineStore } from 'pinia';
import type { PlannedWell, PlannedWellBody, Prospect, ProspectBody } from '@shared/schemas/planning';
import type { WellSummary } from '@shared/schemas/wells';
import { listWellsForMap } from '@/api/map';
import * as planning from '@/api/planning';
import { useRequest } from '@/composables/useRequest';
import { useAtlasViewStore } from './atlasView';
import { useOffsetPickingStore } from './offsetPicking';

async function fetchTeamPlan(teamId: string) {
  const [prospects, plannedWells, wells] = await Promise.all([
    planning.listProspects(teamId),
    planning.listPlannedWells(teamId),
    listWellsForMap(teamId),
  ]);
  return { prospects, plannedWells, wells };
}

/**
 * The team's prospects and planned wells, and the wells they are placed among (for framing and offset marks). The map
 * view, its panels and the prospects list read it; every change goes to the server first and lands here from its answer.
 * @example
 * const plan = usePlanningStore();
 * await plan.load(teamId);
 * await plan.createProspect(body);
 */
export const usePlanningStore = defineStore('planning', () => {
  const view = useAtlasViewStore();
  const offsets = useOffsetPickingStore();
  const prospects = ref<Prospect[]>([]);
  const plannedWells = ref<PlannedWell[]>([]);
  const wells = shallowRef<WellSummary[]>([]);
  const wellsTotal = ref(0);
  /**
   * Bumped after every edit so the map fetches fresh team tiles. It starts from the clock, not 0, so a
   * reloaded page never asks again for a `?v=` URL the browser already holds from before the reload.
   */
  const tileVersion = ref(Date.now());
  const request = useRequest(fetchTeamPlan, {
    onDone: (found) => {
      prospects.value = found.prospects;
      plannedWells.value = found.plannedWells;
      wells.value = found.wells.items;
      wellsTotal.value = found.wells.total;
    },
  });

  const wellsById = computed(() => new Map(wells.value.map((w) => [w.id, w])));
  const selectedPlannedWell = computed(() => plannedWells.value.find((p) => p.id === view.selection.plannedWellId) ?? null);
  const selectedProspect = computed(() => prospects.value.find((p) => p.id === view.selection.prospectId) ?? null);

  /** Opens the team's plan with nothing selected; a slower answer for a team switched away from is dropped. */
  async function load(teamId: string): Promise<void> {
    view.open(teamId);
    offsets.reset();
    await request.run(teamId);
  }

  function bumpTiles(): void {
    tileVersion.value += 1;
  }

  async function createProspect(body: ProspectBody): Promise<Prospect> {
    const created = await planning.createProspect(view.requireTeam(), body);
    prospects.value = [...prospects.value, created];
    bumpTiles();
    return created;
  }

  /** Rejects with 409 `conflict` when the prospect changed since it was loaded; `reloadProspects` fetches them anew. */
  async function updateProspect(id: string, body: ProspectBody, version: number): Promise<Prospect> {
    const updated = await planning.updateProspect(view.requireTeam(), id, { ...body, version });
    prospects.value = prospects.value.map((p) => (p.id === id ? updated : p));
    bumpTiles();
    return updated;
  }

  async function reloadProspects(): Promise<void> {
    prospects.value = await planning.listProspects(view.requireTeam());
    bumpTiles();
  }

  async function deleteProspect(id: string): Promise<void> {
    await planning.deleteProspect(view.requireTeam(), id);
    prospects.value = prospects.value.filter((p) => p.id !== id);
    plannedWells.value = plannedWells.value.map((w) => (w.prospectId === id ? { ...w, prospectId: null } : w));
    if (view.selection.prospectId === id) view.select({ prospectId: null });
    bumpTiles();
  }

  async function createPlannedWell(body: PlannedWellBody): Promise<PlannedWell> {
    const created = await planning.createPlannedWell(view.requireTeam(), body);
    plannedWells.value = [...plannedWells.value, created];
    bumpTiles();
    return created;
  }

  async function deletePlannedWell(id: string): Promise<void> {
    await planning.deletePlannedWell(view.requireTeam(), id);
    plannedWells.value = plannedWells.value.filter((p) => p.id !== id);
    if (view.selection.plannedWellId === id) {
      view.select({ plannedWellId: null });
      offsets.reset();
    }
    bumpTiles();
  }

  return {
    state: request.state,
    error: request.error,
    prospects,
    plannedWells,
    wells,
    wellsTotal,
    wellsById,
    tileVersion,
    selectedPlannedWell,
    selectedProspect,
    load,
    bumpTiles,
    createProspect,
    updateProspect,
    reloadProspects,
    deleteProspect,
    createPlannedWell,
    deletePlannedWell,
  };
});
