import supertest from 'supertest';
import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { memberships, users } from '../../server/db/schema';
import { createOtherTeam, signedInAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
let otherTeamId: string;
beforeAll(async () => {
  ctx = await startTestApp();
  const other = await createOtherTeam(ctx, 'Other basin team (test)');
  otherTeamId = other.id;
  const [u] = await ctx.db
    .insert(users)
    .values({ email: 'other-admin@porelith.example', name: 'Other admin', passwordHash: await bcrypt.hash('other-password-1', 4) })
    .onConflictDoNothing()
    .returning();
  if (u) await ctx.db.insert(memberships).values({ teamId: otherTeamId, userId: u.id, role: 'admin' }).onConflictDoNothing();
});
afterAll(() => ctx.close());

describe('team scoping', () => {
  it('lets a member list the members of their team', async () => {
    const agent = await signedInAgent(ctx, 'viewer@porelith.example');
    const res = await agent.get(`/api/teams/${ctx.demoTeamId}/members`);
    expect(res.status).toBe(200);
    expect(res.body.map((m: { email: string }) => m.email)).toEqual(
      expect.arrayContaining(['admin@porelith.example', 'planner@porelith.example', 'viewer@porelith.example']),
    );
  });

  it('refuses a user of team A on team B routes with a 403 that reveals nothing', async () => {
    const agent = await signedInAgent(ctx, 'other-admin@porelith.example', 'other-password-1');
    const real = await agent.get(`/api/teams/${ctx.demoTeamId}/members`);
    const unknown = await agent.get('/api/teams/00000000-0000-4000-8000-000000000000/members');
    const malformed = await agent.get('/api/teams/not-a-uuid/members');
    for (const res of [real, unknown, malformed]) {
      expect(res.status).toBe(403);
      expect(res.body).toEqual({ error: { code: 'forbidden', message: 'You do not have access to this.' } });
    }
  });

  it('refuses anonymous requests with 401', async () => {
    const res = await supertest(ctx.app).get(`/api/teams/${ctx.demoTeamId}/members`);
    expect(res.status).toBe(401);
  });

  it('refuses a role that lacks the action (viewer inviting, planner reading the outbox) with 403', async () => {
    const viewer = await signedInAgent(ctx, 'viewer@porelith.example');
    const invite = await viewer.post(`/api/teams/${ctx.demoTeamId}/invitations`).send({ email: 'x@porelith.example', name: 'X', role: 'viewer' });
    expect(invite.status).toBe(403);
    const planner = await signedInAgent(ctx, 'planner@porelith.example');
    const outbox = await planner.get(`/api/teams/${ctx.demoTeamId}/outbox`);
    expect(outbox.status).toBe(403);
  });
});

describe('member administration', () => {
  it('keeps the last admin: demoting or removing them is a 409', async () => {
    const admin = await signedInAgent(ctx, 'other-admin@porelith.example', 'other-password-1');
    const members = await admin.get(`/api/teams/${otherTeamId}/members`);
    const me = members.body[0];
    const demote = await admin.patch(`/api/teams/${otherTeamId}/members/${me.userId}`).send({ role: 'viewer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.message).toMatch(/last admin/);
    const remove = await admin.delete(`/api/teams/${otherTeamId}/members/${me.userId}`);
    expect(remove.status).toBe(409);
  });

  it('changes a member role and rejects an unknown role by name', async () => {
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const members = await admin.get(`/api/teams/${ctx.demoTeamId}/members`);
    const viewer = members.body.find((m: { email: string }) => m.email === 'viewer@porelith.example');
    const bad = await admin.patch(`/api/teams/${ctx.demoTeamId}/members/${viewer.userId}`).send({ role: 'overlord' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('role');
    const ok = await admin.patch(`/api/teams/${ctx.demoTeamId}/members/${viewer.userId}`).send({ role: 'viewer' });
    expect(ok.status).toBe(200);
    expect(ok.body.role).toBe('viewer');
  });
});

describe('an invitation whose mail cannot be sent', () => {
  it('is refused with a 502 that says so, and nothing is saved', async () => {
    const { inviteMember } = await import('../../server/features/teams/teams.service');
    const { invitations } = await import('../../server/db/schema');
    const { eq } = await import('drizzle-orm');
    const down = { send: async () => Promise.reject(new Error('connect ECONNREFUSED 127.0.0.1:1')) };
    const [admin] = await ctx.db.select({ id: users.id }).from(users).where(eq(users.email, 'admin@porelith.example'));
    const email = `unreachable-${Date.now()}@example.org`;
    const err = await inviteMember(ctx.db, down as never, 'http://127.0.0.1', ctx.demoTeamId, admin.id, { email, name: 'Nobody', role: 'viewer' }).catch((e) => e);
    expect(err).toMatchObject({ status: 502, code: 'mail_failed' });
    expect(err.message).toContain(`The invitation to ${email} could not be e-mailed (connect ECONNREFUSED 127.0.0.1:1); nothing was saved.`);
    expect(await ctx.db.select().from(invitations).where(eq(invitations.email, email))).toEqual([]);
  });
});
