import { describe, expect, it } from 'vitest';
import { roleCan, type Role } from '@shared/auth/permissions';
import { decideAccess, safeNextPath } from './access';

// Permissions in these checks come from the shared table (roleCan) that the server enforces too.
const as = (role: Role) => ({ signedIn: true, can: (a: Parameters<typeof roleCan>[1]) => roleCan(role, a) });
const signedOut = { signedIn: false, can: () => false };

describe('decideAccess', () => {
  it('sends a signed-out visitor to sign-in, remembering where they were going', () => {
    expect(decideAccess({ fullPath: '/wells?id=7', meta: { action: 'team.read' } }, signedOut)).toEqual({
      path: '/sign-in',
      query: { next: '/wells?id=7' },
    });
    expect(decideAccess({ fullPath: '/', meta: {} }, signedOut)).toEqual({ path: '/sign-in' });
  });

  it('lets anyone open public pages', () => {
    expect(decideAccess({ fullPath: '/accept-invite?token=x', meta: { public: true } }, signedOut)).toBe(true);
    expect(decideAccess({ fullPath: '/accept-invite?token=x', meta: { public: true } }, as('admin'))).toBe(true);
  });

  it('moves a signed-in person past the sign-in page to their next page', () => {
    const signIn = { fullPath: '/sign-in?next=/team', meta: { public: true, guestOnly: true }, query: { next: '/team' } };
    expect(decideAccess(signIn, as('admin'))).toBe('/team');
    expect(decideAccess({ ...signIn, query: { next: 'https://evil.example' } }, as('admin'))).toBe('/map');
  });

  it('sends a role without the action to the not-permitted page', () => {
    const team = { fullPath: '/team', meta: { action: 'members.manage' as const } };
    expect(roleCan('planner', 'members.manage')).toBe(false);
    expect(decideAccess(team, as('planner'))).toEqual({ path: '/not-permitted', query: { from: '/team' } });
    expect(decideAccess(team, as('admin'))).toBe(true);
  });

  it('follows the table for exports: planners yes, geoscientists no', () => {
    const exportsRoute = { fullPath: '/exports', meta: { action: 'exports.create' as const } };
    expect(decideAccess(exportsRoute, as('planner'))).toBe(true);
    expect(decideAccess(exportsRoute, as('geoscientist'))).toEqual({ path: '/not-permitted', query: { from: '/exports' } });
  });
});

describe('safeNextPath', () => {
  it.each([
    ['/wells', '/wells'],
    ['/team?tab=invite#x', '/team?tab=invite#x'],
    ['//evil.example/path', null],
    ['/\\evil.example', null],
    ['https://evil.example', null],
    ['javascript:alert(1)', null],
    ['/sign-in?next=/x', null],
    [undefined, null],
  ])('%s → %s', (input, expected) => {
    expect(safeNextPath(input)).toBe(expected);
  });

  it('takes the first of repeated query values', () => {
    expect(safeNextPath(['/outbox', '/team'])).toBe('/outbox');
  });
});
