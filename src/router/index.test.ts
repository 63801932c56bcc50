// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory } from 'vue-router';
import { createPinia, setActivePinia } from 'pinia';
import { errorReply, installFakeServer, jsonReply, TEAM_B, twoTeamSession } from '@/testing/fakeServer';
import { useTeamStore } from '@/stores/team';
import { createAppRouter } from './index';

// The routes and guard wired as in the app, against a fake server that speaks the API contract.
// Generous timeout: the first navigation compiles the lazily loaded views, slow on a busy 2-core machine.
describe('app router', { timeout: 30_000 }, () => {
  beforeEach(() => {
    localStorage.clear();
    setActivePinia(createPinia());
  });
  afterEach(() => vi.unstubAllGlobals());

  it('asks the server once, then sends a signed-out visitor to sign-in with ?next=', async () => {
    const fetchMock = installFakeServer({
      'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.'),
    });
    const router = createAppRouter(createMemoryHistory());
    await router.push('/outbox');
    expect(router.currentRoute.value.path).toBe('/sign-in');
    expect(router.currentRoute.value.query.next).toBe('/outbox');

    await router.push('/wells');
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it('opens the home page for a signed-in member and sets the tab title', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const router = createAppRouter(createMemoryHistory());
    await router.push('/');
    expect(router.currentRoute.value.path).toBe('/map');
    expect(document.title).toBe('Atlas · Porelith');
  });

  it('keeps admin pages from a viewer and says so on the not-permitted page', async () => {
    localStorage.setItem('porelith.teamId', TEAM_B); // viewer in team B
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const router = createAppRouter(createMemoryHistory());
    await router.push('/team');
    expect(useTeamStore().currentRole).toBe('viewer');
    expect(router.currentRoute.value.path).toBe('/not-permitted');
    expect(router.currentRoute.value.query.from).toBe('/team');
  });

  it('lets an admin open the team page', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const router = createAppRouter(createMemoryHistory());
    await router.push('/team');
    expect(router.currentRoute.value.name).toBe('team');
  });

  it('keeps the reset request form and the token form on one public page, also under /forgot-password', async () => {
    installFakeServer({ 'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.') });
    const router = createAppRouter(createMemoryHistory());
    await router.push('/forgot-password');
    expect(router.currentRoute.value.path).toBe('/reset-password');
    await router.push('/reset-password?token=abc');
    expect(router.currentRoute.value.query.token).toBe('abc');
  });

  it('shows the not-found page (signed in) for unknown paths', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, twoTeamSession) });
    const router = createAppRouter(createMemoryHistory());
    await router.push('/no/such/page');
    expect(router.currentRoute.value.name).toBe('not-found');
  });
});
