import { ref, watch } from 'vue';
import { defineStore } from 'pinia';
import type { ReferenceLayer } from '@shared/schemas/planning';
import * as layersApi from '@/api/layers';
import { readReferenceToggles, withoutReference, type ReferenceToggles } from '@/map/layerToggles';
import { useRequest } from '@/composables/useRequest';
import { readStored, writeStored } from '@/utils/storage';
import { useAtlasViewStore } from './atlasView';

// Same `porelith.` prefix as the keys in utils/storage.ts.
export const ATLAS_REFERENCE_TOGGLES_KEY = 'porelith.atlas.referenceLayers';

/**
 * The team's uploaded reference layers (lease blocks, pipelines, …) and which are switched on, remembered across visits.
 * Loaded apart from the rest of the Atlas: a failing layer list costs the reference layers, not the map.
 * @example
 * const references = useReferenceLayersStore();
 * await references.load(teamId);
 * references.setToggle(layerId, false);
 */
export const useReferenceLayersStore = defineStore('referenceLayers', () => {
  const view = useAtlasViewStore();
  const layers = ref<ReferenceLayer[]>([]);
  const list = useRequest((teamId: string) => layersApi.listReferenceLayers(teamId), { onDone: (found) => (layers.value = found) });
  const toggles = ref<ReferenceToggles>(readReferenceToggles(readStored(ATLAS_REFERENCE_TOGGLES_KEY)));
  watch(toggles, (t) => writeStored(ATLAS_REFERENCE_TOGGLES_KEY, JSON.stringify(t)), { deep: true });

  async function load(teamId: string): Promise<void> {
    layers.value = [];
    await list.run(teamId);
  }

  /** Uploads a layer and shows it at once; rejects with the server's ApiClientError, which names the feature or field. */
  async function upload(fields: layersApi.ReferenceLayerFields, file: File): Promise<ReferenceLayer> {
    const teamId = view.requireTeam();
    const created = await layersApi.uploadReferenceLayer(teamId, fields, file);
    if (view.teamId === teamId) {
      layers.value = [...layers.value, created].sort((a, b) => a.name.localeCompare(b.name));
      toggles.value = { ...toggles.value, [created.id]: true };
    }
    return created;
  }

  async function remove(layerId: string): Promise<void> {
    await layersApi.deleteReferenceLayer(view.requireTeam(), layerId);
    layers.value = layers.value.filter((l) => l.id !== layerId);
    toggles.value = withoutReference(toggles.value, layerId);
  }

  function setToggle(layerId: string, on: boolean): void {
    toggles.value = { ...toggles.value, [layerId]: on };
  }

  return { layers, state: list.state, error: list.error, toggles, load, upload, remove, setToggle };
});
