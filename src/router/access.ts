import type { LocationQueryValue, RouteLocationRaw, RouteMeta } from 'vue-router';
import type { Action } from '@shared/auth/permissions';
// Loads the typed RouteMeta fields (public, guestOnly, action, title) wherever the guard is used.
import './meta';

export const HOME_PATH = '/map';
export const SIGN_IN_PATH = '/sign-in';
export const NOT_PERMITTED_PATH = '/not-permitted';

/** What the guard knows about the person navigating. */
export interface AccessContext {
  signedIn: boolean;
  can(action: Action): boolean;
}

/** The part of a route the guard looks at. */
export interface AccessTarget {
  fullPath: string;
  meta: RouteMeta;
  query?: Record<string, LocationQueryValue | LocationQueryValue[]>;
}

/**
 * A `next` value that is safe to follow after sign-in: an in-app path only, so a crafted link
 * cannot send someone to another site (`//evil.example`, `https://…`, `/\evil`).
 * @example safeNextPath('/wells?x=1') // '/wells?x=1'
 * @example safeNextPath('//evil.example') // null
 */
export function safeNextPath(value: unknown): string | null {
  const raw = Array.isArray(value) ? value[0] : value;
  if (typeof raw !== 'string' || !raw.startsWith('/')) return null;
  if (raw.startsWith('//') || raw.startsWith('/\\')) return null;
  if (raw === SIGN_IN_PATH || raw.startsWith(`${SIGN_IN_PATH}?`)) return null;
  return raw;
}

/**
 * Decides one navigation: `true` to let it through, or where to send the person instead.
 * @example
 * decideAccess({ fullPath: '/team', meta: { action: 'members.manage' } }, { signedIn: false, can: () => false })
 * // { path: '/sign-in', query: { next: '/team' } }
 */
export function decideAccess(to: AccessTarget, ctx: AccessContext): true | RouteLocationRaw {
  if (to.meta.public) {
    if (to.meta.guestOnly && ctx.signedIn) return safeNextPath(to.query?.next) ?? HOME_PATH;
    return true;
  }
  if (!ctx.signedIn) {
    return to.fullPath === '/' || to.fullPath === HOME_PATH ? { path: SIGN_IN_PATH } : { path: SIGN_IN_PATH, query: { next: to.fullPath } };
  }
  if (to.meta.action && !ctx.can(to.meta.action)) {
    return { path: NOT_PERMITTED_PATH, query: { from: to.fullPath } };
  }
  return true;
}
