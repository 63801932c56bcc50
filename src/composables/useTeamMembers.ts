import { computed, watch, type Ref } from 'vue';
import type { Role } from '@shared/auth/permissions';
import type { Member } from '@shared/schemas/auth';
import * as teamsApi from '@/api/teams';
import { useRequest } from './useRequest';

/**
 * The members of a team, reloaded whenever the team changes, with role change and removal that
 * update the list in place from the server's answer.
 * @example const { members, state, changeRole, remove } = useTeamMembers(toRef(team, 'currentTeamId'));
 */
export function useTeamMembers(teamId: Ref<string | null>) {
  const request = useRequest<Member[]>(() => (teamId.value ? teamsApi.listMembers(teamId.value) : Promise.resolve([])));
  const members = computed(() => request.data.value ?? []);

  watch(teamId, () => void request.run(), { immediate: true });

  /** Rejects with the server's reason (e.g. the last admin cannot be demoted) for the caller to show. */
  async function changeRole(userId: string, role: Role): Promise<Member> {
    if (!teamId.value) throw new Error('No team selected');
    const updated = await teamsApi.changeMemberRole(teamId.value, userId, role);
    request.data.value = members.value.map((m) => (m.userId === userId ? updated : m));
    return updated;
  }

  async function remove(userId: string): Promise<void> {
    if (!teamId.value) throw new Error('No team selected');
    await teamsApi.removeMember(teamId.value, userId);
    request.data.value = members.value.filter((m) => m.userId !== userId);
  }

  return { members, state: request.state, error: request.error, reload: request.run, changeRole, remove };
}
