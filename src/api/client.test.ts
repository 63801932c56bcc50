import { describe, expect, it, vi } from 'vitest';
import { sessionSchema } from '@shared/schemas/auth';
import { z } from 'zod';
import {
  ApiClientError,
  createApiClient,
  describeApiError,
  onSessionExpired as registerExpiry,
  postMultipart,
  toFieldIssues,
} from './client';
import { signIn } from './auth';
import { inviteMember, listOutbox } from './teams';

// Replies are real WHATWG Fetch `Response` objects (Node's built-in undici), so status/ok/body
// behave as in a browser; the error shape is the server contract `{ error: { code, message, details? } }`.
function json(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}

/** The ApiClientError a call rejects with; fails the test if it resolves or rejects with something else. */
async function rejection(call: Promise<unknown>): Promise<ApiClientError> {
  const outcome = await call.then(
    () => new Error('expected the call to fail'),
    (e: unknown) => e,
  );
  if (!(outcome instanceof ApiClientError)) throw outcome;
  return outcome;
}

function fakeFetch(reply: Response | Error) {
  return vi.fn<typeof fetch>(async () => {
    if (reply instanceof Error) throw reply;
    return reply;
  });
}

const session = {
  user: { id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10', email: 'ada@example.org', name: 'Ada Moreno' },
  memberships: [{ teamId: '5d2c1a9b-7f1e-4c3a-8b2d-1e0f9a8b7c6d', teamName: 'North Shelf', role: 'admin' }],
};

describe('createApiClient', () => {
  it('sends JSON with the session cookie and returns the checked reply', async () => {
    const fetchImpl = fakeFetch(json(200, session));
    const client = createApiClient({ fetchImpl });

    const result = await signIn({ email: 'ada@example.org', password: 'x' }, client);

    expect(result.user.name).toBe('Ada Moreno');
    const [url, init] = fetchImpl.mock.calls[0];
    expect(url).toBe('/api/auth/sign-in');
    expect(init?.method).toBe('POST');
    expect(init?.credentials).toBe('same-origin');
    expect((init?.headers as Record<string, string>)['Content-Type']).toBe('application/json');
    expect(JSON.parse(String(init?.body))).toEqual({ email: 'ada@example.org', password: 'x' });
  });

  it('turns a validation error into "field: message" text and keeps the details', async () => {
    const client = createApiClient({
      fetchImpl: fakeFetch(
        json(400, {
          error: {
            code: 'validation_failed',
            message: 'The request body is invalid',
            details: [
              { path: 'email', message: 'must be a valid e-mail address' },
              { path: 'role', message: 'is required' },
            ],
          },
        }),
      ),
    });

    const error = await rejection(inviteMember('t1', { email: 'x', name: 'X', role: 'viewer' }, client));

    expect(error).toBeInstanceOf(ApiClientError);
    expect(error.status).toBe(400);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('email: must be a valid e-mail address; role: is required');
    expect(error.fieldMessage('email')).toBe('must be a valid e-mail address');
    expect(error.fieldMessage('name')).toBeUndefined();
  });

  it('uses the server message when there are no details', async () => {
    const client = createApiClient({
      fetchImpl: fakeFetch(json(401, { error: { code: 'invalid_credentials', message: 'Wrong e-mail or password.' } })),
    });
    const error = await rejection(client.get('/api/auth/me'));
    expect(error).toMatchObject({ status: 401, code: 'invalid_credentials', message: 'Wrong e-mail or password.' });
  });

  it('reports a network failure (fetch rejects with TypeError) with a clear message and status 0', async () => {
    const client = createApiClient({ fetchImpl: fakeFetch(new TypeError('Failed to fetch')) });
    const error = await rejection(client.get('/api/health'));
    expect(error).toBeInstanceOf(ApiClientError);
    expect(error.status).toBe(0);
    expect(error.code).toBe('network_error');
    expect(error.message).toMatch(/Cannot reach the Porelith server/);
  });

  it('describes a non-JSON error page (e.g. a proxy 502) by its status', async () => {
    const client = createApiClient({ fetchImpl: fakeFetch(new Response('<html>Bad Gateway</html>', { status: 502 })) });
    const error = await rejection(client.get('/api/health'));
    expect(error).toMatchObject({ status: 502, code: 'http_502' });
    expect(error.message).toMatch(/HTTP 502/);
  });

  it('returns undefined for 204 No Content', async () => {
    const client = createApiClient({ fetchImpl: fakeFetch(new Response(null, { status: 204 })) });
    await expect(client.del('/api/teams/t1/members/u1')).resolves.toBeUndefined();
  });

  it('rejects a reply that breaks the shared contract, naming the field', async () => {
    const broken = { ...session, user: { ...session.user, id: 'not-a-uuid' } };
    const client = createApiClient({ fetchImpl: fakeFetch(json(200, broken)) });
    const error = await rejection(client.get('/api/auth/me', sessionSchema));
    expect(error).toMatchObject({ code: 'unexpected_reply' });
    expect(error.message).toContain('user.id');
  });

  it('encodes path segments so an id cannot change the route', async () => {
    const fetchImpl = fakeFetch(json(200, []));
    await listOutbox('a/b?c', createApiClient({ fetchImpl }));
    expect(fetchImpl.mock.calls[0][0]).toBe('/api/teams/a%2Fb%3Fc/outbox');
  });
});

describe('session expiry', () => {
  const reply401 = (code: string, message: string) => json(401, { error: { code, message } });

  it('reports a 401 from a team endpoint as an expired session', async () => {
    const onSessionExpired = vi.fn();
    const client = createApiClient({ fetchImpl: fakeFetch(reply401('unauthenticated', 'Your session has ended.')), onSessionExpired });
    await expect(client.get('/api/teams/t1/members')).rejects.toMatchObject({ status: 401 });
    expect(onSessionExpired).toHaveBeenCalledOnce();
  });

  it('reports a 401 from a file upload to the app-wide handler once, without a second request', async () => {
    const handler = vi.fn();
    registerExpiry(handler);
    const fetchImpl = fakeFetch(reply401('unauthenticated', 'Your session has ended.'));
    try {
      const err = await rejection(
        postMultipart('/api/teams/t1/layers', new FormData(), { schema: z.object({}), bareFailure: () => 'x', fetchImpl }),
      );
      expect(err.status).toBe(401);
      expect(handler).toHaveBeenCalledOnce();
      expect(fetchImpl).toHaveBeenCalledOnce();
    } finally {
      registerExpiry(null);
    }
  });

  it('leaves 401 from auth endpoints (wrong password, not signed in) to the caller', async () => {
    const onSessionExpired = vi.fn();
    const client = createApiClient({ fetchImpl: fakeFetch(reply401('invalid_credentials', 'No.')), onSessionExpired });
    await expect(client.post('/api/auth/sign-in', {})).rejects.toMatchObject({ code: 'invalid_credentials' });
    expect(onSessionExpired).not.toHaveBeenCalled();
  });
});

describe('describeApiError / toFieldIssues', () => {
  it('keeps messages without a path as they are and drops malformed details', () => {
    const issues = toFieldIssues([{ path: '', message: 'passwords differ' }, { nope: 1 }, 'text']);
    expect(issues).toEqual([{ path: '', message: 'passwords differ' }]);
    expect(describeApiError('Invalid', issues)).toBe('passwords differ');
    expect(toFieldIssues({ path: 'x', message: 'y' })).toEqual([]);
  });
});
