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
    const invite = await viewer
      .post(`/api/teams/${ctx.demoTeamId}/invitations`)
      .send({ email: 'x@porelith.example', name: 'X', role: 'viewer' });
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
    const err = await inviteMember(ctx.db, down as never, 'http://127.0.0.1', ctx.demoTeamId, admin.id, {
      email,
      name: 'Nobody',
      role: 'viewer',
    }).catch((e) => e);
    expect(err).toMatchObject({ status: 502, code: 'mail_failed' });
    expect(err.message).toContain(
      `The invitation to ${email} could not be e-mailed (connect ECONNREFUSED 127.0.0.1:1); nothing was saved.`,
    );
    expect(await ctx.db.select().from(invitations).where(eq(invitations.email, email))).toEqual([]);
  });
});

describe('pending invitations', () => {
  async function invite(agent: Awaited<ReturnType<typeof signedInAgent>>, teamId: string, role = 'viewer') {
    const { waitForMail, linkToken } = await import('./support/testApp');
    const email = `pending-${Date.now()}-${Math.random().toString(36).slice(2, 6)}@porelith.example`;
    const since = new Date(Date.now() - 1000);
    const res = await agent.post(`/api/teams/${teamId}/invitations`).send({ email, name: 'Pending Person', role });
    expect(res.status).toBe(201);
    const mail = await waitForMail(ctx.db, email, since);
    return { id: res.body.id as string, email, token: linkToken(mail.textBody, '/accept-invite') };
  }

  it('lists unused, unexpired invitations with e-mail, role, inviter and expiry (admins only: 403 for others)', async () => {
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const inv = await invite(admin, ctx.demoTeamId, 'planner');
    const list = await admin.get(`/api/teams/${ctx.demoTeamId}/invitations`);
    expect(list.status).toBe(200);
    const row = list.body.find((i: { id: string }) => i.id === inv.id);
    expect(row).toMatchObject({ email: inv.email, role: 'planner', name: 'Pending Person' });
    expect(typeof row.invitedBy).toBe('string');
    expect(Date.parse(row.expiresAt)).toBeGreaterThan(Date.now() + 6 * 86_400_000);
    expect(JSON.stringify(list.body)).not.toMatch(/token/i);

    const { invitations } = await import('../../server/db/schema');
    const { eq } = await import('drizzle-orm');
    const used = await invite(admin, ctx.demoTeamId);
    await supertest(ctx.app).post('/api/auth/accept-invite').send({ token: used.token, password: 'pending-password-1' }).expect(200);
    const expired = await invite(admin, ctx.demoTeamId);
    await ctx.db
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.id, expired.id));
    const ids = (await admin.get(`/api/teams/${ctx.demoTeamId}/invitations`)).body.map((i: { id: string }) => i.id);
    expect(ids).toContain(inv.id);
    expect(ids).not.toContain(used.id);
    expect(ids).not.toContain(expired.id);

    for (const who of ['planner@porelith.example', 'viewer@porelith.example', 'geoscientist@porelith.example']) {
      const agent = await signedInAgent(ctx, who);
      const get = await agent.get(`/api/teams/${ctx.demoTeamId}/invitations`);
      expect(get.status).toBe(403);
      expect(get.body).toEqual({ error: { code: 'forbidden', message: 'You do not have access to this.' } });
      expect((await agent.delete(`/api/teams/${ctx.demoTeamId}/invitations/${inv.id}`)).status).toBe(403);
      expect((await agent.post(`/api/teams/${ctx.demoTeamId}/invitations/${inv.id}/resend`)).status).toBe(403);
    }
    // An admin of another team cannot touch this team's invitation through their own team either.
    const other = await signedInAgent(ctx, 'other-admin@porelith.example', 'other-password-1');
    expect((await other.delete(`/api/teams/${otherTeamId}/invitations/${inv.id}`)).status).toBe(404);
    expect((await admin.get(`/api/teams/${ctx.demoTeamId}/invitations`)).body.map((i: { id: string }) => i.id)).toContain(inv.id);
  });

  it('revoking removes it from the list and its link is refused (404 on opening, 400 on use), nothing written', async () => {
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const inv = await invite(admin, ctx.demoTeamId);
    const del = await admin.delete(`/api/teams/${ctx.demoTeamId}/invitations/${inv.id}`);
    expect(del.status).toBe(204);
    expect((await admin.get(`/api/teams/${ctx.demoTeamId}/invitations`)).body.map((i: { id: string }) => i.id)).not.toContain(inv.id);
    expect((await supertest(ctx.app).get(`/api/auth/invitations/${inv.token}`)).status).toBe(404);
    const accept = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token: inv.token, password: 'revoked-password-1' });
    expect(accept.status).toBe(400);
    expect(accept.body.error.code).toBe('invalid_token');
    const { eq } = await import('drizzle-orm');
    expect(await ctx.db.select().from(users).where(eq(users.email, inv.email))).toEqual([]);
    expect((await admin.delete(`/api/teams/${ctx.demoTeamId}/invitations/${inv.id}`)).status).toBe(404);
  });

  it('resending mails a new link with a fresh expiry; the old link no longer works, the new one does', async () => {
    const { waitForMail, linkToken } = await import('./support/testApp');
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const inv = await invite(admin, ctx.demoTeamId, 'geoscientist');
    const since = new Date();
    const res = await admin.post(`/api/teams/${ctx.demoTeamId}/invitations/${inv.id}/resend`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: inv.id, email: inv.email, role: 'geoscientist' });
    const mail = await waitForMail(ctx.db, inv.email, since);
    const fresh = linkToken(mail.textBody, '/accept-invite');
    expect(fresh).not.toBe(inv.token);
    expect((await supertest(ctx.app).get(`/api/auth/invitations/${inv.token}`)).status).toBe(404);
    expect(
      (await supertest(ctx.app).post('/api/auth/accept-invite').send({ token: inv.token, password: 'resent-password-1' })).status,
    ).toBe(400);
    const ok = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token: fresh, password: 'resent-password-1' });
    expect(ok.status).toBe(200);
    expect(ok.body.memberships).toEqual([{ teamId: ctx.demoTeamId, teamName: 'Synthetic demo', role: 'geoscientist' }]);
  });

  it('refuses a malformed invitation id by name', async () => {
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const res = await admin.delete(`/api/teams/${ctx.demoTeamId}/invitations/nope`);
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([{ path: 'invitationId', message: 'must be an invitation id' }]);
  });
});
