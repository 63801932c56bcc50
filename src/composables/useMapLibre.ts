import { onBeforeUnmount, ref, shallowRef, watch, type Ref } from 'vue';
import { Map as MapLibreMap, setWorkerUrl } from 'maplibre-gl';
import workerUrl from 'maplibre-gl/dist/maplibre-gl-worker.mjs?url';
import 'maplibre-gl/dist/maplibre-gl.css';
import type { StyleSpecification } from '@maplibre/maplibre-gl-style-spec';
import { keepDrawLayers } from '@/map/atlasStyle';
import type { LoadState } from '@/stores/session';

let workerSet = false;

export interface MapLibreOptions {
  /** Initial camera before the view frames the team's wells. */
  center: [number, number];
  zoom: number;
}

/**
 * One MapLibre map in `container`, created when the first style is ready and removed with the component.
 * Later styles are applied through MapLibre's style diff, so a theme switch or a selection change only
 * touches the layers that changed; the drawing tool's layers are carried over.
 * @example
 * const { map, state } = useMapLibre(containerRef, computed(() => atlasStyle(input)), { center: [0, 20], zoom: 1.5 });
 */
export function useMapLibre(container: Ref<HTMLElement | null>, style: Ref<StyleSpecification | null>, options: MapLibreOptions) {
  const map = shallowRef<MapLibreMap | null>(null);
  const state = ref<LoadState>('idle');
  const error = ref<string | null>(null);
  /** The style JSON has loaded at least once; setState needs it. */
  let styleLoaded = false;
  let pending: StyleSpecification | null = null;

  function create(el: HTMLElement, first: StyleSpecification): void {
    if (!workerSet) {
      setWorkerUrl(workerUrl);
      workerSet = true;
    }
    state.value = 'loading';
    const m = new MapLibreMap({
      container: el,
      style: first as never,
      center: options.center,
      zoom: options.zoom,
      attributionControl: { compact: true },
      dragRotate: false,
      pitchWithRotate: false,
      touchPitch: false,
      maxPitch: 0,
    });
    m.touchZoomRotate.disableRotation();
    m.keyboard.disableRotation();
    m.on('style.load', () => {
      styleLoaded = true;
      if (pending) {
        const next = pending;
        pending = null;
        apply(m, next);
      }
    });
    m.on('load', () => {
      state.value = 'done';
    });
    m.on('error', (event) => {
      // Tile errors (a 204 over open sea is not one) are logged by MapLibre; only a failed style is fatal.
      if (!styleLoaded) {
        error.value = event.error?.message ?? 'The map could not load.';
        state.value = 'error';
      }
    });
    map.value = m;
  }

  function apply(m: MapLibreMap, next: StyleSpecification): void {
    if (!styleLoaded) {
      pending = next;
      return;
    }
    // A new tile version (?v=) reaches MapLibre as a changed source, which the diff removes and adds
    // again: a short blink, but every tile is fetched anew. `setTiles` would be smoother, yet when the
    // same diff also touches a layer of that source (a selection filter), MapLibre pauses the source
    // and on resume re-lays out the tiles it holds without fetching them (maplibre-gl 6.20,
    // TileManager.resume calls reload() without sourceDataChanged), so an edit would not show.
    m.setStyle(next as never, { diff: true, transformStyle: keepDrawLayers as never });
  }

  watch(
    [container, style],
    ([el, next]) => {
      if (!el || !next) return;
      if (!map.value) create(el, next);
      else apply(map.value, next);
    },
    { immediate: true },
  );

  onBeforeUnmount(() => {
    map.value?.remove();
    map.value = null;
  });

  return { map, state, error };
}
