import { useCallback, useEffect, useMemo, useRef } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { JobFilters } from './api/get-job-status-counts';
import { JOB_SORTS, type JobQuery, type JobSort } from './api/get-jobs';

/**
 * The jobs screen's state lives in the address, so a filtered table can be bookmarked, shared and reopened,
 * and switching between the board and the table keeps the filters.
 */
export interface JobScreenState {
  view: 'board' | 'table';
  search: string;
  status: string;
  customerId: string;
  technicianId: string;
  /** Dates as the date inputs give them, YYYY-MM-DD; both ends included. */
  fromDate: string;
  toDate: string;
  sort: JobSort | '';
  direction: 'asc' | 'desc';
  page: number;
  pageSize: number;
  showClosed: boolean;
}

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const PAGE_SIZES = [25, 50, 100];

/** The start of a day in the browser's zone, as the ISO time the API takes; `after` moves to the next day. */
export function dayStart(date: string, after = false): string | undefined {
  if (!DATE.test(date)) return undefined;
  const [y, m, d] = date.split('-').map(Number);
  return new Date(y!, m! - 1, d! + (after ? 1 : 0)).toISOString();
}

export function readJobScreen(params: URLSearchParams): JobScreenState {
  const sort = params.get('sort') ?? '';
  const page = Number(params.get('page'));
  const pageSize = Number(params.get('size'));
  return {
    view: params.get('view') === 'table' ? 'table' : 'board',
    search: params.get('q') ?? '',
    status: params.get('status') ?? '',
    customerId: params.get('customer') ?? '',
    technicianId: params.get('technician') ?? '',
    fromDate: DATE.test(params.get('from') ?? '') ? params.get('from')! : '',
    toDate: DATE.test(params.get('to') ?? '') ? params.get('to')! : '',
    sort: (JOB_SORTS as readonly string[]).includes(sort) ? (sort as JobSort) : '',
    direction: params.get('dir') === 'desc' ? 'desc' : 'asc',
    page: Number.isInteger(page) && page > 0 ? page : 1,
    pageSize: PAGE_SIZES.includes(pageSize) ? pageSize : 25,
    showClosed: params.get('closed') === '1',
  };
}

const KEYS: Record<keyof JobScreenState, string> = {
  view: 'view', search: 'q', status: 'status', customerId: 'customer', technicianId: 'technician', fromDate: 'from', toDate: 'to',
  sort: 'sort', direction: 'dir', page: 'page', pageSize: 'size', showClosed: 'closed',
};
const DEFAULTS: Partial<Record<keyof JobScreenState, string>> = { view: 'board', direction: 'asc', page: '1', pageSize: '25', showClosed: '0' };

export function writeJobScreen(state: JobScreenState): URLSearchParams {
  const out = new URLSearchParams();
  for (const [key, name] of Object.entries(KEYS) as [keyof JobScreenState, string][]) {
    const raw = state[key];
    const value = typeof raw === 'boolean' ? (raw ? '1' : '0') : String(raw);
    if (value !== '' && value !== DEFAULTS[key]) out.set(name, value);
  }
  return out;
}

/** The filters shared by the board and the table, as the API takes them. */
export function filtersOf(s: JobScreenState): JobFilters {
  return {
    search: s.search.trim() || undefined,
    customerId: s.customerId || undefined,
    technicianId: s.technicianId || undefined,
    from: dayStart(s.fromDate),
    to: dayStart(s.toDate, true),
  };
}

export function tableQueryOf(s: JobScreenState): JobQuery {
  return { ...filtersOf(s), status: s.status || undefined, sort: s.sort || undefined, direction: s.sort ? s.direction : undefined, page: s.page, pageSize: s.pageSize };
}

export function useJobScreen() {
  const [params, setParams] = useSearchParams();
  const state = useMemo(() => readJobScreen(params), [params]);
  // The router hands a function update the address as last rendered, not as last written, so two changes before
  // the next render (both dates filled quickly, a sort that also sends the grid back to its first page) would
  // lose the first. Each change starts from the last address written until the screen has rendered it.
  const shown = useRef(params);
  const written = useRef<URLSearchParams | null>(null);
  useEffect(() => {
    shown.current = params;
    written.current = null;
  }, [params]);
  /** A change of filters goes back to the first page; paging and sorting say where they go themselves. */
  const change = useCallback(
    (changes: Partial<JobScreenState>) => {
      const next = writeJobScreen({ ...readJobScreen(written.current ?? shown.current), page: 1, ...changes });
      written.current = next;
      setParams(next, { replace: true });
    },
    [setParams],
  );
  return [state, change] as const;
}
