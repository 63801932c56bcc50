import { and, eq, inArray } from 'drizzle-orm';
import type { Role } from '../../../shared/auth/permissions';
import type { Db } from '../client';
import { memberships, teams, users } from '../schema';
import { hashPassword } from '../../lib/passwords';

export const DEMO_TEAM = 'Synthetic demo';
export const DEMO_PASSWORD = 'porelith-demo';
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'admin@porelith.example', name: 'Ada Marlowe (demo admin)', role: 'admin' },
  { email: 'geoscientist@porelith.example', name: 'Tomas Brennick (demo geoscientist)', role: 'geoscientist' },
  { email: 'planner@porelith.example', name: 'Priya Okonjo (demo planner)', role: 'planner' },
  { email: 'viewer@porelith.example', name: 'Lena Vasquez (demo viewer)', role: 'viewer' },
];

/**
 * Creates the demo team and one user per role. Idempotent: existing rows (and changed passwords) are kept.
 * @returns the demo team's id
 */
export async function seedDemoAccounts(db: Db): Promise<string> {
  return db.transaction(async (tx) => {
    await tx.insert(teams).values({ name: DEMO_TEAM }).onConflictDoNothing();
    const [team] = await tx.select().from(teams).where(eq(teams.name, DEMO_TEAM));
    const hash = await hashPassword(DEMO_PASSWORD);
    for (const u of DEMO_USERS) {
      await tx.insert(users).values({ email: u.email, name: u.name, passwordHash: hash }).onConflictDoNothing();
      const [row] = await tx.select({ id: users.id }).from(users).where(eq(users.email, u.email));
      await tx.insert(memberships).values({ teamId: team.id, userId: row.id, role: u.role }).onConflictDoNothing();
    }
    return team.id;
  });
}

/** Whether any demo account (with its published password) is present, for the production warning. */
export async function demoAccountsExist(db: Db): Promise<boolean> {
  const rows = await db
    .select({ id: users.id })
    .from(users)
    .where(
      and(
        inArray(
          users.email,
          DEMO_USERS.map((u) => u.email),
        ),
      ),
    )
    .limit(1);
  return rows.length > 0;
}
