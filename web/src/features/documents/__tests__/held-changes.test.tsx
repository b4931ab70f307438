// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeAnswer, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { HeldChange } from '../api/get-held-changes';
import { HeldChanges } from '../components/held-changes';

const JOB = '01900000-0000-7000-8000-000000000010';
const MW = '01900000-0000-7000-8000-000000000021';
const held = (n: number, extra: Partial<HeldChange>): HeldChange => ({
  conflictId: `01900000-0000-7000-8000-00000000003${n}`, documentId: MW, number: 'MW-0001', entity: 'circuit', rowId: 'c2', record: 'Circuit 2 (Sockets, first floor)',
  field: 'deviceRatingA', issuedValue: 32, pendingValue: 50, changedById: null, changedHlc: null, ...extra,
});

function show(answer: (c: FakeCall) => FakeAnswer) {
  const api = fakeApi(answer);
  vi.stubGlobal('fetch', api.fetch);
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <HeldChanges jobId={JOB} />
    </QueryClientProvider>,
  );
  return api.calls;
}

describe('HeldChanges', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('shows each record as issued with the change waiting beside it, by the document that holds it', async () => {
    show(() => ({
      status: 200,
      body: { items: [held(1, {}), held(2, { entity: 'site', record: 'The site', field: 'earthing', issuedValue: 'TN-C-S', pendingValue: 'TT' }), held(3, { documentId: 'cr', number: 'CR-0001', entity: 'cableRun', record: 'Cable OR-02', field: '*', issuedValue: 'kept', pendingValue: 'deleted' })] },
    }));
    const mw = await screen.findByRole('table', { name: 'Changes held by MW-0001' });
    const rows = within(mw).getAllByRole('row').slice(1).map((r) => within(r).getAllByRole('cell').map((c) => c.textContent));
    expect(rows).toEqual([
      ['Circuit 2 (Sockets, first floor)', 'Device rating (A)', '32', '50'],
      ['The site', 'Earthing', 'TN-C-S', 'TT'],
    ]);
    const cr = screen.getByRole('table', { name: 'Changes held by CR-0001' });
    expect(within(cr).getAllByRole('cell').map((c) => c.textContent)).toEqual(['Cable OR-02', 'The record itself', 'Recorded', 'Deleted']);
  });

  it('shows nothing when no change waits', async () => {
    const calls = show(() => ({ status: 200, body: { items: [] } }));
    await vi.waitFor(() => expect(calls).toHaveLength(1));
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('revises the document with the reason and the changes ticked, and shows a refusal plainly', async () => {
    let refuse = true;
    const calls = show((c) => {
      if (c.method === 'GET') return { status: 200, body: { items: [held(1, {}), held(2, { field: 'rcdRatingMa', issuedValue: 30, pendingValue: 300 })] } };
      if (refuse) {
        refuse = false;
        return { status: 422, body: { statusCode: 422, error: 'Unprocessable Entity', message: ['Circuit 2 (Sockets, first floor): Earth fault loop impedance Zs fails.'] } };
      }
      return { status: 201, body: { id: 'new', number: 'MW-0002', notices: [] } };
    });
    fireEvent.click(await screen.findByRole('button', { name: 'Revise MW-0001' }));
    const dialog = screen.getByRole('dialog', { name: 'Revise MW-0001' });
    const send = within(dialog).getByRole('button', { name: 'Issue the revision' }) as HTMLButtonElement;
    expect(send.disabled).toBe(true);
    fireEvent.change(within(dialog).getByLabelText(/Why it is revised/), { target: { value: 'The breaker is 50 A.' } });
    fireEvent.click(within(dialog).getByLabelText('Circuit 2 (Sockets, first floor), RCD rating (mA): 30 → 300'));
    fireEvent.click(send);
    expect(await within(dialog).findByText('The revision was not issued')).toBeTruthy();
    expect(within(dialog).getByText(/Zs fails/)).toBeTruthy();
    fireEvent.click(send);
    expect(await within(dialog).findByText(/MW-0002 issued\. MW-0001 stays on record, marked superseded\./)).toBeTruthy();
    const posts = calls.filter((c) => c.method === 'POST');
    expect(posts).toHaveLength(2);
    expect(posts[1]).toEqual({ method: 'POST', path: `/api/documents/${MW}/revisions`, body: { reason: 'The breaker is 50 A.', take: [held(1, {}).conflictId] } });
  });
});
