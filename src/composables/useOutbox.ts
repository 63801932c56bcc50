import { computed, watch, type Ref } from 'vue';
import type { OutboxMessage } from '@shared/schemas/auth';
import { listOutbox } from '@/api/teams';
import { useRequest } from './useRequest';

/**
 * The team's received mails, newest first, reloaded when the team changes.
 * @example const { messages, state, reload } = useOutbox(toRef(team, 'currentTeamId'));
 */
export function useOutbox(teamId: Ref<string | null>) {
  const request = useRequest<OutboxMessage[]>(() => (teamId.value ? listOutbox(teamId.value) : Promise.resolve([])));
  const messages = computed(() => [...(request.data.value ?? [])].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt)));
  watch(teamId, () => void request.run(), { immediate: true });
  return { messages, state: request.state, error: request.error, reload: request.run };
}
