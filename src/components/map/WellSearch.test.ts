// @vitest-environment happy-dom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { flushPromises, mount } from '@vue/test-utils';
import { wellSummarySchema } from '@shared/schemas/wells';
import { installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import WellSearch from './WellSearch.vue';

// The reply is parsed with the shared contract schema, so it has the shape GET /wells sends.
const avx = wellSummarySchema.parse({
  id: '22222222-2222-4222-8222-222222222222',
  name: 'AVX-01',
  uwi: 'AVB-02-0006-00',
  operator: null,
  lon: -101.3,
  lat: -32.6,
  status: 'drilled',
  offshore: true,
  waterDepthM: 100,
  tdMdM: 3000,
  tdTvdM: 3000,
  spudDate: null,
  pressureCount: 1,
  logCount: 1,
  hasSurvey: false,
  hasLot: false,
  updatedAt: '2026-01-01T00:00:00Z',
});

describe('WellSearch', () => {
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('asks the server once per pause in typing, with the trimmed text', async () => {
    vi.useFakeTimers();
    const fetchMock = installFakeServer({
      [`GET /api/teams/${TEAM_A}/wells?q=AVX&limit=8`]: () => jsonReply(200, { total: 1, items: [avx] }),
    });
    const wrapper = mount(WellSearch, { props: { teamId: TEAM_A }, attachTo: document.body });
    const input = wrapper.get('input');
    for (const text of ['A', 'AV', 'AVX ']) {
      await input.setValue(text);
      await vi.advanceTimersByTimeAsync(100);
    }
    expect(fetchMock).not.toHaveBeenCalled();
    await vi.advanceTimersByTimeAsync(300);
    await flushPromises();
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(String(fetchMock.mock.calls[0][0])).toBe(`/api/teams/${TEAM_A}/wells?q=AVX&limit=8`);
    wrapper.unmount();
  });
  // Choosing an option from the menu is covered in the browser test (tests/e2e/atlas.test.ts): the menu is a
  // positioned popover that happy-dom does not lay out.
});
