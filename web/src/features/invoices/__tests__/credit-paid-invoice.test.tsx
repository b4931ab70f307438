// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import { InvoiceDialog } from '../components/invoice-dialog';
import { DRAFT } from './invoice-fixtures';

const account = (paidMinor: number) => ({ paidMinor, creditedMinor: 0, refundedMinor: 0, owedMinor: 11_700 - paidMinor, state: paidMinor ? ('part-paid' as const) : ('awaiting' as const), overdueDays: 0 });
const issued = (paidMinor: number) => ({ ...DRAFT, status: 'issued' as const, number: 'INV-0003', issueDate: '2026-03-14', dueDate: '2026-04-13', issuedAt: '2026-03-14T10:00:00.000Z', account: account(paidMinor) });

function show(paidMinor: number) {
  const api = fakeApi((c: FakeCall) => {
    if (c.method === 'GET' && c.path.startsWith(`/api/invoices/${DRAFT.id}`)) return { status: 200, body: issued(paidMinor) };
    if (c.method === 'POST' && c.path.endsWith('/credit-note')) return { status: 201, body: { ...DRAFT, id: 'credit', kind: 'credit-note' } };
    return undefined;
  });
  vi.stubGlobal('fetch', api.fetch);
  const onOpen = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient()}>
      <InvoiceDialog invoiceId={DRAFT.id} onClose={vi.fn()} onOpen={onOpen} onNotice={vi.fn()} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onOpen };
}
const credits = (calls: FakeCall[]) => calls.filter((c) => c.method === 'POST' && c.path.endsWith('/credit-note'));

describe('a credit note for an invoice', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('warns first when money has been paid on it, since a credit note gives nothing back', async () => {
    const { calls, onOpen } = show(5_000);
    fireEvent.click(await screen.findByRole('button', { name: 'Raise a credit note' }));
    const ask = await screen.findByRole('dialog', { name: 'Credit an invoice that has been paid?' });
    expect(ask.textContent).toContain('£50.00 has been paid on INV-0003. A credit note lowers what is owed; it does not give money back.');
    fireEvent.click(within(ask).getByRole('button', { name: 'Leave it' }));
    expect(credits(calls)).toEqual([]);
    fireEvent.click(await screen.findByRole('button', { name: 'Raise a credit note' }));
    fireEvent.click(within(await screen.findByRole('dialog', { name: 'Credit an invoice that has been paid?' })).getByRole('button', { name: 'Raise the credit note' }));
    await waitFor(() => expect(onOpen).toHaveBeenCalledWith('credit'));
    expect(credits(calls)).toHaveLength(1);
  });

  it('raises one at once on an invoice nothing has been paid on', async () => {
    const { calls, onOpen } = show(0);
    fireEvent.click(await screen.findByRole('button', { name: 'Raise a credit note' }));
    await waitFor(() => expect(onOpen).toHaveBeenCalledWith('credit'));
    expect(screen.queryByRole('dialog', { name: 'Credit an invoice that has been paid?' })).toBeNull();
    expect(credits(calls)).toHaveLength(1);
  });
});
