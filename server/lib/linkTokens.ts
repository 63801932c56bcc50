import { createHash, randomBytes } from 'node:crypto';

/** How long an invitation link works: teams send it, sign-up accepts or refuses it, both mails and pages say so. */
export const INVITE_DAYS = 7;

/** Link tokens go out by mail; only their SHA-256 is stored, so a database leak cannot replay them. */
export function newLinkToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
