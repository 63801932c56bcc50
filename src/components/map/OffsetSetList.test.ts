// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeServer, jsonReply } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import OffsetSetList from './OffsetSetList.vue';

const entry = (wellId: string, name: string) => ({
  wellId,
  name,
  reason: null,
  addedBy: null,
  addedByName: 'P',
  addedAt: '2026-11-30T10:00:00Z',
});
const A = '3f1d2c4b-5a6e-4f70-8a9b-0c1d2e3f4a5b';
const B = '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d';

describe('OffsetSetList', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('links the saved set to the comparison of exactly those wells', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(401, { error: { code: 'unauthenticated', message: 'Sign in' } }) });
    const { wrapper } = await mountInApp(OffsetSetList, { props: { entries: [entry(A, 'AVX-01'), entry(B, 'AVX-02')] }, path: '/sign-in' });
    const link = wrapper.get('[data-testid="offset-set-compare"]');
    expect(link.attributes('href')).toBe(`/compare?wells=${A},${B}`);
  });

  it('offers no comparison for an empty set', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(401, { error: { code: 'unauthenticated', message: 'Sign in' } }) });
    const { wrapper } = await mountInApp(OffsetSetList, { props: { entries: [] }, path: '/sign-in' });
    expect(wrapper.find('[data-testid="offset-set-compare"]').exists()).toBe(false);
    expect(wrapper.get('[data-testid="offset-set-empty"]').text()).toContain('No offset wells saved');
  });
});
