// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { ShareLink } from '../api/get-job-share-links';
import { JobShareLinks } from '../components/job-share-links';

const JOB = '01900000-0000-7000-8000-000000000010';
const URL_MADE = 'https://larkfield.wiretrail.example/shared/AbCdEfGhIjKlMnOpQrStUvWxYz0123456789-_abcde';
const link = (n: number, extra: Partial<ShareLink>): ShareLink => ({
  id: `01900000-0000-7000-8000-00000000003${n}`, jobId: JOB, label: null, createdAt: '2026-03-10T09:00:00.000Z', createdById: '01900000-0000-7000-8000-000000000001', expiresAt: '2026-04-09T09:00:00.000Z',
  revokedAt: null, lastOpenedAt: null, openCount: 0, state: 'active', ...extra,
});

/** The office's links on the server, changed by the requests the panel makes. */
function server(initial: ShareLink[]) {
  const links = [...initial];
  return fakeApi((c: FakeCall) => {
    if (c.method === 'GET' && c.path === `/api/jobs/${JOB}/share-links`) return { status: 200, body: { items: links } };
    if (c.method === 'POST' && c.path === `/api/jobs/${JOB}/share-links`) {
      const made = link(9, { label: (c.body as { label?: string }).label ?? null, createdAt: '2026-03-14T12:00:00.000Z', expiresAt: '2026-03-28T12:00:00.000Z' });
      links.unshift(made);
      return { status: 201, body: { ...made, url: URL_MADE } };
    }
    const revoke = /^\/api\/share-links\/([\w-]+)\/revoke$/.exec(c.path);
    if (c.method === 'POST' && revoke) {
      const l = links.find((x) => x.id === revoke[1])!;
      Object.assign(l, { state: 'revoked', revokedAt: '2026-03-14T12:30:00.000Z' });
      return { status: 200, body: l };
    }
    return undefined;
  });
}

function show(initial: ShareLink[]) {
  const api = server(initial);
  vi.stubGlobal('fetch', api.fetch);
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <JobShareLinks jobId={JOB} />
    </QueryClientProvider>,
  );
  return api.calls;
}

describe('JobShareLinks', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('lists the links with whether each still works and how often it was opened', async () => {
    show([
      link(1, { label: 'For Hannah Greaves', openCount: 3, lastOpenedAt: '2026-03-12T18:20:00.000Z' }),
      link(2, { state: 'expired', expiresAt: '2026-03-11T09:00:00.000Z' }),
      link(3, { state: 'revoked', revokedAt: '2026-03-11T10:00:00.000Z' }),
    ]);
    const table = await screen.findByRole('table', { name: 'Customer links' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(within(rows[0]!).getByText('Working')).toBeTruthy();
    expect(within(rows[0]!).getByText(/^3 times, last 12 Mar/)).toBeTruthy();
    expect(within(rows[1]!).getByText('Expired')).toBeTruthy();
    expect(within(rows[2]!).getByText('Withdrawn')).toBeTruthy();
    // Only a working link can be withdrawn.
    expect(within(table).getAllByRole('button', { name: /^Withdraw/ })).toHaveLength(1);
  });

  it('makes a link for the days chosen, shows it once to copy, and lists it', async () => {
    const writeText = vi.fn(async () => undefined);
    vi.stubGlobal('navigator', { ...navigator, clipboard: { writeText } });
    const calls = show([]);
    expect(await screen.findByText('No links made for this job yet.')).toBeTruthy();
    fireEvent.mouseDown(screen.getByRole('combobox', { name: 'Works for' }));
    fireEvent.click(await screen.findByRole('option', { name: '14 days' }));
    fireEvent.input(screen.getByLabelText('Who it is for (optional)'), { target: { value: '  For the practice manager ' } });
    fireEvent.click(screen.getByRole('button', { name: 'Make a link' }));
    const shown = (await screen.findByLabelText('The new link')) as HTMLInputElement;
    expect(shown.value).toBe(URL_MADE);
    expect(screen.getByText(/it is not shown again/)).toBeTruthy();
    expect(calls.find((c) => c.method === 'POST')).toEqual({ method: 'POST', path: `/api/jobs/${JOB}/share-links`, body: { days: 14, label: 'For the practice manager' } });
    fireEvent.click(screen.getByRole('button', { name: 'Copy link' }));
    await waitFor(() => expect(writeText).toHaveBeenCalledWith(URL_MADE));
    expect(await screen.findByRole('button', { name: 'Copied' })).toBeTruthy();
    const table = await screen.findByRole('table', { name: 'Customer links' });
    expect(within(table).getByText('For the practice manager')).toBeTruthy();
    // The list never carries the address.
    expect(within(table).queryByText(URL_MADE)).toBeNull();
  });

  it('withdraws a link only after asking', async () => {
    const calls = show([link(1, { label: 'For Hannah Greaves' })]);
    fireEvent.click(await screen.findByRole('button', { name: /^Withdraw the link made .*\(For Hannah Greaves\)$/ }));
    const dialog = screen.getByRole('dialog', { name: 'Withdraw this link?' });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Keep it' }));
    expect(calls.some((c) => c.path.endsWith('/revoke'))).toBe(false);
    // Once the dialog has gone, the page can be used again.
    fireEvent.click(await screen.findByRole('button', { name: /^Withdraw the link made .*\(For Hannah Greaves\)$/ }));
    fireEvent.click(within(screen.getByRole('dialog', { name: 'Withdraw this link?' })).getByRole('button', { name: 'Withdraw' }));
    expect(await screen.findByText('Withdrawn')).toBeTruthy();
    expect(calls.filter((c) => c.path.endsWith('/revoke'))).toEqual([{ method: 'POST', path: `/api/share-links/${link(1, {}).id}/revoke`, body: undefined }]);
  });
});
