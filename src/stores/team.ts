import { computed, ref } from 'vue';
import { defineStore } from 'pinia';
import { can as canDo, type Action, type Role } from '@shared/auth/permissions';
import type { Membership } from '@shared/schemas/auth';
import { readStored, STORAGE_KEYS, writeStored } from '@/utils/storage';
import { useSessionStore } from './session';

/** The seeded demo team (server/db/seed/demoAccounts.ts, DEMO_TEAM): wherever it is current, its data is called synthetic. */
export const DEMO_TEAM_NAME = 'Synthetic demo';

/**
 * The team the user is working in. The choice is remembered across visits; when the remembered
 * team is no longer among the memberships, the first membership is used instead.
 * @example
 * const team = useTeamStore();
 * team.switchTeam(otherTeamId);
 * team.currentRole // 'planner'
 * team.can('members.manage') // in the current team
 */
export const useTeamStore = defineStore('team', () => {
  const session = useSessionStore();
  const selectedTeamId = ref<string | null>(readStored(STORAGE_KEYS.teamId));

  const currentMembership = computed<Membership | null>(() => {
    const list = session.memberships;
    return list.find((m) => m.teamId === selectedTeamId.value) ?? list[0] ?? null;
  });
  const currentTeamId = computed<string | null>(() => currentMembership.value?.teamId ?? null);
  const currentTeamName = computed<string | null>(() => currentMembership.value?.teamName ?? null);
  const currentRole = computed<Role | null>(() => currentMembership.value?.role ?? null);
  const isDemoTeam = computed(() => currentTeamName.value === DEMO_TEAM_NAME);

  /** Throws for a team the user is not a member of, so a bad id never becomes the silent current team. */
  function switchTeam(teamId: string): void {
    if (!session.memberships.some((m) => m.teamId === teamId)) {
      throw new Error(`Not a member of team ${teamId}`);
    }
    selectedTeamId.value = teamId;
    writeStored(STORAGE_KEYS.teamId, teamId);
  }

  /** Whether the signed-in user may do `action` in the current team. */
  function can(action: Action): boolean {
    const teamId = currentTeamId.value;
    return teamId !== null && canDo(session.memberships, action, teamId);
  }

  return { selectedTeamId, currentMembership, currentTeamId, currentTeamName, currentRole, isDemoTeam, switchTeam, can };
});
