import { ref, shallowRef, type Ref } from 'vue';
import type { LoadState } from '@/stores/session';

/**
 * One async request with an explicit state. Only the latest call may write its result, so a slow
 * answer for the previous team never overwrites the one for the team just switched to.
 * @example
 * const members = useRequest((teamId: string) => listMembers(teamId));
 * await members.run(teamId); members.state.value // 'done'
 * members.reset(); // back to idle; an answer still on its way is dropped
 * useRequest(listLayers, { onDone: (layers) => (shown.value = layers) }); // data kept elsewhere too
 */
export function useRequest<T, A extends unknown[] = []>(
  task: (...args: A) => Promise<T>,
  options: {
    /** Puts the answer where it belongs in the same tick as `state` turns 'done', so no watcher sees 'done' without it. */
    onDone?: (result: T, ...args: A) => void;
  } = {},
) {
  const state = ref<LoadState>('idle');
  const data = shallowRef<T | null>(null) as Ref<T | null>;
  const error = ref<string | null>(null);
  let latest = 0;

  /** Resolves to the answer, or null when the call failed or a later call (or reset) overtook it. */
  async function run(...args: A): Promise<T | null> {
    const call = ++latest;
    state.value = 'loading';
    error.value = null;
    try {
      const result = await task(...args);
      if (call !== latest) return null;
      data.value = result;
      options.onDone?.(result, ...args);
      state.value = 'done';
      return result;
    } catch (e) {
      if (call !== latest) return null;
      error.value = e instanceof Error ? e.message : String(e);
      state.value = 'error';
      return null;
    }
  }

  function reset(): void {
    latest += 1;
    state.value = 'idle';
    data.value = null;
    error.value = null;
  }

  return { state, data, error, run, reset };
}
