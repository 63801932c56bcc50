// @vitest-environment happy-dom
import { beforeEach, describe, expect, it } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { roleCan } from '@shared/auth/permissions';
import { STORAGE_KEYS } from '@/utils/storage';
import { TEAM_A, TEAM_B, twoTeamSession } from '@/testing/fakeServer';
import { useSessionStore } from './session';
import { useTeamStore } from './team';

describe('useTeamStore', () => {
  beforeEach(() => {
    localStorage.clear();
    setActivePinia(createPinia());
  });

  it('has no current team before sign-in', () => {
    const team = useTeamStore();
    expect(team.currentTeamId).toBeNull();
    expect(team.currentRole).toBeNull();
  });

  it('defaults to the first membership', () => {
    useSessionStore().applySession(twoTeamSession);
    const team = useTeamStore();
    expect(team.currentTeamId).toBe(TEAM_A);
    expect(team.currentTeamName).toBe('North Shelf');
    expect(team.currentRole).toBe('admin');
  });

  it('switches team, updates the role and remembers the choice in localStorage', () => {
    useSessionStore().applySession(twoTeamSession);
    const team = useTeamStore();
    team.switchTeam(TEAM_B);
    expect(team.currentTeamName).toBe('Delta Basin');
    expect(team.currentRole).toBe('viewer');
    expect(localStorage.getItem(STORAGE_KEYS.teamId)).toBe(TEAM_B);
  });

  it('restores the remembered team on the next visit (a fresh store)', () => {
    localStorage.setItem(STORAGE_KEYS.teamId, TEAM_B);
    useSessionStore().applySession(twoTeamSession);
    expect(useTeamStore().currentTeamName).toBe('Delta Basin');
  });

  it('falls back to the first membership when the remembered team was left', () => {
    localStorage.setItem(STORAGE_KEYS.teamId, '00000000-0000-4000-8000-000000000000');
    useSessionStore().applySession(twoTeamSession);
    expect(useTeamStore().currentTeamId).toBe(TEAM_A);
  });

  it('refuses to switch to a team the user is not in', () => {
    useSessionStore().applySession(twoTeamSession);
    const team = useTeamStore();
    expect(() => team.switchTeam('someone-elses-team')).toThrow('Not a member of team someone-elses-team');
    expect(team.currentTeamId).toBe(TEAM_A);
  });

  // Expected permissions come from the shared permission table (roleCan), the same one the server enforces.
  it('answers can() for the current team only, following the shared permission table', () => {
    useSessionStore().applySession(twoTeamSession);
    const team = useTeamStore();

    // Team A first: admin.
    expect(team.can('members.manage')).toBe(roleCan('admin', 'members.manage'));
    expect(team.can('members.manage')).toBe(true);

    team.switchTeam(TEAM_B); // viewer there
    expect(team.can('members.manage')).toBe(roleCan('viewer', 'members.manage'));
    expect(team.can('members.manage')).toBe(false);
    expect(team.can('team.read')).toBe(true);
  });

  it('can() is false for everything when signed out', () => {
    expect(useTeamStore().can('team.read')).toBe(false);
  });
});
