import { ref, shallowRef, type Ref } from 'vue';
import type { LoadState } from '@/stores/session';

/**
 * One async request with an explicit state. Only the latest call may write its result, so a slow
 * answer for the previous team never overwrites the one for the team just switched to.
 * @example
 * const members = useRequest(() => listMembers(teamId.value));
 * await members.run(); members.state.value // 'done'
 */
export function useRequest<T>(task: () => Promise<T>) {
  const state = ref<LoadState>('idle');
  const data = shallowRef<T | null>(null) as Ref<T | null>;
  const error = ref<string | null>(null);
  let latest = 0;

  async function run(): Promise<T | null> {
    const call = ++latest;
    state.value = 'loading';
    error.value = null;
    try {
      const result = await task();
      if (call !== latest) return null;
      data.value = result;
      state.value = 'done';
      return result;
    } catch (e) {
      if (call !== latest) return null;
      error.value = e instanceof Error ? e.message : String(e);
      state.value = 'error';
      return null;
    }
  }

  return { state, data, error, run };
}
