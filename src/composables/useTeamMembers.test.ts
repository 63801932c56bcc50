// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { nextTick, ref } from 'vue';
import { errorReply, installFakeServer, jsonReply, TEAM_A, TEAM_B } from '@/testing/fakeServer';
import { useTeamMembers } from './useTeamMembers';

const ada = {
  userId: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10',
  email: 'ada@example.org',
  name: 'Ada',
  role: 'admin',
  joinedAt: '2025-01-10T09:00:00Z',
};
const lin = {
  userId: '1b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a11',
  email: 'lin@example.org',
  name: 'Lin',
  role: 'planner',
  joinedAt: '2025-02-01T09:00:00Z',
};

// Replies follow the contract: GET members → Member[], PATCH → Member, DELETE → 204.
describe('useTeamMembers', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('loads, changes a role and removes a member from the server answers', async () => {
    installFakeServer({
      [`GET /api/teams/${TEAM_A}/members`]: () => jsonReply(200, [ada, lin]),
      [`PATCH /api/teams/${TEAM_A}/members/${lin.userId}`]: (body) => jsonReply(200, { ...lin, ...(body as object) }),
      [`DELETE /api/teams/${TEAM_A}/members/${lin.userId}`]: () => new Response(null, { status: 204 }),
    });
    const team = useTeamMembers(ref(TEAM_A));
    await vi.waitFor(() => expect(team.state.value).toBe('done'));
    expect(team.members.value.map((m) => m.name)).toEqual(['Ada', 'Lin']);

    await team.changeRole(lin.userId, 'viewer');
    expect(team.members.value.find((m) => m.userId === lin.userId)?.role).toBe('viewer');

    await team.remove(lin.userId);
    expect(team.members.value.map((m) => m.name)).toEqual(['Ada']);
  });

  it('reloads when the team changes and reports a refusal readably', async () => {
    installFakeServer({
      [`GET /api/teams/${TEAM_A}/members`]: () => jsonReply(200, [ada]),
      [`GET /api/teams/${TEAM_B}/members`]: () => errorReply(403, 'forbidden', 'Only team admins can see members.'),
    });
    const teamId = ref<string | null>(TEAM_A);
    const team = useTeamMembers(teamId);
    await vi.waitFor(() => expect(team.state.value).toBe('done'));

    teamId.value = TEAM_B;
    await nextTick();
    await vi.waitFor(() => expect(team.state.value).toBe('error'));
    expect(team.error.value).toBe('Only team admins can see members.');
  });

  it('keeps the list when the server refuses a change', async () => {
    installFakeServer({
      [`GET /api/teams/${TEAM_A}/members`]: () => jsonReply(200, [ada]),
      [`PATCH /api/teams/${TEAM_A}/members/${ada.userId}`]: () => errorReply(409, 'last_admin', 'A team needs at least one admin.'),
    });
    const team = useTeamMembers(ref(TEAM_A));
    await vi.waitFor(() => expect(team.state.value).toBe('done'));
    await expect(team.changeRole(ada.userId, 'viewer')).rejects.toThrow('A team needs at least one admin.');
    expect(team.members.value[0].role).toBe('admin');
  });
});
