// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ROLES, roleCan, type Role } from '@shared/auth/permissions';
import { AREAS } from '@/navigation/areas';
import { installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import AppSideNav from './AppSideNav.vue';

function sessionAs(role: Role) {
  return {
    user: { id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10', email: 'a@example.org', name: 'A' },
    memberships: [{ teamId: TEAM_A, teamName: 'North Shelf', role }],
  };
}

// Which areas each role sees is derived from the shared permission table, not restated here.
describe('AppSideNav', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it.each(ROLES)('shows a %s exactly the areas the permission table grants', async (role) => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, sessionAs(role)) });
    const { wrapper } = await mountInApp(AppSideNav, { props: { collapsed: false }, path: '/map' });

    const shown = wrapper.findAll('[data-testid^="nav-"]').map((el) => el.attributes('data-testid'));
    const expected = AREAS.filter((a) => roleCan(role, a.action)).map((a) => `nav-${a.key}`);
    expect(shown).toEqual(expected);
  });

  it('links each entry to its area', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, sessionAs('admin')) });
    const { wrapper } = await mountInApp(AppSideNav, { props: { collapsed: false }, path: '/map' });
    expect(wrapper.get('[data-testid="nav-outbox"]').attributes('href')).toBe('/outbox');
    expect(wrapper.get('[data-testid="nav-team"]').text()).toBe('Team & access');
  });
});
