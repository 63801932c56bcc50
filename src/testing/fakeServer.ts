import { vi } from 'vitest';
import type { Session } from '@shared/schemas/auth';

/** A route table standing in for the Express server in client tests: `METHOD /path` → reply. */
export type FakeRoutes = Record<string, (body: unknown) => Response | Promise<Response>>;

/** A JSON reply as the server would send it. */
export function jsonReply(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** The contract's error reply. */
export function errorReply(status: number, code: string, message: string, details?: unknown): Response {
  return jsonReply(status, { error: { code, message, ...(details === undefined ? {} : { details }) } });
}

/**
 * Installs a global fetch that answers from `routes` and fails the test loudly on anything else.
 * @example const fetchMock = installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, session) });
 */
export function installFakeServer(routes: FakeRoutes) {
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const key = `${init?.method ?? 'GET'} ${String(input)}`;
    const handler = routes[key];
    if (!handler) return errorReply(599, 'unexpected_test_route', `No fake route for ${key}`);
    return handler(init?.body ? JSON.parse(String(init.body)) : undefined);
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

export const TEAM_A = '5d2c1a9b-7f1e-4c3a-8b2d-1e0f9a8b7c6d';
export const TEAM_B = '9a1b2c3d-4e5f-4a6b-8c7d-0e1f2a3b4c5d';

/** A session with an admin role in team A and a viewer role in team B. */
export const twoTeamSession: Session = {
  user: { id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10', email: 'ada@example.org', name: 'Ada Moreno' },
  memberships: [
    { teamId: TEAM_A, teamName: 'North Shelf', role: 'admin' },
    { teamId: TEAM_B, teamName: 'Delta Basin', role: 'viewer' },
  ],
};
