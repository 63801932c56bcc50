// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { installFakeServer, jsonReply } from '@/testing/fakeServer';
import { mountInApp } from '@/testing/mountInApp';
import WellsTable from './WellsTable.vue';
import { DEFAULT_TABLE_STATE } from './wellTableState';

const W1 = '0b3959fc-5dc1-4b11-ac7f-b4dcf22e037e';
const W2 = '4c2a1f7e-9b3d-4e8a-a6c5-1d2e3f4a5b6c';
const summary = (id: string, name: string, uwi: string) => ({
  id,
  name,
  uwi,
  operator: 'Keldrith Offshore (synthetic)',
  lon: -100.6,
  lat: -32.6,
  status: 'abandoned',
  offshore: true,
  waterDepthM: 521.4,
  tdMdM: 5640.8,
  tdTvdM: 4594,
  spudDate: '2001-08-14',
  pressureCount: 1,
  logCount: 0,
  hasSurvey: false,
  hasLot: true,
  updatedAt: '2025-01-01T00:00:00.000Z',
});

describe('WellsTable', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('gives every row a link to its pressure profile beside the name', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(401, { error: { code: 'unauthenticated', message: 'no' } }) });
    const { wrapper, router } = await mountInApp(WellsTable, {
      props: {
        wells: [summary(W1, 'AVX-08', 'AVB-03-0019-00'), summary(W2, 'AVX-09', 'AVB-01-0021-00')],
        total: 2,
        state: DEFAULT_TABLE_STATE,
        loading: false,
        depthUnit: 'm',
      },
    });
    const rows = wrapper.findAll('[data-testid="well-row"]');
    expect(rows).toHaveLength(2);
    for (const [i, id] of [W1, W2].entries()) {
      expect(rows[i].get('[data-testid="well-link"]').attributes('href')).toBe(`/wells/${id}`);
      const profile = rows[i].get('[data-testid="well-profile-link"]');
      expect(profile.text()).toBe('Profile');
      expect(router.resolve(profile.attributes('href')!).name).toBe('well-profile');
      expect(router.resolve(profile.attributes('href')!).params.wellId).toBe(id);
    }
  });

  it('keeps the UWI column wide enough for a whole 14-character UWI', async () => {
    installFakeServer({ 'GET /api/auth/me': () => jsonReply(401, { error: { code: 'unauthenticated', message: 'no' } }) });
    const { wrapper } = await mountInApp(WellsTable, {
      props: { wells: [summary(W1, 'AVX-08', 'AVB-03-0019-00')], total: 1, state: DEFAULT_TABLE_STATE, loading: false, depthUnit: 'm' },
    });
    const headers = wrapper.findAll('thead th').map((th) => th.text());
    const uwiIndex = headers.findIndex((t) => t === 'UWI');
    const widths = wrapper
      .findAll('colgroup')[0]
      .findAll('col')
      .map((c) => Number.parseFloat((c.element as HTMLElement).style.width));
    // Measured in Chromium at 1366 px: "AVB-03-0019-00" in the table's 14 px Inter is 127 px, plus 2 × 8 px cell padding.
    expect(widths[uwiIndex]).toBeGreaterThanOrEqual(143);
    expect(wrapper.get('[data-testid="well-row"]').findAll('td')[uwiIndex].text()).toBe('AVB-03-0019-00');
  });
});
