import { describe, expect, it } from 'vitest';
import { wellListQuery } from '@shared/schemas/wells';
import { wellListSearch } from '@/api/wells';
import { DEFAULT_TABLE_STATE, isFiltered, listParamsFromState, routeFromState, stateFromRoute } from './wellTableState';

// What reaches the server is read with its own query parser (wellListQuery, shared/schemas/wells.ts).
const serverReads = (state: typeof DEFAULT_TABLE_STATE) =>
  wellListQuery.parse(Object.fromEntries(new URLSearchParams(wellListSearch(listParamsFromState(state)))));

describe('wells table state', () => {
  it('asks page n of size s from offset (n − 1)·s with the filters, as the server reads it', () => {
    const state = {
      ...DEFAULT_TABLE_STATE,
      q: ' avx ',
      status: ['drilled' as const],
      pressuresOnly: true,
      sort: 'spudDate' as const,
      order: 'desc' as const,
      page: 3,
      pageSize: 50,
    };
    expect(serverReads(state)).toEqual({
      q: 'avx',
      status: ['drilled'],
      hasPressures: true,
      sort: 'spudDate',
      order: 'desc',
      limit: 50,
      offset: 100,
    });
    // The toggle off means "any well", not "wells without pressures".
    expect(serverReads(DEFAULT_TABLE_STATE).hasPressures).toBeUndefined();
  });

  it('survives the round trip through the address, and keeps plain /wells plain', () => {
    const state = {
      ...DEFAULT_TABLE_STATE,
      q: 'AVX',
      status: ['drilled' as const, 'abandoned' as const],
      page: 2,
      pageSize: 100,
      sort: 'tdMdM' as const,
    };
    const query = routeFromState(state);
    expect(query).toEqual({ q: 'AVX', status: 'drilled,abandoned', page: '2', size: '100', sort: 'tdMdM' });
    expect(stateFromRoute(query as Record<string, string>)).toEqual(state);
    expect(routeFromState(DEFAULT_TABLE_STATE)).toEqual({});
  });

  it('ignores what an edited link cannot mean', () => {
    const state = stateFromRoute({ status: 'drilled,bogus', sort: 'DROP TABLE', page: '-2', size: '7', order: 'sideways' });
    expect(state).toEqual({ ...DEFAULT_TABLE_STATE, status: ['drilled'] });
  });

  it('tells a filtered view from an unfiltered one', () => {
    expect(isFiltered(DEFAULT_TABLE_STATE)).toBe(false);
    expect(isFiltered({ ...DEFAULT_TABLE_STATE, q: '  ' })).toBe(false);
    expect(isFiltered({ ...DEFAULT_TABLE_STATE, pressuresOnly: true })).toBe(true);
  });
});
