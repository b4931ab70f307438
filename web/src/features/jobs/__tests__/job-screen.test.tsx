// @vitest-environment happy-dom
import { act, render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider, useLocation } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { useJobScreen } from '../job-filters';

/** The hook on a real router, as the jobs screen has it, with the address it writes. */
function onRouter(start = '/jobs?view=table') {
  const result = {} as { current: { screen: ReturnType<typeof useJobScreen>; search: string } };
  function Probe() {
    result.current = { screen: useJobScreen(), search: useLocation().search };
    return null;
  }
  render(<RouterProvider router={createMemoryRouter([{ path: '/jobs', element: <Probe /> }], { initialEntries: [start] })} />);
  return { result };
}

describe('the jobs screen kept in the address', () => {
  it('keeps both dates when they are filled before the screen renders again', async () => {
    const { result } = onRouter();
    await act(async () => {
      const change = result.current.screen[1];
      change({ fromDate: '2026-12-01' });
      change({ toDate: '2026-12-07' });
    });
    expect(result.current.screen[0]).toMatchObject({ fromDate: '2026-12-01', toDate: '2026-12-07', view: 'table' });
    expect(new URLSearchParams(result.current.search).get('from')).toBe('2026-12-01');
  });

  it('keeps the sort when the grid goes back to its first page in the same moment', async () => {
    const { result } = onRouter('/jobs?view=table&page=3');
    await act(async () => {
      const change = result.current.screen[1];
      change({ sort: 'reference', direction: 'desc' });
      change({ page: 1, pageSize: 25 });
    });
    expect(result.current.screen[0]).toMatchObject({ sort: 'reference', direction: 'desc', page: 1 });
    expect(result.current.search).toContain('sort=reference');
    expect(result.current.search).toContain('dir=desc');
  });
});
