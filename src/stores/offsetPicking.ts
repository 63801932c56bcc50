import { computed, ref } from 'vue';
import { defineStore } from 'pinia';
import type { OffsetSetEntry } from '@shared/schemas/planning';
import * as planning from '@/api/planning';
import { useRequest } from '@/composables/useRequest';
import { useAtlasViewStore } from './atlasView';

/** An offset well ticked in the table, not necessarily saved yet. */
export interface OffsetPick {
  wellId: string;
  name: string;
  reason: string;
}

const sameSet = (picks: readonly OffsetPick[], saved: readonly OffsetSetEntry[]) =>
  picks.length === saved.length && picks.every((p) => saved.some((s) => s.wellId === p.wellId && (s.reason ?? '') === p.reason.trim()));

const picksOf = (saved: readonly OffsetSetEntry[]): OffsetPick[] =>
  saved.map((s) => ({ wellId: s.wellId, name: s.name, reason: s.reason ?? '' }));

/**
 * Offset picking for the selected planned well: its saved offset set, the ranked candidates of a search, and the
 * ticks not saved yet. Selecting a planned well loads its set, which becomes the starting picks.
 * @example
 * const offsets = useOffsetPickingStore();
 * await offsets.selectPlannedWell(plannedWellId);
 * await offsets.search({ radiusKm: 25 });
 * offsets.setPicked(wellId, name, true); await offsets.save();
 */
export const useOffsetPickingStore = defineStore('offsetPicking', () => {
  const view = useAtlasViewStore();
  const candidatesRequest = useRequest(planning.listOffsetCandidates);
  const picks = ref<OffsetPick[]>([]);
  const savedRequest = useRequest(planning.getOffsetSet, { onDone: (found) => (picks.value = picksOf(found)) });

  const candidates = computed(() => candidatesRequest.data.value ?? []);
  const saved = computed(() => savedRequest.data.value ?? []);
  const pickedIds = computed(() => new Set(picks.value.map((p) => p.wellId)));
  const dirty = computed(() => !sameSet(picks.value, saved.value));

  function reset(): void {
    candidatesRequest.reset();
    savedRequest.reset();
    picks.value = [];
  }

  /** Selects a planned well (or none) and loads its saved offset set, which becomes the starting picks. */
  async function selectPlannedWell(id: string | null): Promise<void> {
    if (view.selection.plannedWellId === id && savedRequest.state.value !== 'idle') return;
    view.select({ plannedWellId: id, hoverWellId: null });
    reset();
    if (!id) return;
    await savedRequest.run(view.requireTeam(), id);
  }

  async function search(query: planning.OffsetSearch): Promise<void> {
    const id = view.selection.plannedWellId;
    if (!id) throw new Error('No planned well selected');
    await candidatesRequest.run(view.requireTeam(), id, query);
  }

  function setPicked(wellId: string, name: string, on: boolean): void {
    const has = pickedIds.value.has(wellId);
    if (on && !has) picks.value = [...picks.value, { wellId, name, reason: '' }];
    if (!on && has) picks.value = picks.value.filter((p) => p.wellId !== wellId);
  }

  function setReason(wellId: string, reason: string): void {
    picks.value = picks.value.map((p) => (p.wellId === wellId ? { ...p, reason } : p));
  }

  /** Saves the ticked wells as the planned well's offset set (replacing it); the reply says who and when. */
  async function save(): Promise<OffsetSetEntry[]> {
    const id = view.selection.plannedWellId;
    if (!id) throw new Error('No planned well selected');
    const body = { wells: picks.value.map((p) => ({ wellId: p.wellId, reason: p.reason.trim() || null })) };
    const answer = await planning.putOffsetSet(view.requireTeam(), id, body);
    if (view.selection.plannedWellId === id) {
      savedRequest.data.value = answer;
      picks.value = picksOf(answer);
      const inSet = new Set(answer.map((s) => s.wellId));
      if (candidatesRequest.data.value) {
        candidatesRequest.data.value = candidatesRequest.data.value.map((c) => ({ ...c, inOffsetSet: inSet.has(c.wellId) }));
      }
    }
    return answer;
  }

  return {
    candidates,
    candidatesState: candidatesRequest.state,
    candidatesError: candidatesRequest.error,
    saved,
    savedState: savedRequest.state,
    savedError: savedRequest.error,
    picks,
    pickedIds,
    dirty,
    reset,
    selectPlannedWell,
    search,
    setPicked,
    setReason,
    save,
  };
});
