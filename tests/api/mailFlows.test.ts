import supertest from 'supertest';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitations, memberships, passwordResets, users } from '../../server/db/schema';
import { freshTeamAgent, linkToken, signedInAgent, startTestApp, waitForMail, type TestContext } from './support/testApp';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(() => ctx.close());

describe('invitation by e-mail', () => {
  it('admin invites → mail arrives in the fake over SMTP → set password → sign in; the link works once', async () => {
    const email = `invitee-${Date.now()}@porelith.example`;
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const since = new Date(Date.now() - 1000);
    const inv = await admin.post(`/api/teams/${ctx.demoTeamId}/invitations`).send({ email, name: 'New Colleague', role: 'geoscientist' });
    expect(inv.status).toBe(201);
    expect(inv.body).toMatchObject({ email, role: 'geoscientist' });

    const mail = await waitForMail(ctx.db, email, since);
    expect(mail.subject).toContain('Synthetic demo');
    expect(mail.teamId).toBe(ctx.demoTeamId);
    const token = linkToken(mail.textBody, '/accept-invite');

    const outbox = await admin.get(`/api/teams/${ctx.demoTeamId}/outbox`);
    expect(outbox.status).toBe(200);
    expect(outbox.body.some((m: { to: string }) => m.to === email)).toBe(true);

    const accept = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token, password: 'a-strong-password-1' });
    expect(accept.status).toBe(200);
    expect(accept.body.memberships).toEqual([{ teamId: ctx.demoTeamId, teamName: 'Synthetic demo', role: 'geoscientist' }]);

    const again = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token, password: 'another-password-2' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');

    const signIn = await supertest(ctx.app).post('/api/auth/sign-in').send({ email, password: 'a-strong-password-1' });
    expect(signIn.status).toBe(200);
  });

  it('refuses to invite someone who is already a member', async () => {
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const res = await admin
      .post(`/api/teams/${ctx.demoTeamId}/invitations`)
      .send({ email: 'planner@porelith.example', name: 'P', role: 'viewer' });
    expect(res.status).toBe(409);
  });

  it('refuses a made-up token and a too-short password by name', async () => {
    const forged = await supertest(ctx.app)
      .post('/api/auth/accept-invite')
      .send({ token: 'x'.repeat(43), password: 'long-enough-password' });
    expect(forged.status).toBe(400);
    expect(forged.body.error.code).toBe('invalid_token');
    const short = await supertest(ctx.app)
      .post('/api/auth/accept-invite')
      .send({ token: 'x'.repeat(43), password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details).toEqual([{ path: 'password', message: 'must be at least 10 characters' }]);
  });
});

describe('invitation to an e-mail that already has an account (takeover regression)', () => {
  it("an admin of team A cannot take over a team-B user by inviting them and accepting the link from A's Outbox", async () => {
    const attacker = await freshTeamAgent(ctx, 'Takeover attacker team', 'admin');
    const victim = await freshTeamAgent(ctx, 'Takeover victim team', 'viewer');
    const since = new Date(Date.now() - 1000);
    const inv = await attacker.agent
      .post(`/api/teams/${attacker.teamId}/invitations`)
      .send({ email: victim.email, name: 'Victim', role: 'admin' });
    expect(inv.status).toBe(201);
    await waitForMail(ctx.db, victim.email, since);

    // The attacker also asks for a reset mail: it must never appear in their Outbox.
    const resetAsk = await supertest(ctx.app).post('/api/auth/reset-request').send({ email: victim.email });
    expect(resetAsk.status).toBe(202);
    const resetMail = await waitForMail(ctx.db, victim.email, new Date(Date.now() - 200));
    expect(resetMail.subject).toMatch(/Reset/);
    expect(resetMail.teamId).toBeNull();

    const outbox = await attacker.agent.get(`/api/teams/${attacker.teamId}/outbox`);
    expect(outbox.status).toBe(200);
    const visible = outbox.body as { to: string; subject: string; text: string }[];
    expect(visible.some((m) => /reset-password/.test(m.text))).toBe(false);
    const invite = visible.find((m) => m.to === victim.email && /accept-invite/.test(m.text));
    expect(invite).toBeDefined();
    const token = linkToken(invite!.text, '/accept-invite');

    const takeover = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token, password: 'attacker-chosen-password' });
    expect(takeover.status).toBe(401);
    expect(takeover.body.error.code).toBe('existing_account_password');
    expect(takeover.body.error.message).toMatch(/already has a Porelith account/);
    expect(takeover.headers['set-cookie']).toBeUndefined();

    // Nothing was written: the invitation is still open, no membership, the password is unchanged.
    const [row] = await ctx.db.select().from(invitations).where(eq(invitations.id, inv.body.id));
    expect(row.acceptedAt).toBeNull();
    const joined = await ctx.db
      .select()
      .from(memberships)
      .where(and(eq(memberships.userId, victim.userId), eq(memberships.teamId, attacker.teamId)));
    expect(joined).toEqual([]);
    const asAttacker = await supertest(ctx.app)
      .post('/api/auth/sign-in')
      .send({ email: victim.email, password: 'attacker-chosen-password' });
    expect(asAttacker.status).toBe(401);
    const asVictim = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: victim.email, password: victim.password });
    expect(asVictim.status).toBe(200);
  });

  it('the invited user joins with their current password, which stays as it was', async () => {
    const inviter = await freshTeamAgent(ctx, 'Joining team', 'admin');
    const member = await freshTeamAgent(ctx, 'Home team', 'planner');
    const since = new Date(Date.now() - 1000);
    await inviter.agent
      .post(`/api/teams/${inviter.teamId}/invitations`)
      .send({ email: member.email, name: 'Renamed?', role: 'geoscientist' });
    const mail = await waitForMail(ctx.db, member.email, since);
    expect(mail.textBody).toMatch(/current password/);
    expect(mail.textBody).toContain('&existing=1');
    const token = linkToken(mail.textBody, '/accept-invite');

    const accept = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token, password: member.password });
    expect(accept.status).toBe(200);
    expect(accept.body.memberships.map((m: { teamId: string; role: string }) => [m.teamId, m.role])).toEqual(
      expect.arrayContaining([
        [inviter.teamId, 'geoscientist'],
        [member.teamId, 'planner'],
      ]),
    );
    expect(accept.body.user.name).not.toBe('Renamed?');
    const signIn = await supertest(ctx.app).post('/api/auth/sign-in').send({ email: member.email, password: member.password });
    expect(signIn.status).toBe(200);
  });
});

describe('password reset', () => {
  it('sends a single-use link; the new password works and the old one does not', async () => {
    const email = `resetter-${Date.now()}@porelith.example`;
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const since = new Date(Date.now() - 1000);
    await admin.post(`/api/teams/${ctx.demoTeamId}/invitations`).send({ email, name: 'Resetter', role: 'viewer' });
    const invite = await waitForMail(ctx.db, email, since);
    await supertest(ctx.app)
      .post('/api/auth/accept-invite')
      .send({ token: linkToken(invite.textBody, '/accept-invite'), password: 'first-password-1' });

    const since2 = new Date();
    const req = await supertest(ctx.app).post('/api/auth/reset-request').send({ email });
    expect(req.status).toBe(202);
    const mail = await waitForMail(ctx.db, email, since2);
    const token = linkToken(mail.textBody, '/reset-password');

    const reset = await supertest(ctx.app).post('/api/auth/reset').send({ token, password: 'second-password-2' });
    expect(reset.status).toBe(200);
    expect(reset.body.user.email).toBe(email);
    const reuse = await supertest(ctx.app).post('/api/auth/reset').send({ token, password: 'third-password-3' });
    expect(reuse.status).toBe(400);

    const oldPw = await supertest(ctx.app).post('/api/auth/sign-in').send({ email, password: 'first-password-1' });
    expect(oldPw.status).toBe(401);
    const newPw = await supertest(ctx.app).post('/api/auth/sign-in').send({ email, password: 'second-password-2' });
    expect(newPw.status).toBe(200);
  });

  it('answers 202 for an unknown e-mail and sends nothing', async () => {
    const email = 'nobody-here@porelith.example';
    const res = await supertest(ctx.app).post('/api/auth/reset-request').send({ email });
    expect(res.status).toBe(202);
    await expect(waitForMail(ctx.db, email, new Date(Date.now() - 1000), 500)).rejects.toThrow(/no mail/);
    const [u] = await ctx.db.select().from(users).where(eq(users.email, email));
    expect(u).toBeUndefined();
  });
});

describe('expired links', () => {
  const anHourAgo = () => new Date(Date.now() - 3600_000);

  it('refuses an expired invitation link with a clear message and writes nothing', async () => {
    const email = `late-invitee-${Date.now()}@porelith.example`;
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const since = new Date(Date.now() - 1000);
    const inv = await admin.post(`/api/teams/${ctx.demoTeamId}/invitations`).send({ email, name: 'Late Comer', role: 'viewer' });
    const token = linkToken((await waitForMail(ctx.db, email, since)).textBody, '/accept-invite');
    await ctx.db.update(invitations).set({ expiresAt: anHourAgo() }).where(eq(invitations.id, inv.body.id));

    const res = await supertest(ctx.app).post('/api/auth/accept-invite').send({ token, password: 'too-late-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
    expect(res.body.error.message).toBe('This invitation link has expired (links last 7 days); ask your team admin to invite you again.');
    expect(res.headers['set-cookie']).toBeUndefined();
    const [row] = await ctx.db.select().from(invitations).where(eq(invitations.id, inv.body.id));
    expect(row.acceptedAt).toBeNull();
    expect(await ctx.db.select().from(users).where(eq(users.email, email))).toEqual([]);
  });

  it('refuses an expired reset link with a clear message and writes nothing', async () => {
    const user = await freshTeamAgent(ctx, 'Expired reset team', 'viewer');
    const since = new Date(Date.now() - 1000);
    await supertest(ctx.app).post('/api/auth/reset-request').send({ email: user.email });
    const token = linkToken((await waitForMail(ctx.db, user.email, since)).textBody, '/reset-password');
    await ctx.db.update(passwordResets).set({ expiresAt: anHourAgo() }).where(eq(passwordResets.userId, user.userId));
    const [before] = await ctx.db.select().from(users).where(eq(users.id, user.userId));

    const res = await supertest(ctx.app).post('/api/auth/reset').send({ token, password: 'too-late-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
    expect(res.body.error.message).toBe(
      'This password-reset link has expired (links last 60 minutes); ask for a new one from the sign-in page.',
    );
    expect(res.headers['set-cookie']).toBeUndefined();
    const [after] = await ctx.db.select().from(users).where(eq(users.id, user.userId));
    expect(after).toEqual(before);
    const [link] = await ctx.db.select().from(passwordResets).where(eq(passwordResets.userId, user.userId));
    expect(link.usedAt).toBeNull();
    // The old password still works and the session from before is still alive.
    expect((await supertest(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password })).status).toBe(200);
    expect((await user.agent.get('/api/auth/me')).status).toBe(200);
  });
});

describe('opening a link checks it before any password is typed', () => {
  it('an invitation link tells its address, team and which form to show; used, expired and made-up links get 410/404', async () => {
    const email = `opener-${Date.now()}@porelith.example`;
    const admin = await signedInAgent(ctx, 'admin@porelith.example');
    const since = new Date(Date.now() - 1000);
    const inv = await admin.post(`/api/teams/${ctx.demoTeamId}/invitations`).send({ email, name: 'Opener', role: 'planner' });
    const mail = await waitForMail(ctx.db, email, since);
    // The mail names the role as the app does (src/navigation/labels.ts via shared/auth/roleLabels.ts).
    expect(mail.textBody).toContain('on Porelith as Well planner.');
    const token = linkToken(mail.textBody, '/accept-invite');

    const open = await supertest(ctx.app).get(`/api/auth/invitations/${token}`);
    expect(open.status).toBe(200);
    expect(open.body).toEqual({ email, teamName: 'Synthetic demo', existingAccount: false });

    const madeUp = await supertest(ctx.app).get(`/api/auth/invitations/${'x'.repeat(43)}`);
    expect(madeUp.status).toBe(404);
    expect(madeUp.body.error).toMatchObject({ code: 'invalid_token', details: { reason: 'unknown' } });
    expect(madeUp.body.error.message).toMatch(/not valid/);
    expect((await supertest(ctx.app).get('/api/auth/invitations/abc')).status).toBe(404);

    await supertest(ctx.app).post('/api/auth/accept-invite').send({ token, password: 'opener-password-1' }).expect(200);
    const used = await supertest(ctx.app).get(`/api/auth/invitations/${token}`);
    expect(used.status).toBe(410);
    expect(used.body.error).toMatchObject({
      code: 'invalid_token',
      message: 'This invitation link was used already; each link works once.',
    });
    expect(JSON.stringify(used.body)).not.toContain(email);

    await ctx.db
      .update(invitations)
      .set({ acceptedAt: null, expiresAt: new Date(Date.now() - 60_000) })
      .where(eq(invitations.id, inv.body.id));
    const expired = await supertest(ctx.app).get(`/api/auth/invitations/${token}`);
    expect(expired.status).toBe(410);
    expect(expired.body.error.message).toBe(
      'This invitation link has expired (links last 7 days); ask your team admin to invite you again.',
    );
  });

  it('says existingAccount for an address that has an account', async () => {
    const inviter = await freshTeamAgent(ctx, 'Check existing team', 'admin');
    const member = await freshTeamAgent(ctx, 'Check home team', 'viewer');
    const since = new Date(Date.now() - 1000);
    await inviter.agent
      .post(`/api/teams/${inviter.teamId}/invitations`)
      .send({ email: member.email, name: 'M', role: 'viewer' })
      .expect(201);
    const token = linkToken((await waitForMail(ctx.db, member.email, since)).textBody, '/accept-invite');
    const open = await supertest(ctx.app).get(`/api/auth/invitations/${token}`);
    expect(open.body).toEqual({ email: member.email, teamName: expect.stringContaining('Check existing team'), existingAccount: true });
  });

  it('a reset link answers with its expiry only; once used it is 410, a made-up one 404, and checking writes nothing', async () => {
    const user = await freshTeamAgent(ctx, 'Reset check team', 'viewer');
    const since = new Date(Date.now() - 1000);
    await supertest(ctx.app).post('/api/auth/reset-request').send({ email: user.email }).expect(202);
    const mail = await waitForMail(ctx.db, user.email, since);
    expect(mail.teamId).toBeNull(); // personal: never in any team's Outbox
    const token = linkToken(mail.textBody, '/reset-password');

    const open = await supertest(ctx.app).get(`/api/auth/resets/${token}`);
    expect(open.status).toBe(200);
    expect(Object.keys(open.body)).toEqual(['expiresAt']);
    // RESET_MINUTES = 60 in auth.service.ts
    const minutesLeft = (Date.parse(open.body.expiresAt) - Date.now()) / 60_000;
    expect(minutesLeft).toBeGreaterThan(55);
    expect(minutesLeft).toBeLessThanOrEqual(60);
    const [link] = await ctx.db.select().from(passwordResets).where(eq(passwordResets.userId, user.userId));
    expect(link.usedAt).toBeNull();

    expect((await supertest(ctx.app).get(`/api/auth/resets/${'y'.repeat(43)}`)).status).toBe(404);
    await supertest(ctx.app).post('/api/auth/reset').send({ token, password: 'checked-password-2' }).expect(200);
    const used = await supertest(ctx.app).get(`/api/auth/resets/${token}`);
    expect(used.status).toBe(410);
    expect(used.body.error.message).toBe('This password-reset link was used already; each link works once.');
  });
});

describe('mail for whoever runs Porelith', () => {
  it('the options say the local mail fake is in use, with the real link lifetimes', async () => {
    const res = await supertest(ctx.app).get('/api/auth/options');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ mailFake: true, resetLinkMinutes: 60, invitationDays: 7 });
  });

  it('says mailFake false when a real SMTP host is configured', async () => {
    const { isLocalMailFake } = await import('../../server/features/mail/mailer');
    expect(isLocalMailFake({ SMTP_HOST: 'smtp.example.org', SMTP_USER: undefined })).toBe(false);
    expect(isLocalMailFake({ SMTP_HOST: '127.0.0.1', SMTP_USER: 'relay' })).toBe(false);
    expect(isLocalMailFake({ SMTP_HOST: 'localhost', SMTP_USER: undefined })).toBe(true);
  });

  it('mail:last finds the newest message stored for an address (the reset link), and nothing for others', async () => {
    const { newestMailTo, formatMail } = await import('../../server/features/mail/lastMail');
    const user = await freshTeamAgent(ctx, 'Mail last team', 'viewer');
    const since = new Date(Date.now() - 1000);
    await supertest(ctx.app).post('/api/auth/reset-request').send({ email: user.email }).expect(202);
    await waitForMail(ctx.db, user.email, since);
    await new Promise((r) => setTimeout(r, 20));
    await supertest(ctx.app).post('/api/auth/reset-request').send({ email: user.email }).expect(202);
    const second = await waitForMail(ctx.db, user.email, new Date(Date.now() - 10));
    const found = await newestMailTo(ctx.db, user.email.toUpperCase());
    expect(found?.text).toBe(second.textBody);
    expect(formatMail(found!)).toContain('Subject: Reset your Porelith password');
    expect(await newestMailTo(ctx.db, 'never-mailed@porelith.example')).toBeNull();
  });
});
