import { computed, ref, shallowRef, watch } from 'vue';
import { defineStore } from 'pinia';
import type {
  OffsetCandidate,
  OffsetSetEntry,
  PlannedWell,
  PlannedWellBody,
  Prospect,
  ProspectBody,
  ReferenceLayer,
} from '@shared/schemas/planning';
import type { WellSummary } from '@shared/schemas/wells';
import * as layersApi from '@/api/layers';
import { listWellsForMap } from '@/api/map';
import * as planning from '@/api/planning';
import { NO_SELECTION, type AtlasSelection } from '@/map/atlasLayers';
import {
  readReferenceToggles,
  readToggles,
  withoutReference,
  type LayerToggle,
  type LayerToggles,
  type ReferenceToggles,
} from '@/map/layerToggles';
import { candidateMarks, offsetFeatures, type OffsetFeatureCollection, type OffsetMark } from '@/map/offsetFeatures';
import { readStored, writeStored } from '@/utils/storage';
import type { LoadState } from './session';

// Same `porelith.` prefix as the keys in utils/storage.ts.
export const ATLAS_TOGGLES_KEY = 'porelith.atlas.layers';
export const ATLAS_REFERENCE_TOGGLES_KEY = 'porelith.atlas.referenceLayers';

/** An offset well ticked in the table, not necessarily saved yet. */
export interface OffsetPick {
  wellId: string;
  name: string;
  reason: string;
}

const sameSet = (picks: readonly OffsetPick[], saved: readonly OffsetSetEntry[]) =>
  picks.length === saved.length && picks.every((p) => saved.some((s) => s.wellId === p.wellId && (s.reason ?? '') === p.reason.trim()));

/**
 * The Atlas's shared state: the team's prospects, planned wells, reference layers and wells for framing, what is selected
 * on the map, and the offset picking of the selected planned well. The map view, its panels and the
 * prospects list read it; every change goes to the server first and lands here from its answer.
 * @example
 * const atlas = useAtlasStore();
 * await atlas.load(teamId);
 * await atlas.selectPlannedWell(atlas.plannedWells[0].id);
 * await atlas.searchOffsets({ radiusKm: 25 });
 */
export const useAtlasStore = defineStore('atlas', () => {
  const teamId = ref<string | null>(null);
  const state = ref<LoadState>('idle');
  const error = ref<string | null>(null);
  const prospects = ref<Prospect[]>([]);
  const plannedWells = ref<PlannedWell[]>([]);
  const wells = shallowRef<WellSummary[]>([]);
  const wellsTotal = ref(0);
  /**
   * Bumped after every edit so the map fetches fresh team tiles. It starts from the clock, not 0, so a
   * reloaded page never asks again for a `?v=` URL the browser already holds from before the reload.
   */
  const tileVersion = ref(Date.now());

  const toggles = ref<LayerToggles>(readToggles(readStored(ATLAS_TOGGLES_KEY)));
  watch(toggles, (t) => writeStored(ATLAS_TOGGLES_KEY, JSON.stringify(t)), { deep: true });

  const selection = ref<AtlasSelection>({ ...NO_SELECTION });

  const referenceLayers = ref<ReferenceLayer[]>([]);
  const referenceState = ref<LoadState>('idle');
  const referenceError = ref<string | null>(null);
  const referenceToggles = ref<ReferenceToggles>(readReferenceToggles(readStored(ATLAS_REFERENCE_TOGGLES_KEY)));
  watch(referenceToggles, (t) => writeStored(ATLAS_REFERENCE_TOGGLES_KEY, JSON.stringify(t)), { deep: true });

  const candidates = shallowRef<OffsetCandidate[]>([]);
  const candidatesState = ref<LoadState>('idle');
  const candidatesError = ref<string | null>(null);
  const savedOffsets = ref<OffsetSetEntry[]>([]);
  const offsetsState = ref<LoadState>('idle');
  const offsetsError = ref<string | null>(null);
  const picks = ref<OffsetPick[]>([]);

  const wellsById = computed(() => new Map(wells.value.map((w) => [w.id, w])));
  const selectedPlannedWell = computed(() => plannedWells.value.find((p) => p.id === selection.value.plannedWellId) ?? null);
  const selectedProspect = computed(() => prospects.value.find((p) => p.id === selection.value.prospectId) ?? null);
  const pickedIds = computed(() => new Set(picks.value.map((p) => p.wellId)));
  const offsetsDirty = computed(() => !sameSet(picks.value, savedOffsets.value));

  /** Candidates ranked by the search, plus picked wells outside it placed from the known wells. */
  const offsetMarks = computed<OffsetMark[]>(() => {
    const marks = candidateMarks(candidates.value, pickedIds.value);
    const shown = new Set(marks.map((m) => m.wellId));
    for (const p of picks.value) {
      const w = wellsById.value.get(p.wellId);
      if (!shown.has(p.wellId) && w) marks.push({ wellId: p.wellId, name: p.name, lon: w.lon, lat: w.lat, rank: null, picked: true });
    }
    return marks;
  });

  const offsetGeoJson = computed<OffsetFeatureCollection>(() => {
    const pw = selectedPlannedWell.value;
    if (!pw) return offsetFeatures(null, []);
    return offsetFeatures(pw.location.coordinates, offsetMarks.value);
  });

  function requireTeam(): string {
    if (!teamId.value) throw new Error('No team selected');
    return teamId.value;
  }

  function resetOffsets(): void {
    candidates.value = [];
    candidatesState.value = 'idle';
    candidatesError.value = null;
    savedOffsets.value = [];
    offsetsState.value = 'idle';
    offsetsError.value = null;
    picks.value = [];
  }

  /** Loads everything the Atlas shows for a team; a slower answer for a team switched away from is dropped. */
  async function load(id: string): Promise<void> {
    teamId.value = id;
    state.value = 'loading';
    error.value = null;
    selection.value = { ...NO_SELECTION };
    resetOffsets();
    // Apart from the rest: a failing layer list costs the reference layers, not the map.
    void loadReferenceLayers(id);
    try {
      const [p, pw, w] = await Promise.all([planning.listProspects(id), planning.listPlannedWells(id), listWellsForMap(id)]);
      if (teamId.value !== id) return;
      prospects.value = p;
      plannedWells.value = pw;
      wells.value = w.items;
      wellsTotal.value = w.total;
      state.value = 'done';
    } catch (e) {
      if (teamId.value !== id) return;
      error.value = (e as Error).message;
      state.value = 'error';
    }
  }

  async function loadReferenceLayers(id: string): Promise<void> {
    referenceLayers.value = [];
    referenceState.value = 'loading';
    referenceError.value = null;
    try {
      const found = await layersApi.listReferenceLayers(id);
      if (teamId.value !== id) return;
      referenceLayers.value = found;
      referenceState.value = 'done';
    } catch (e) {
      if (teamId.value !== id) return;
      referenceError.value = (e as Error).message;
      referenceState.value = 'error';
    }
  }

  /** Uploads a layer and shows it at once; rejects with the server's ApiClientError, which names the feature or field. */
  async function uploadReferenceLayer(fields: layersApi.ReferenceLayerFields, file: File): Promise<ReferenceLayer> {
    const id = requireTeam();
    const created = await layersApi.uploadReferenceLayer(id, fields, file);
    if (teamId.value === id) {
      referenceLayers.value = [...referenceLayers.value, created].sort((a, b) => a.name.localeCompare(b.name));
      referenceToggles.value = { ...referenceToggles.value, [created.id]: true };
    }
    return created;
  }

  async function deleteReferenceLayer(layerId: string): Promise<void> {
    await layersApi.deleteReferenceLayer(requireTeam(), layerId);
    referenceLayers.value = referenceLayers.value.filter((l) => l.id !== layerId);
    referenceToggles.value = withoutReference(referenceToggles.value, layerId);
  }

  function setReferenceToggle(layerId: string, on: boolean): void {
    referenceToggles.value = { ...referenceToggles.value, [layerId]: on };
  }

  function bumpTiles(): void {
    tileVersion.value += 1;
  }

  function setToggle(key: LayerToggle, on: boolean): void {
    toggles.value = { ...toggles.value, [key]: on };
  }

  function select(patch: Partial<AtlasSelection>): void {
    selection.value = { ...selection.value, ...patch };
  }

  async function createProspect(body: ProspectBody): Promise<Prospect> {
    const created = await planning.createProspect(requireTeam(), body);
    prospects.value = [...prospects.value, created];
    bumpTiles();
    return created;
  }

  /** Rejects with 409 `conflict` when the prospect changed since it was loaded; `reloadProspect` fetches it anew. */
  async function updateProspect(id: string, body: ProspectBody, version: number): Promise<Prospect> {
    const updated = await planning.updateProspect(requireTeam(), id, { ...body, version });
    prospects.value = prospects.value.map((p) => (p.id === id ? updated : p));
    bumpTiles();
    return updated;
  }

  async function reloadProspects(): Promise<void> {
    prospects.value = await planning.listProspects(requireTeam());
    bumpTiles();
  }

  async function deleteProspect(id: string): Promise<void> {
    await planning.deleteProspect(requireTeam(), id);
    prospects.value = prospects.value.filter((p) => p.id !== id);
    plannedWells.value = plannedWells.value.map((w) => (w.prospectId === id ? { ...w, prospectId: null } : w));
    if (selection.value.prospectId === id) select({ prospectId: null });
    bumpTiles();
  }

  async function createPlannedWell(body: PlannedWellBody): Promise<PlannedWell> {
    const created = await planning.createPlannedWell(requireTeam(), body);
    plannedWells.value = [...plannedWells.value, created];
    bumpTiles();
    return created;
  }

  async function deletePlannedWell(id: string): Promise<void> {
    await planning.deletePlannedWell(requireTeam(), id);
    plannedWells.value = plannedWells.value.filter((p) => p.id !== id);
    if (selection.value.plannedWellId === id) {
      select({ plannedWellId: null });
      resetOffsets();
    }
    bumpTiles();
  }

  /** Selects a planned well (or none) and loads its saved offset set, which becomes the starting picks. */
  async function selectPlannedWell(id: string | null): Promise<void> {
    if (selection.value.plannedWellId === id && offsetsState.value !== 'idle') return;
    select({ plannedWellId: id, hoverWellId: null });
    resetOffsets();
    if (!id) return;
    offsetsState.value = 'loading';
    try {
      const saved = await planning.getOffsetSet(requireTeam(), id);
      if (selection.value.plannedWellId !== id) return;
      savedOffsets.value = saved;
      picks.value = saved.map((s) => ({ wellId: s.wellId, name: s.name, reason: s.reason ?? '' }));
      offsetsState.value = 'done';
    } catch (e) {
      if (selection.value.plannedWellId !== id) return;
      offsetsError.value = (e as Error).message;
      offsetsState.value = 'error';
    }
  }

  async function searchOffsets(search: planning.OffsetSearch): Promise<void> {
    const id = selection.value.plannedWellId;
    if (!id) throw new Error('No planned well selected');
    candidatesState.value = 'loading';
    candidatesError.value = null;
    try {
      const found = await planning.listOffsetCandidates(requireTeam(), id, search);
      if (selection.value.plannedWellId !== id) return;
      candidates.value = found;
      candidatesState.value = 'done';
    } catch (e) {
      if (selection.value.plannedWellId !== id) return;
      candidatesError.value = (e as Error).message;
      candidatesState.value = 'error';
    }
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
  async function saveOffsets(): Promise<OffsetSetEntry[]> {
    const id = selection.value.plannedWellId;
    if (!id) throw new Error('No planned well selected');
    const body = { wells: picks.value.map((p) => ({ wellId: p.wellId, reason: p.reason.trim() || null })) };
    const saved = await planning.putOffsetSet(requireTeam(), id, body);
    if (selection.value.plannedWellId === id) {
      savedOffsets.value = saved;
      picks.value = saved.map((s) => ({ wellId: s.wellId, name: s.name, reason: s.reason ?? '' }));
      const inSet = new Set(saved.map((s) => s.wellId));
      candidates.value = candidates.value.map((c) => ({ ...c, inOffsetSet: inSet.has(c.wellId) }));
    }
    return saved;
  }

  return {
    teamId,
    state,
    error,
    prospects,
    plannedWells,
    wells,
    wellsTotal,
    wellsById,
    tileVersion,
    toggles,
    selection,
    referenceLayers,
    referenceState,
    referenceError,
    referenceToggles,
    candidates,
    candidatesState,
    candidatesError,
    savedOffsets,
    offsetsState,
    offsetsError,
    picks,
    pickedIds,
    offsetsDirty,
    offsetMarks,
    offsetGeoJson,
    selectedPlannedWell,
    selectedProspect,
    load,
    bumpTiles,
    setToggle,
    setReferenceToggle,
    uploadReferenceLayer,
    deleteReferenceLayer,
    select,
    createProspect,
    updateProspect,
    reloadProspects,
    deleteProspect,
    createPlannedWell,
    deletePlannedWell,
    selectPlannedWell,
    searchOffsets,
    setPicked,
    setReason,
    saveOffsets,
  };
});
