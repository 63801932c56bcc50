import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createFirstAdmin, firstAdminInput } from '../../server/features/teams/firstAdmin.service';
import { signedInAgent, startTestApp, type TestContext } from './support/testApp';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await startTestApp();
});
afterAll(() => ctx.close());

describe('the first admin of an install without demo accounts', () => {
  it('creates the team and an admin whose one-time password signs in', async () => {
    const email = `ops-${randomUUID().slice(0, 8)}@example.org`;
    const team = `First team ${randomUUID().slice(0, 8)}`;
    const made = await createFirstAdmin(ctx.db, firstAdminInput.parse({ email, name: 'Ops Lead', team }));
    expect(made.password).toMatch(/^[\w-]{16}$/);
    const agent = await signedInAgent(ctx, email, made.password!);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.memberships).toEqual([{ teamId: made.teamId, teamName: team, role: 'admin' }]);
  });

  it('makes an existing account admin without touching its password', async () => {
    const email = `lead-${randomUUID().slice(0, 8)}@example.org`;
    const first = await createFirstAdmin(ctx.db, firstAdminInput.parse({ email, name: 'Lead', team: `Team ${randomUUID().slice(0, 8)}` }));
    const second = await createFirstAdmin(
      ctx.db,
      firstAdminInput.parse({ email: email.toUpperCase(), name: 'Lead', team: `Team ${randomUUID().slice(0, 8)}` }),
    );
    expect(second.password).toBeNull();
    expect(second.userId).toBe(first.userId);
    const agent = await signedInAgent(ctx, email, first.password!);
    expect((await agent.get('/api/auth/me')).body.memberships.map((m: { role: string }) => m.role)).toEqual(['admin', 'admin']);
  });

  it('refuses a malformed e-mail by field', () => {
    const r = firstAdminInput.safeParse({ email: 'not-an-address', name: 'X', team: 'Y' });
    expect(r.success).toBe(false);
    expect(r.error!.issues[0].path).toEqual(['email']);
  });
});
