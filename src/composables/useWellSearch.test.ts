import { afterEach, describe, expect, it, vi } from 'vitest';
import { effectScope, ref } from 'vue';
import { errorReply, installFakeServer, jsonReply, TEAM_A } from '@/testing/fakeServer';
import { useWellSearch, WELL_SEARCH_PAUSE_MS } from './useWellSearch';

const base = `/api/teams/${TEAM_A}/wells`;

describe('useWellSearch', () => {
  afterEach(() => {
    vi.useRealTimers();
    vi.unstubAllGlobals();
  });

  it('asks once after a pause in typing, with the limit and order of its picker', async () => {
    vi.useFakeTimers();
    const fetchMock = installFakeServer({ [`GET ${base}?q=AV&sort=name&limit=20`]: () => jsonReply(200, { total: 0, items: [] }) });
    const scope = effectScope();
    const wells = scope.run(() => useWellSearch(ref(TEAM_A), { limit: 20, sort: 'name' }))!;
    wells.searchSoon('A');
    wells.searchSoon('AV');
    await vi.advanceTimersByTimeAsync(WELL_SEARCH_PAUSE_MS + 10);
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(String(fetchMock.mock.calls[0][0])).toBe(`${base}?q=AV&sort=name&limit=20`);
    expect(wells.state.value).toBe('done');
    scope.stop();
  });

  it("keeps the server's refusal as its error, and asks nothing without a team", async () => {
    const fetchMock = installFakeServer({ [`GET ${base}?limit=30`]: () => errorReply(403, 'forbidden', 'Not a member of this team.') });
    const team = ref<string | null>(null);
    const scope = effectScope();
    const wells = scope.run(() => useWellSearch(team, { limit: 30 }))!;
    await wells.search('');
    expect(fetchMock).not.toHaveBeenCalled();
    team.value = TEAM_A;
    await wells.search('');
    expect(wells.state.value).toBe('error');
    expect(wells.error.value).toBe('Not a member of this team.');
    wells.clear();
    expect(wells.state.value).toBe('idle');
    expect(wells.error.value).toBeNull();
    scope.stop();
  });
});
