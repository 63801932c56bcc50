import { computed, onScopeDispose, toValue, type MaybeRefOrGetter } from 'vue';
import { listWells, type WellListParams } from '@/api/wells';
import { useRequest } from './useRequest';

// Long enough to let a name be typed, short enough to feel immediate (common practice, no source).
export const WELL_SEARCH_PAUSE_MS = 250;

export interface WellSearchOptions {
  limit: number;
  sort?: WellListParams['sort'];
}

/**
 * Searches the team's wells by name, UWI or operator for a picker: `searchSoon` waits for a pause in typing,
 * and only the latest search may show its answer.
 * @example
 * const wells = useWellSearch(teamId, { limit: 20, sort: 'name' });
 * wells.searchSoon('AVX'); // later: wells.results.value, wells.state.value, wells.error.value
 */
export function useWellSearch(teamId: MaybeRefOrGetter<string | null>, options: WellSearchOptions) {
  const request = useRequest((team: string, q: string) => listWells(team, { q, limit: options.limit, sort: options.sort }));
  const results = computed(() => request.data.value?.items ?? []);
  let timer: ReturnType<typeof setTimeout> | undefined;

  async function search(q: string): Promise<void> {
    clearTimeout(timer);
    const team = toValue(teamId);
    if (team) await request.run(team, q);
  }

  function searchSoon(q: string): void {
    clearTimeout(timer);
    timer = setTimeout(() => void search(q), WELL_SEARCH_PAUSE_MS);
  }

  /** Drops a search still waiting for the pause. */
  function cancel(): void {
    clearTimeout(timer);
  }

  /** Forgets the results; an answer still on its way is dropped. */
  function clear(): void {
    cancel();
    request.reset();
  }

  onScopeDispose(() => clearTimeout(timer));

  return { results, state: request.state, error: request.error, search, searchSoon, cancel, clear };
}
