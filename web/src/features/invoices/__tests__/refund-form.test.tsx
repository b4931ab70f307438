// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeAnswer } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { InvoiceDetail } from '../api/get-invoice';
import { RefundForm } from '../components/refund-form';
import { DRAFT } from './invoice-fixtures';

const CARD = '01900000-0000-7000-8000-0000000000c1';
/** £117.00 invoiced, £50.00 paid by card, then all of it credited: £50.00 is the customer's. */
const OVERPAID: InvoiceDetail = {
  ...DRAFT,
  status: 'issued',
  number: 'INV-0003',
  account: { paidMinor: 5_000, creditedMinor: 11_700, refundedMinor: 0, owedMinor: -5_000, state: 'overpaid', overdueDays: 0 },
  payments: [{ id: CARD, amountMinor: 5_000, method: 'card', receivedOn: '2026-03-15', reference: 'pi_1', note: null, recordedById: null, createdAt: '2026-03-15T10:00:00.000Z', refundMinor: 0, refundedAt: null }],
};
const REFUNDED: InvoiceDetail = { ...OVERPAID, account: { ...OVERPAID.account!, refundedMinor: 5_000, owedMinor: 0, state: 'refunded' } };

function show(invoice: InvoiceDetail = OVERPAID, answer: () => FakeAnswer = () => ({ status: 201, body: REFUNDED })) {
  const api = fakeApi(answer);
  vi.stubGlobal('fetch', api.fetch);
  const onDone = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient()}>
      <RefundForm invoice={invoice} today="2026-03-20" onDone={onDone} onCancel={() => undefined} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onDone };
}

const input = (label: string, value: string) => fireEvent.input(screen.getByLabelText(label), { target: { value } });
const submit = () => fireEvent.click(screen.getByRole('button', { name: 'Record refund' }));
const bodies = (calls: Array<{ method: string; path: string; body?: unknown }>) => calls.filter((c) => c.method === 'POST').map((c) => c.body as Record<string, unknown>);

describe('RefundForm', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('starts from what is owed back, by bank transfer today, and offers the card payment with what is left of it', () => {
    show();
    expect((screen.getByLabelText('Amount (£)') as HTMLInputElement).value).toBe('50.00');
    expect(screen.getByText('£50.00 is owed back')).toBeTruthy();
    const how = screen.getByLabelText('How it goes back') as HTMLSelectElement;
    expect(how.value).toBe('bank-transfer');
    expect([...how.options].map((o) => o.textContent)).toEqual(['Bank transfer', 'Cash', 'Cheque', 'Back to the card paid on 15 Mar 2026 (£50.00 left)']);
  });

  it('refuses more than the customer is owed back, naming the field, and sends nothing', async () => {
    const { calls } = show();
    input('Amount (£)', '50.01');
    submit();
    expect(await screen.findByText('Amount: £50.01 is more than the £50.00 owed back to the customer on INV-0003.')).toBeTruthy();
    expect(screen.getByLabelText('Amount (£)').getAttribute('aria-invalid')).toBe('true');
    input('Amount (£)', '0');
    submit();
    expect(await screen.findByText('Amount: a refund must be a whole number of pence, more than nothing.')).toBeTruthy();
    expect(bodies(calls)).toEqual([]);
  });

  it('sends a refund to the card with the payment it goes back to, and the same request id however often it is sent', async () => {
    const { calls, onDone } = show();
    fireEvent.change(screen.getByLabelText('How it goes back'), { target: { value: `card:${CARD}` } });
    // A refund to a card is made today by the service: no day or reference to type.
    await waitFor(() => expect(screen.queryByLabelText('Refunded on')).toBeNull());
    submit();
    await waitFor(() => expect(bodies(calls).length).toBe(1));
    // Sent again (a second click once the first answer was lost), it carries the same request id.
    submit();
    await waitFor(() => expect(bodies(calls).length).toBe(2));
    await waitFor(() => expect(onDone.mock.calls[0]?.[0]).toEqual(REFUNDED));
    const sent = bodies(calls);
    expect(sent[0]).toMatchObject({ amountMinor: 5_000, method: 'card', paymentId: CARD, requestId: expect.stringMatching(/^[0-9a-f-]{36}$/) });
    expect(sent[0]).not.toHaveProperty('refundedOn');
    expect(new Set(sent.map((b) => b.requestId)).size).toBe(1);
  });

  it('shows the server’s refusal', async () => {
    show(OVERPAID, () => ({ status: 409, body: { statusCode: 409, message: ['amountMinor: nothing is owed back to the customer on INV-0003.'], error: 'Conflict' } }));
    submit();
    expect(await screen.findByText(/nothing is owed back to the customer on INV-0003/)).toBeTruthy();
  });
});
