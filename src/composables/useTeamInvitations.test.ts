// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { nextTick, ref } from 'vue';
import { installFakeServer, jsonReply, TEAM_A, TEAM_B } from '@/testing/fakeServer';
import { useTeamInvitations } from './useTeamInvitations';

const inv = (id: string, email: string, expiresAt = '2026-12-09T10:00:00Z') => ({
  id,
  email,
  name: 'N',
  role: 'viewer',
  invitedBy: 'Ada',
  createdAt: '2026-12-02T10:00:00Z',
  expiresAt,
});
const A1 = '3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b';
const A2 = '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d';

// Replies follow the contract: GET invitations → PendingInvitation[], POST …/resend → PendingInvitation, DELETE → 204.
describe('useTeamInvitations', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('loads, resends and revokes from the server answers', async () => {
    installFakeServer({
      [`GET /api/teams/${TEAM_A}/invitations`]: () => jsonReply(200, [inv(A1, 'a@example.org'), inv(A2, 'b@example.org')]),
      [`POST /api/teams/${TEAM_A}/invitations/${A1}/resend`]: () => jsonReply(200, inv(A1, 'a@example.org', '2026-12-10T10:00:00Z')),
      [`DELETE /api/teams/${TEAM_A}/invitations/${A2}`]: () => new Response(null, { status: 204 }),
    });
    const list = useTeamInvitations(ref(TEAM_A));
    await vi.waitFor(() => expect(list.state.value).toBe('done'));
    await list.resend(A1);
    expect(list.invitations.value.find((i) => i.id === A1)?.expiresAt).toBe('2026-12-10T10:00:00Z');
    await list.revoke(A2);
    expect(list.invitations.value.map((i) => i.email)).toEqual(['a@example.org']);
  });

  it('shows the current team only, whatever order the answers come in', async () => {
    let releaseA: () => void = () => {};
    installFakeServer({
      [`GET /api/teams/${TEAM_A}/invitations`]: () =>
        new Promise<Response>((r) => (releaseA = () => r(jsonReply(200, [inv(A1, 'old-team@example.org')])))),
      [`GET /api/teams/${TEAM_B}/invitations`]: () => jsonReply(200, [inv(A2, 'current@example.org')]),
    });
    const teamId = ref<string | null>(TEAM_A);
    const list = useTeamInvitations(teamId);
    teamId.value = TEAM_B;
    await nextTick();
    await vi.waitFor(() => expect(list.state.value).toBe('done'));
    releaseA();
    await new Promise((r) => setTimeout(r, 10));
    expect(list.invitations.value.map((i) => i.email)).toEqual(['current@example.org']);
  });
});
