// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it, vi } from 'vitest';
import { officeApiForEachTest, sentBy } from '@/testing/office-api';
import type { Job } from '../api/get-jobs';
import { JobsBoard } from '../components/jobs-board';

const DRAG_TYPE = 'application/x-wiretrail-job';
/** Drops a card on a column as a browser does: what the card put on the drag, read back by the column. */
function drop(column: string, job: Job) {
  const { id, status, work } = job;
  const carried = JSON.stringify({ id, status, name: `${job.reference} ${job.title}`, work });
  fireEvent.drop(screen.getByRole('region', { name: column }), { dataTransfer: { types: [DRAG_TYPE], getData: (type: string) => (type === DRAG_TYPE ? carried : '') } });
}
const patches = () => api.fetch.mock.calls.filter(([, init]) => init?.method === 'PATCH');

const job = (reference: string, status: Job['status'], title: string): Job => ({
  id: `01900000-0000-7000-8000-0000000000${reference.slice(-2)}`, version: 3, siteId: 's1', customerId: 'c1', reference, title, status, description: null,
  customerName: 'Hannah Greaves', siteName: 'Orchard Rise', nextVisitStart: null, technicianIds: ['t1'],
});
const NO_WORK = { plannedVisits: 0, onSiteVisits: 0, finishedVisits: 0, issuedDocuments: 0, draftInvoices: 0, issuedInvoices: 0, unpaidInvoices: 0 };
const JOBS = [job('LED-0041', 'booked', 'Move two lounge sockets'), { ...job('LED-0045', 'enquiry', 'Outside socket'), work: NO_WORK }];

const api = officeApiForEachTest(async (url, init) => {
  if (init?.method === 'PATCH') return new Response(JSON.stringify({ ...JOBS[0], ...JSON.parse(String(init.body)) }), { status: 200 });
  const status = new URL(url, 'http://x').searchParams.get('status');
  const items = JOBS.filter((j) => j.status === status);
  return new Response(JSON.stringify({ items, total: items.length, page: 1, pageSize: 30 }), { status: 200 });
});

function show(showClosed = false) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  const counts = { counts: { enquiry: 1, booked: 1, 'on-site': 0, paperwork: 0, done: 0, cancelled: 0 }, total: 2 };
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <JobsBoard filters={{ technicianId: 't1' }} counts={counts} showClosed={showClosed} personName={() => 'Sam Brannigan'} onShowAll={vi.fn()} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('the jobs board', () => {
  it('shows a column per open status with its count, each asking for its own jobs under the filters', async () => {
    show();
    const booked = screen.getByRole('region', { name: 'Booked' });
    expect(await within(booked).findByRole('article', { name: 'LED-0041 Move two lounge sockets' })).toBeTruthy();
    expect(within(booked).getByLabelText('1 job')).toBeTruthy();
    expect(within(screen.getByRole('region', { name: 'On site' })).getByText('No jobs here that match.')).toBeTruthy();
    expect(screen.queryByRole('region', { name: 'Done' })).toBeNull();
    const asked = api.fetch.mock.calls.map(([url]) => new URL(url, 'http://x').searchParams);
    expect(asked.map((p) => p.get('status')).sort()).toEqual(['booked', 'enquiry', 'on-site', 'paperwork']);
    expect(asked.every((p) => p.get('technicianId') === 't1' && p.get('sort') === 'nextVisit')).toBe(true);
  });

  it('moves a job to another status from its menu', async () => {
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Move LED-0041' }));
    fireEvent.click(screen.getByRole('menuitem', { name: 'Paperwork' }));
    await waitFor(() => expect(api.fetch.mock.calls.some(([, init]) => init?.method === 'PATCH')).toBe(true));
    const patch = api.fetch.mock.calls.findIndex(([, init]) => init?.method === 'PATCH');
    expect(sentBy(api.fetch, patch)).toEqual({ url: `/api/jobs/${JOBS[0]!.id}`, method: 'PATCH', body: { status: 'paperwork' } });
  });

  it('does not offer the status a job is already in', async () => {
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Move LED-0041' }));
    const menu = screen.getByRole('menu');
    expect(within(menu).queryByRole('menuitem', { name: 'Booked' })).toBeNull();
    expect(within(menu).getAllByRole('menuitem').map((m) => m.textContent)).toEqual(['Enquiry', 'On site', 'Paperwork', 'Done', 'Cancelled']);
  });

  it('asks before a job is dropped on a column whose condition it has not met, naming what is not so', async () => {
    show(true);
    await screen.findByRole('article', { name: 'LED-0041 Move two lounge sockets' });
    const owing: Job = { ...JOBS[0]!, status: 'paperwork', work: { plannedVisits: 0, onSiteVisits: 0, finishedVisits: 1, issuedDocuments: 1, draftInvoices: 0, issuedInvoices: 1, unpaidInvoices: 1 } };
    drop('Done', owing);
    const dialog = await screen.findByRole('dialog', { name: 'Move to Done?' });
    expect(within(dialog).getByText('LED-0041 Move two lounge sockets has not reached Done yet:')).toBeTruthy();
    expect(within(within(dialog).getByRole('list', { name: 'Not yet so' })).getAllByRole('listitem').map((li) => li.textContent)).toEqual(['1 invoice is not paid.']);
    // Left where it was: nothing is sent.
    fireEvent.click(within(dialog).getByRole('button', { name: 'Leave it' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(patches()).toHaveLength(0);

    // The office has the last word.
    drop('Done', owing);
    fireEvent.click(within(await screen.findByRole('dialog', { name: 'Move to Done?' })).getByRole('button', { name: 'Move anyway' }));
    await waitFor(() => expect(patches()).toHaveLength(1));
    expect(sentBy(api.fetch, api.fetch.mock.calls.findIndex(([, init]) => init?.method === 'PATCH'))).toEqual({ url: `/api/jobs/${owing.id}`, method: 'PATCH', body: { status: 'done' } });
  });

  it('moves a job at once when its work bears the column out', async () => {
    show();
    await screen.findByRole('article', { name: 'LED-0041 Move two lounge sockets' });
    drop('Paperwork', { ...JOBS[0]!, work: { plannedVisits: 0, onSiteVisits: 0, finishedVisits: 2, issuedDocuments: 0, draftInvoices: 0, issuedInvoices: 0, unpaidInvoices: 0 } });
    await waitFor(() => expect(patches()).toHaveLength(1));
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('asks from the Move menu too', async () => {
    show();
    fireEvent.click(await screen.findByRole('button', { name: 'Move LED-0045' }));
    fireEvent.click(screen.getByRole('menuitem', { name: 'On site' }));
    const dialog = await screen.findByRole('dialog', { name: 'Move to On site?' });
    expect(within(dialog).getByRole('listitem').textContent).toBe('Nobody has arrived on site for a visit.');
  });
});
