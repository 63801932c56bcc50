// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { errorReply, installFakeServer, jsonReply, twoTeamSession } from '@/testing/fakeServer';
import { useSessionStore } from './session';

describe('useSessionStore', () => {
  beforeEach(() => {
    localStorage.clear();
    setActivePinia(createPinia());
  });
  afterEach(() => vi.unstubAllGlobals());

  it('signs in, exposes the user, and moves idle → loading → done', async () => {
    installFakeServer({ 'POST /api/auth/sign-in': () => jsonReply(200, twoTeamSession) });
    const session = useSessionStore();
    expect(session.state).toBe('idle');

    const pending = session.signIn({ email: 'ada@example.org', password: 'correct horse' });
    expect(session.state).toBe('loading');
    await pending;

    expect(session.state).toBe('done');
    expect(session.isSignedIn).toBe(true);
    expect(session.user?.name).toBe('Ada Moreno');
    expect(session.memberships).toHaveLength(2);
  });

  it('keeps the server message on a failed sign-in and rethrows it', async () => {
    installFakeServer({
      'POST /api/auth/sign-in': () => errorReply(401, 'invalid_credentials', 'Wrong e-mail or password.'),
    });
    const session = useSessionStore();
    await expect(session.signIn({ email: 'a@b.org', password: 'nope' })).rejects.toMatchObject({
      code: 'invalid_credentials',
    });
    expect(session.state).toBe('error');
    expect(session.error).toBe('Wrong e-mail or password.');
    expect(session.isSignedIn).toBe(false);
  });

  it('treats 401 from /me as "signed out", not as an error', async () => {
    installFakeServer({ 'GET /api/auth/me': () => errorReply(401, 'unauthenticated', 'Sign in first.') });
    const session = useSessionStore();
    await session.fetchMe();
    expect(session.state).toBe('done');
    expect(session.error).toBeNull();
    expect(session.isSignedIn).toBe(false);
  });

  it('marks an unreachable server as an error with a readable message', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))),
    );
    const session = useSessionStore();
    await session.fetchMe();
    expect(session.state).toBe('error');
    expect(session.error).toMatch(/Cannot reach the Porelith server/);
  });

  it('forgets the user on sign-out even if the server call fails', async () => {
    installFakeServer({
      'GET /api/auth/me': () => jsonReply(200, twoTeamSession),
      'POST /api/auth/sign-out': () => errorReply(500, 'internal', 'Something broke.'),
    });
    const session = useSessionStore();
    await session.fetchMe();
    await expect(session.signOut()).rejects.toBeTruthy();
    expect(session.isSignedIn).toBe(false);
    expect(session.memberships).toEqual([]);
  });
});
