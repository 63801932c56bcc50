import { z } from 'zod';
import {
  authOptionsSchema,
  invitationCheckSchema,
  resetCheckSchema,
  sessionSchema,
  type AuthOptions,
  type InvitationCheck,
  type ResetCheck,
  type AcceptTokenBody,
  type ResetRequestBody,
  type Session,
  type SignInBody,
} from '@shared/schemas/auth';
import { api, type ApiClient } from './client';

const acceptedSchema = z.object({ ok: z.literal(true) });

/**
 * Signs in with e-mail and password; the server sets the session cookie.
 * @example const session = await signIn({ email: 'ada@example.org', password: '…' });
 */
export function signIn(body: SignInBody, client: ApiClient = api): Promise<Session> {
  return client.post('/api/auth/sign-in', body, sessionSchema);
}

/**
 * Ends the session on the server (clears the cookie).
 * @example await signOut();
 */
export function signOut(client: ApiClient = api): Promise<void> {
  return client.request<void>('POST', '/api/auth/sign-out');
}

/**
 * The current session; rejects with status 401 (`unauthenticated`) when nobody is signed in.
 * @example const { user } = await fetchMe();
 */
export function fetchMe(client: ApiClient = api): Promise<Session> {
  return client.get('/api/auth/me', sessionSchema);
}

/**
 * Sets the password for an invitation link and signs the new member in.
 * @example await acceptInvite({ token, password: 'a long passphrase' });
 */
export function acceptInvite(body: AcceptTokenBody, client: ApiClient = api): Promise<Session> {
  return client.post('/api/auth/accept-invite', body, sessionSchema);
}

/**
 * Asks for a password-reset mail. The reply is the same whether or not the address exists.
 * @example await requestPasswordReset({ email: 'ada@example.org' });
 */
export async function requestPasswordReset(body: ResetRequestBody, client: ApiClient = api): Promise<void> {
  await client.post('/api/auth/reset-request', body, acceptedSchema);
}

/**
 * Sets a new password from a reset link and signs the person in.
 * @example await resetPassword({ token, password: 'a long passphrase' });
 */
export function resetPassword(body: AcceptTokenBody, client: ApiClient = api): Promise<Session> {
  return client.post('/api/auth/reset', body, sessionSchema);
}

/**
 * Harmless facts for the sign-in pages: whether mail stays on this machine (local mail fake) and how long links last.
 * @example const { mailFake, resetLinkMinutes } = await fetchAuthOptions();
 */
export function fetchAuthOptions(client: ApiClient = api): Promise<AuthOptions> {
  return client.get('/api/auth/options', authOptionsSchema);
}

/**
 * What an invitation link says, checked when its page opens; rejects (404 not valid, 410 used or expired) with a readable message.
 * @example const { email, teamName, existingAccount } = await checkInvitation(token);
 */
export function checkInvitation(token: string, client: ApiClient = api): Promise<InvitationCheck> {
  return client.get(`/api/auth/invitations/${encodeURIComponent(token)}`, invitationCheckSchema);
}

/**
 * Whether a password-reset link still works, checked when its page opens (404 not valid, 410 used or expired).
 * @example const { expiresAt } = await checkResetLink(token);
 */
export function checkResetLink(token: string, client: ApiClient = api): Promise<ResetCheck> {
  return client.get(`/api/auth/resets/${encodeURIComponent(token)}`, resetCheckSchema);
}
