import { ref, shallowRef, watch, type Ref } from 'vue';
import type { StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import { fetchBasemapStyle } from '@/api/map';
import type { LoadState } from '@/stores/session';
import type { ThemeMode } from './useTheme';

/**
 * The basemap style for the current theme, fetched once per theme and kept for switching back.
 * @example const { style, state } = useBasemapStyle(mode); // style.value is null until loaded
 */
export function useBasemapStyle(theme: Ref<ThemeMode>) {
  const cache = new Map<ThemeMode, StyleSpecification>();
  const style = shallowRef<StyleSpecification | null>(null);
  const state = ref<LoadState>('idle');
  const error = ref<string | null>(null);

  async function load(mode: ThemeMode): Promise<void> {
    const cached = cache.get(mode);
    if (cached) {
      style.value = cached;
      state.value = 'done';
      return;
    }
    state.value = 'loading';
    error.value = null;
    try {
      const fetched = await fetchBasemapStyle(mode);
      cache.set(mode, fetched);
      // A quick double toggle may answer out of order; only the theme still chosen wins.
      if (theme.value !== mode) return;
      style.value = fetched;
      state.value = 'done';
    } catch (e) {
      if (theme.value !== mode) return;
      error.value = (e as Error).message;
      state.value = 'error';
    }
  }

  watch(theme, (mode) => void load(mode), { immediate: true });
  return { style, state, error, reload: () => load(theme.value) };
}
