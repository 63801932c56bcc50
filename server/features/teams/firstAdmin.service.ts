import { randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import type { Db } from '../../db/client';
import { memberships, teams, users } from '../../db/schema';
import { HttpError } from '../../lib/httpError';
import { hashPassword } from '../../lib/passwords';

export const firstAdminInput = z.object({
  email: z.string().trim().toLowerCase().email('must be an e-mail address'),
  name: z.string().trim().min(1, 'must not be empty').max(200),
  team: z.string().trim().min(1, 'must not be empty').max(200),
});
export type FirstAdminInput = z.infer<typeof firstAdminInput>;

/**
 * The first admin of an install without the demo accounts: a team (created when new) and an account with a
 * one-time random password that the operator passes on and the admin replaces through "forgot password".
 * An existing account is made admin of the team but its password is left alone (null comes back).
 * @example const { password } = await createFirstAdmin(db, { email: 'ops@example.org', name: 'Ops', team: 'North Shelf' });
 */
export async function createFirstAdmin(
  db: Db,
  input: FirstAdminInput,
): Promise<{ teamId: string; userId: string; password: string | null }> {
  return db.transaction(async (tx) => {
    await tx.insert(teams).values({ name: input.team }).onConflictDoNothing();
    const [team] = await tx.select({ id: teams.id }).from(teams).where(eq(teams.name, input.team));
    if (!team) throw new HttpError(500, 'team_missing', `The team "${input.team}" could not be created.`);
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, input.email));
    let password: string | null = null;
    let userId = existing?.id;
    if (!userId) {
      password = randomBytes(12).toString('base64url');
      const [row] = await tx
        .insert(users)
        .values({ email: input.email, name: input.name, passwordHash: await hashPassword(password) })
        .returning({ id: users.id });
      userId = row.id;
    }
    await tx
      .insert(memberships)
      .values({ teamId: team.id, userId, role: 'admin' })
      .onConflictDoUpdate({ target: [memberships.teamId, memberships.userId], set: { role: 'admin' } });
    return { teamId: team.id, userId, password };
  });
}
