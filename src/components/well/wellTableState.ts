import type { LocationQuery, LocationQueryRaw } from 'vue-router';
import { WELL_SORTS, WELL_STATUSES, type WellStatus } from '@shared/schemas/wells';
import type { WellListParams, WellSort } from '@/api/wells';

/** What the wells table shows: search, filters, sort and page. Kept in the address so a view can be linked. */
export interface WellTableState {
  q: string;
  status: WellStatus[];
  /** Only wells with at least one pressure observation. */
  pressuresOnly: boolean;
  sort: WellSort;
  order: 'asc' | 'desc';
  page: number;
  pageSize: number;
}

export const PAGE_SIZES = [25, 50, 100] as const;

export const DEFAULT_TABLE_STATE: WellTableState = {
  q: '',
  status: [],
  pressuresOnly: false,
  sort: 'name',
  order: 'asc',
  page: 1,
  pageSize: 25,
};

const first = (value: LocationQuery[string]): string | undefined => {
  const v = Array.isArray(value) ? value[0] : value;
  return typeof v === 'string' ? v : undefined;
};

const positiveInt = (text: string | undefined, fallback: number): number => {
  const n = Number(text);
  return Number.isInteger(n) && n >= 1 ? n : fallback;
};

/**
 * The table state from the address; unknown statuses, sorts and page sizes fall back to the defaults
 * so an edited or old link still opens a working table.
 * @example stateFromRoute({ q: 'AVX', status: 'drilled,bogus', page: '2' }).status // ['drilled']
 */
export function stateFromRoute(query: LocationQuery): WellTableState {
  const sort = first(query.sort);
  const pageSize = positiveInt(first(query.size), DEFAULT_TABLE_STATE.pageSize);
  return {
    q: first(query.q) ?? '',
    status: (first(query.status) ?? '').split(',').filter((s): s is WellStatus => (WELL_STATUSES as readonly string[]).includes(s)),
    pressuresOnly: first(query.pressures) === '1',
    sort: (WELL_SORTS as readonly string[]).includes(sort ?? '') ? (sort as WellSort) : DEFAULT_TABLE_STATE.sort,
    order: first(query.order) === 'desc' ? 'desc' : 'asc',
    page: positiveInt(first(query.page), 1),
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_TABLE_STATE.pageSize,
  };
}

/**
 * The address query for a table state, leaving defaults out so plain `/wells` stays plain.
 * @example routeFromState({ ...DEFAULT_TABLE_STATE, q: 'AVX', page: 3 }) // { q: 'AVX', page: '3' }
 */
export function routeFromState(state: WellTableState): LocationQueryRaw {
  const query: LocationQueryRaw = {};
  if (state.q.trim()) query.q = state.q.trim();
  if (state.status.length) query.status = state.status.join(',');
  if (state.pressuresOnly) query.pressures = '1';
  if (state.sort !== DEFAULT_TABLE_STATE.sort) query.sort = state.sort;
  if (state.order !== DEFAULT_TABLE_STATE.order) query.order = state.order;
  if (state.page !== 1) query.page = String(state.page);
  if (state.pageSize !== DEFAULT_TABLE_STATE.pageSize) query.size = String(state.pageSize);
  return query;
}

/**
 * The `GET /wells` parameters for a table state (page n of size s starts at offset (n − 1)·s).
 * @example listParamsFromState({ ...DEFAULT_TABLE_STATE, page: 3 }).offset // 50
 */
export function listParamsFromState(state: WellTableState): WellListParams {
  return {
    q: state.q.trim() || undefined,
    status: state.status.length ? state.status : undefined,
    hasPressures: state.pressuresOnly ? true : undefined,
    sort: state.sort,
    order: state.order,
    limit: state.pageSize,
    offset: (state.page - 1) * state.pageSize,
  };
}

/** Whether any search or filter narrows the list (decides between "no wells yet" and "no match"). */
export function isFiltered(state: WellTableState): boolean {
  return state.q.trim() !== '' || state.status.length > 0 || state.pressuresOnly;
}
