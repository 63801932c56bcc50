// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { flushPromises } from '@vue/test-utils';
import { installFakeServer, jsonReply } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import { usePlanningStore } from '@/stores/planning';
import ProspectsView from './ProspectsView.vue';

const prospect = (id: string, name: string) => ({
  id,
  name,
  areaKm2: 20,
  targetTopM: 2800,
  targetBaseM: 3500,
  notes: null,
  version: 1,
  updatedAt: '2026-11-30T10:00:00Z',
  geometry: { type: 'Polygon', coordinates: [] },
});
const A = '7c1d2e3f-4a5b-4c6d-8e7f-9a0b1c2d3e4f';
const B = '2b3c4d5e-6f70-4182-93a4-b5c6d7e8f901';

describe('ProspectsView', () => {
  beforeEach(() => localStorage.clear());
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('links each prospect to its own top-of-overpressure surface screen', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(401, { error: { code: 'unauthenticated', message: 'no' } }) });
    const { wrapper, router, pinia } = await mountInApp(ProspectsView, { path: '/sign-in' });
    const plan = usePlanningStore(pinia);
    plan.prospects = [prospect(A, 'Lantern Screen'), prospect(B, 'Harrow Fan')] as never;
    plan.state = 'done';
    await flushPromises();
    const rows = wrapper.findAll('[data-testid="prospect-row"]');
    expect(rows.map((r) => r.attributes('data-id'))).toEqual([A, B]);
    expect(wrapper.findAll('th').map((t) => t.text())).toContain('Top-of-overpressure surface');
    for (const [i, id] of [A, B].entries()) {
      const href = rows[i].get('[data-testid="prospect-surface-link"]').attributes('href')!;
      expect(href).toBe(`/prospects/${id}/surfaces`);
      expect(router.resolve(href).name).toBe('prospect-surfaces');
    }
  });
});
