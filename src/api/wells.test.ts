import { describe, expect, it, vi } from 'vitest';
import { wellListQuery } from '@shared/schemas/wells';
import { createApiClient } from './client';
import { listWells, patchWell, wellListSearch } from './wells';

// The query strings are read back with the server's own parser (wellListQuery in shared/schemas/wells.ts,
// fed by the WHATWG URLSearchParams that Express's query parser sees the same way).
const serverReads = (search: string) => wellListQuery.parse(Object.fromEntries(new URLSearchParams(search)));

describe('wellListSearch', () => {
  it('writes every filter so that the server parser reads it back unchanged', () => {
    const search = wellListSearch({
      q: '  AVX ',
      status: ['drilled', 'abandoned'],
      hasPressures: true,
      bbox: [-101.5, -33, -100.5, -32],
      sort: 'tdMdM',
      order: 'desc',
      limit: 25,
      offset: 50,
    });
    expect(serverReads(search)).toEqual({
      q: 'AVX',
      status: ['drilled', 'abandoned'],
      hasPressures: true,
      bbox: [-101.5, -33, -100.5, -32],
      sort: 'tdMdM',
      order: 'desc',
      limit: 25,
      offset: 50,
    });
  });

  it('leaves empty values out so the server defaults apply, and keeps "false" a real filter', () => {
    expect(wellListSearch({ q: '   ', status: [], offset: 0 })).toBe('');
    expect(serverReads(wellListSearch({}))).toEqual({ sort: 'name', order: 'asc', limit: 50, offset: 0 });
    expect(serverReads(wellListSearch({ hasPressures: false })).hasPressures).toBe(false);
  });
});

describe('wells API calls', () => {
  const summary = {
    id: '0b3959fc-5dc1-4b11-ac7f-b4dcf22e037e',
    name: 'AVX-08',
    uwi: null,
    operator: null,
    lon: -100.6,
    lat: -32.6,
    status: 'drilled',
    offshore: true,
    waterDepthM: 521.4,
    tdMdM: 5640.8,
    tdTvdM: 4594,
    spudDate: null,
    pressureCount: 3,
    logCount: 0,
    hasSurvey: true,
    hasLot: false,
    updatedAt: '2025-01-01T00:00:00.000Z',
  };

  it('asks for one page under the team and checks the reply against the shared schema', async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () => Response.json({ total: 61, items: [summary] }));
    const page = await listWells('t1', { q: 'AVX', limit: 25, offset: 25 }, createApiClient({ fetchImpl }));
    expect(fetchImpl.mock.calls[0][0]).toBe('/api/teams/t1/wells?q=AVX&limit=25&offset=25');
    expect(page.total).toBe(61);
    expect(page.items[0].name).toBe('AVX-08');
  });

  it('sends the version with a patch and reports a stale one as 409 conflict', async () => {
    const fetchImpl = vi.fn<typeof fetch>(async () =>
      Response.json(
        { error: { code: 'conflict', message: 'This well was changed by someone else.', details: { currentVersion: 4 } } },
        { status: 409 },
      ),
    );
    const call = patchWell('t1', summary.id, { version: 3, status: 'abandoned' }, createApiClient({ fetchImpl }));
    await expect(call).rejects.toMatchObject({ status: 409, code: 'conflict' });
    const [url, init] = fetchImpl.mock.calls[0];
    expect(url).toBe(`/api/teams/t1/wells/${summary.id}`);
    expect(init?.method).toBe('PATCH');
    expect(JSON.parse(String(init?.body))).toEqual({ version: 3, status: 'abandoned' });
  });
});
