// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import { DEMO_TEAM_NAME } from '@/components/well/wellLabels';
import SafetyNotice from './SafetyNotice.vue';

const sessionIn = (teamName: string) => ({
  user: { id: '0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10', email: 'a@example.org', name: 'A' },
  memberships: [{ teamId: TEAM_A, teamName, role: 'viewer' }],
});

describe('SafetyNotice', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('calls the data synthetic in the demo team only, and always carries the caution', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, sessionIn(DEMO_TEAM_NAME)) });
    const demo = (await mountInApp(SafetyNotice, { path: '/map' })).wrapper.text();
    expect(demo).toMatch(/^Synthetic demo data\./);
    expect(demo).toContain('verify with the responsible licensed engineer and local regulations');
    document.body.innerHTML = '';
    localStorage.clear();

    installFakeServer({ 'GET /api/auth/me': () => jsonReply(200, sessionIn('North Shelf')) });
    const real = (await mountInApp(SafetyNotice, { path: '/map' })).wrapper.text();
    expect(real).not.toContain('Synthetic');
    expect(real).toContain('verify with the responsible licensed engineer and local regulations');
  });
});
