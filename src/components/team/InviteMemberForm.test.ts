// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import { errorReply, installFakeServer, jsonReply, TEAM_A, twoTeamSession } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import InviteMemberForm from './InviteMemberForm.vue';

// Checked against the contract: POST /api/teams/:teamId/invitations {email,name,role} → 201 {id,email,role,expiresAt}.
describe('InviteMemberForm', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  const props = { teamId: TEAM_A, teamName: 'North Shelf' };

  it('sends the invitation and confirms it with the expiry', async () => {
    const seen: unknown[] = [];
    installFakeServer({
      'GET /api/auth/me': () => jsonReply(200, twoTeamSession),
      [`POST /api/teams/${TEAM_A}/invitations`]: (body) => {
        seen.push(body);
        return jsonReply(201, { id: 'inv-1', email: 'lin@example.org', role: 'viewer', expiresAt: '2025-03-11T09:30:00Z' });
      },
    });
    const { wrapper } = await mountInApp(InviteMemberForm, { props, path: '/team' });

    await wrapper.get('[data-testid="invite-email"] input').setValue('Lin@Example.org');
    await wrapper.get('[data-testid="invite-name"] input').setValue('Lin Okafor');
    await wrapper.get('form').trigger('submit');
    await flushPromises();

    expect(seen).toEqual([{ email: 'lin@example.org', name: 'Lin Okafor', role: 'viewer' }]);
    expect(wrapper.get('[data-testid="invite-sent"]').text()).toContain('lin@example.org');
    expect((wrapper.get('[data-testid="invite-email"] input').element as HTMLInputElement).value).toBe('');
  });

  it('puts server field errors next to the field', async () => {
    installFakeServer({
      'GET /api/auth/me': () => jsonReply(200, twoTeamSession),
      [`POST /api/teams/${TEAM_A}/invitations`]: () =>
        errorReply(409, 'already_member', 'Already in the team', [{ path: 'email', message: 'is already a member' }]),
    });
    const { wrapper } = await mountInApp(InviteMemberForm, { props, path: '/team' });
    await wrapper.get('[data-testid="invite-email"] input').setValue('ada@example.org');
    await wrapper.get('[data-testid="invite-name"] input').setValue('Ada');
    await wrapper.get('form').trigger('submit');
    await flushPromises();

    expect(wrapper.text()).toContain('E-mail is already a member');
    expect(wrapper.get('[data-testid="invite-error"]').text()).toBe('email: is already a member');
  });

  it('refuses an empty name without calling the server', async () => {
    const fetchMock = installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const { wrapper } = await mountInApp(InviteMemberForm, { props, path: '/team' });
    await wrapper.get('[data-testid="invite-email"] input').setValue('lin@example.org');
    await wrapper.get('form').trigger('submit');
    await flushPromises();

    expect(wrapper.text()).toContain('Name is required');
    expect(fetchMock).toHaveBeenCalledTimes(1); // only the session check
  });
});
