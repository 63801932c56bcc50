import { ref, watch } from 'vue';
import { defineStore } from 'pinia';
import { NO_SELECTION, type AtlasSelection } from '@/map/atlasLayers';
import { readToggles, type LayerToggle, type LayerToggles } from '@/map/layerToggles';
import { readStored, writeStored } from '@/utils/storage';

// Same `porelith.` prefix as the keys in utils/storage.ts.
export const ATLAS_TOGGLES_KEY = 'porelith.atlas.layers';

/**
 * Which team's Atlas is open, which of its layers are switched on (remembered across visits) and what is selected on the map.
 * @example
 * const view = useAtlasViewStore();
 * view.open(teamId);
 * view.select({ prospectId });
 */
export const useAtlasViewStore = defineStore('atlasView', () => {
  const teamId = ref<string | null>(null);
  const toggles = ref<LayerToggles>(readToggles(readStored(ATLAS_TOGGLES_KEY)));
  watch(toggles, (t) => writeStored(ATLAS_TOGGLES_KEY, JSON.stringify(t)), { deep: true });
  const selection = ref<AtlasSelection>({ ...NO_SELECTION });

  /** A new team starts with nothing selected: the old team's ids mean nothing there. */
  function open(id: string): void {
    teamId.value = id;
    selection.value = { ...NO_SELECTION };
  }

  function requireTeam(): string {
    if (!teamId.value) throw new Error('No team selected');
    return teamId.value;
  }

  function setToggle(key: LayerToggle, on: boolean): void {
    toggles.value = { ...toggles.value, [key]: on };
  }

  function select(patch: Partial<AtlasSelection>): void {
    selection.value = { ...selection.value, ...patch };
  }

  return { teamId, toggles, selection, open, requireTeam, setToggle, select };
});
