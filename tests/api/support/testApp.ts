import { eq } from 'drizzle-orm';
import supertest from 'supertest';
import { createApp } from '../../../server/app';
import { createDb, type Db } from '../../../server/db/client';
import { seedDemoAccounts, DEMO_PASSWORD } from '../../../server/db/seed/demoAccounts';
import { parseEnv, type Env } from '../../../server/env';
import { startMailFake } from '../../../server/features/mail/mailFake';
import { createMailer, type Mailer } from '../../../server/features/mail/mailer';
import { mailMessages, teams } from '../../../server/db/schema';

export interface TestContext {
  db: Db;
  env: Env;
  mailer: Mailer;
  app: ReturnType<typeof createApp>;
  demoTeamId: string;
  close(): Promise<void>;
}

/**
 * The real app on the throwaway PostGIS database that `npm test` created, with a real mail fake
 * on a free loopback port. Overrides let a test tighten settings such as the sign-in rate limit.
 */
export async function startTestApp(overrides: Record<string, string> = {}): Promise<TestContext> {
  const db = createDb(requiredDatabaseUrl(), 4);
  const fake = await startMailFake(db, { port: 0 });
  const env = parseEnv({
    DATABASE_URL: requiredDatabaseUrl(),
    JWT_SECRET: process.env.JWT_SECRET ?? 'test-secret-' + 'x'.repeat(40),
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    SIGNIN_RATE_MAX: '1000',
    SMTP_PORT: String(fake.port),
    APP_URL: 'http://127.0.0.1:8080',
    ...overrides,
  });
  const mailer = createMailer(env);
  const app = createApp({ db, env, mailer, serveClient: false });
  const demoTeamId = await seedDemoAccounts(db);
  return {
    db,
    env,
    mailer,
    app,
    demoTeamId,
    async close() {
      mailer.close();
      await fake.close();
      await db.$client.end();
    },
  };
}

function requiredDatabaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run the API tests through `npm test`.');
  return url;
}

/** A supertest agent that keeps cookies, signed in as the given demo user. */
export async function signedInAgent(ctx: TestContext, email: string, password = DEMO_PASSWORD) {
  const agent = supertest.agent(ctx.app);
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

/** Waits for the mail fake to have stored a message to `to` newer than `since`. */
export async function waitForMail(db: Db, to: string, since: Date, timeoutMs = 5000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const rows = await db.select().from(mailMessages).orderBy(mailMessages.receivedAt);
    const hit = rows.reverse().find((m) => m.toAddresses.includes(to.toLowerCase()) && m.receivedAt >= since);
    if (hit) return hit;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no mail to ${to} arrived within ${timeoutMs} ms`);
}

/** The token in the first Porelith link of a message body. */
export function linkToken(text: string, path: '/accept-invite' | '/reset-password'): string {
  const m = new RegExp(`${path}\\?token=([A-Za-z0-9_-]+)`).exec(text);
  if (!m) throw new Error(`no ${path} link in: ${text}`);
  return m[1];
}

/** A second team with its own admin, for cross-team checks. */
export async function createOtherTeam(ctx: TestContext, name: string) {
  const [t] = await ctx.db.insert(teams).values({ name }).onConflictDoNothing().returning();
  return t ?? (await ctx.db.select().from(teams).where(eq(teams.name, name)))[0];
}

/**
 * A fresh team with one member of the given role, signed in; each test file gets its own team so
 * files never see each other's wells.
 */
export async function freshTeamAgent(
  ctx: TestContext,
  label: string,
  role: 'admin' | 'geoscientist' | 'planner' | 'viewer' = 'geoscientist',
) {
  const { randomUUID } = await import('node:crypto');
  const bcrypt = (await import('bcryptjs')).default;
  const { users, memberships } = await import('../../../server/db/schema');
  const suffix = randomUUID().slice(0, 8);
  const team = await createOtherTeam(ctx, `${label} ${suffix}`);
  const email = `${role}-${suffix}@porelith.example`;
  const password = 'fresh-team-password';
  const [user] = await ctx.db
    .insert(users)
    .values({ email, name: `${label} ${role}`, passwordHash: await bcrypt.hash(password, 4) })
    .returning();
  await ctx.db.insert(memberships).values({ teamId: team.id, userId: user.id, role });
  const agent = await signedInAgent(ctx, email, password);
  return { teamId: team.id, userId: user.id, email, password, agent };
}

/** Another member of an existing team, signed in. */
export async function memberAgent(ctx: TestContext, teamId: string, role: 'admin' | 'geoscientist' | 'planner' | 'viewer') {
  const { randomUUID } = await import('node:crypto');
  const bcrypt = (await import('bcryptjs')).default;
  const { users, memberships } = await import('../../../server/db/schema');
  const email = `${role}-${randomUUID().slice(0, 8)}@porelith.example`;
  const [user] = await ctx.db
    .insert(users)
    .values({ email, name: `Member ${role}`, passwordHash: await bcrypt.hash('member-password', 4) })
    .returning();
  await ctx.db.insert(memberships).values({ teamId, userId: user.id, role });
  return { userId: user.id, agent: await signedInAgent(ctx, email, 'member-password') };
}
