import { describe, expect, it } from 'vitest';
import { dayStart, filtersOf, readJobScreen, tableQueryOf, writeJobScreen } from '../job-filters';

describe('the jobs screen in the address', () => {
  it('reads defaults from an empty address and writes nothing for them', () => {
    const state = readJobScreen(new URLSearchParams());
    expect(state).toMatchObject({ view: 'board', search: '', status: '', sort: '', direction: 'asc', page: 1, pageSize: 25, showClosed: false });
    expect(writeJobScreen(state).toString()).toBe('');
  });

  it('round-trips the table with its filters, sorting and page', () => {
    const params = new URLSearchParams('view=table&q=orchard&status=booked&customer=c1&technician=t1&from=2026-12-01&to=2026-12-07&sort=nextVisit&dir=desc&page=2&size=50');
    const state = readJobScreen(params);
    expect(writeJobScreen(state).toString()).toBe(params.toString());
    expect(tableQueryOf(state)).toEqual({
      search: 'orchard', status: 'booked', technicianId: 't1', customerId: 'c1', from: dayStart('2026-12-01'), to: dayStart('2026-12-07', true),
      sort: 'nextVisit', direction: 'desc', page: 2, pageSize: 50,
    });
  });

  it('ignores what it does not know rather than sending it to the server', () => {
    const state = readJobScreen(new URLSearchParams('view=grid&sort=colour&page=-3&size=7&from=tomorrow'));
    expect(state).toMatchObject({ view: 'board', sort: '', page: 1, pageSize: 25, fromDate: '' });
    expect(filtersOf(state)).toEqual({ search: undefined, customerId: undefined, technicianId: undefined, from: undefined, to: undefined });
  });

  it('takes both ends of the date range in: to is the start of the next day', () => {
    const from = new Date(dayStart('2026-12-01')!);
    const to = new Date(dayStart('2026-12-07', true)!);
    expect([from.getFullYear(), from.getMonth(), from.getDate(), from.getHours()]).toEqual([2026, 11, 1, 0]);
    expect([to.getFullYear(), to.getMonth(), to.getDate(), to.getHours()]).toEqual([2026, 11, 8, 0]);
    expect(dayStart('1 Dec')).toBeUndefined();
  });
});
