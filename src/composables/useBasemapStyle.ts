import { watch, type Ref } from 'vue';
import type { StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import { fetchBasemapStyle } from '@/api/map';
import { useRequest } from './useRequest';
import type { ThemeMode } from './useTheme';

/**
 * The basemap style for the current theme, fetched once per theme and kept for switching back.
 * @example const { style, state } = useBasemapStyle(mode); // style.value is null until loaded
 */
export function useBasemapStyle(theme: Ref<ThemeMode>) {
  const cache = new Map<ThemeMode, StyleSpecification>();
  // A quick double toggle may answer out of order; only the theme chosen last wins (useRequest's rule).
  const request = useRequest(async (mode: ThemeMode) => {
    const cached = cache.get(mode);
    if (cached) return cached;
    const fetched = await fetchBasemapStyle(mode);
    cache.set(mode, fetched);
    return fetched;
  });

  watch(theme, (mode) => void request.run(mode), { immediate: true });
  return { style: request.data, state: request.state, error: request.error, reload: () => request.run(theme.value) };
}
