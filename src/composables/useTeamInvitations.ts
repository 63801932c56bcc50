import { computed, watch, type Ref } from 'vue';
import type { PendingInvitation } from '@shared/schemas/auth';
import * as teamsApi from '@/api/teams';
import { useRequest } from './useRequest';

/**
 * A team's pending invitations, reloaded whenever the team changes (a slow answer for the previous team never
 * overwrites the current one), with resend and revoke that update the list from the server's answer.
 * @example const { invitations, resend, revoke } = useTeamInvitations(toRef(team, 'currentTeamId'));
 */
export function useTeamInvitations(teamId: Ref<string | null>) {
  const request = useRequest<PendingInvitation[]>(() => (teamId.value ? teamsApi.listInvitations(teamId.value) : Promise.resolve([])));
  const invitations = computed(() => request.data.value ?? []);

  watch(teamId, () => void request.run(), { immediate: true });

  /** A new link by mail; the old one stops working. Rejects with the server's reason. */
  async function resend(id: string): Promise<PendingInvitation> {
    if (!teamId.value) throw new Error('No team selected');
    const renewed = await teamsApi.resendInvitation(teamId.value, id);
    request.data.value = invitations.value.map((i) => (i.id === id ? renewed : i));
    return renewed;
  }

  async function revoke(id: string): Promise<void> {
    if (!teamId.value) throw new Error('No team selected');
    await teamsApi.revokeInvitation(teamId.value, id);
    request.data.value = invitations.value.filter((i) => i.id !== id);
  }

  return { invitations, state: request.state, error: request.error, reload: request.run, resend, revoke };
}
