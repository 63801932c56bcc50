import { computed, onScopeDispose, ref, watch, type Ref } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import type { WellList } from '@shared/schemas/wells';
import { listWells } from '@/api/wells';
import { isFiltered, listParamsFromState, routeFromState, stateFromRoute, type WellTableState } from '@/components/well/wellTableState';
import { useRequest } from './useRequest';

/** Typing pauses this long before the search goes to the server. */
export const SEARCH_DELAY_MS = 300;

const sameQuery = (a: object, b: object) => JSON.stringify(a) === JSON.stringify(b);

/**
 * One page of the team's wells, driven by search, filters, sort and page that live in the address
 * (so the browser's back button and shared links restore the view). The search box is debounced.
 * @example
 * const wells = useWellList(toRef(team, 'currentTeamId'));
 * wells.update({ status: ['drilled'] }); // back to page 1, reloaded
 */
export function useWellList(teamId: Ref<string | null>) {
  const route = useRoute();
  const router = useRouter();
  const state = ref<WellTableState>(stateFromRoute(route.query));
  const searchText = ref(state.value.q);

  const request = useRequest<WellList>(() =>
    teamId.value ? listWells(teamId.value, listParamsFromState(state.value)) : Promise.resolve({ total: 0, items: [] }),
  );

  /** Changes part of the state; anything but a page change starts again on page 1. */
  function update(patch: Partial<WellTableState>): void {
    const next = { ...state.value, ...patch };
    if (!('page' in patch)) next.page = 1;
    if (sameQuery(next, state.value)) return;
    state.value = next;
  }

  let timer: ReturnType<typeof setTimeout> | undefined;
  // A dozen lines of debounce rather than a dependency for it.
  watch(searchText, (text) => {
    clearTimeout(timer);
    timer = setTimeout(() => update({ q: text }), SEARCH_DELAY_MS);
  });
  onScopeDispose(() => clearTimeout(timer));

  watch(
    state,
    (value) => {
      void request.run();
      const query = routeFromState(value);
      if (!sameQuery(query, routeFromState(stateFromRoute(route.query)))) void router.replace({ query });
    },
    { deep: true },
  );

  // A link to /wells?q=… while the table is open (e.g. from the import outcome) changes the state too.
  watch(
    () => route.query,
    (query) => {
      if (route.name !== 'wells') return;
      const fromRoute = stateFromRoute(query);
      if (sameQuery(routeFromState(fromRoute), routeFromState(state.value))) return;
      state.value = fromRoute;
      searchText.value = fromRoute.q;
    },
  );

  // A new object always fires the state watcher, so another team reloads even when already on page 1.
  watch(teamId, () => (state.value = { ...state.value, page: 1 }));
  void request.run();

  const wells = computed(() => request.data.value?.items ?? []);
  const total = computed(() => request.data.value?.total ?? 0);
  const filtered = computed(() => isFiltered(state.value));

  /** Clears search and filters, keeping sort and page size. */
  function clearFilters(): void {
    searchText.value = '';
    clearTimeout(timer);
    update({ q: '', status: [], pressuresOnly: false });
  }

  return {
    state,
    searchText,
    wells,
    total,
    filtered,
    loadState: request.state,
    error: request.error,
    update,
    clearFilters,
    reload: request.run,
  };
}
