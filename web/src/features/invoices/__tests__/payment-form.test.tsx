// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import { pickerInput, typeInPicker } from '@/testing/date-inputs';
import { PaymentForm } from '../components/payment-form';
import { DRAFT } from './invoice-fixtures';

const ISSUED = { ...DRAFT, status: 'issued' as const, number: 'INV-0003', account: { paidMinor: 0, creditedMinor: 0, refundedMinor: 0, owedMinor: 11_700, state: 'awaiting' as const, overdueDays: 0 } };

function show(answer = { status: 201, body: ISSUED }) {
  const api = fakeApi(() => answer);
  vi.stubGlobal('fetch', api.fetch);
  const onDone = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient()}>
      <PaymentForm invoice={ISSUED} today="2026-03-20" onDone={onDone} onCancel={() => undefined} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onDone };
}

const input = (label: string, value: string) => fireEvent.input(screen.getByLabelText(label), { target: { value } });
const submit = () => fireEvent.click(screen.getByRole('button', { name: 'Record payment' }));

describe('PaymentForm', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('starts from what is owed, today and a bank transfer', () => {
    show();
    expect((screen.getByLabelText('Amount (£)') as HTMLInputElement).value).toBe('117.00');
    // Read and typed the British way; sent as ISO (below).
    expect(pickerInput('Received on').value).toBe('20/03/2026');
    expect((screen.getByLabelText('How it was paid') as HTMLSelectElement).value).toBe('bank-transfer');
    expect(screen.getByText('£117.00 is owed')).toBeTruthy();
  });

  it('names the field when the amount or the day is wrong, and records nothing', async () => {
    const { calls } = show();
    input('Amount (£)', '117.01');
    submit();
    expect(await screen.findByText('Amount: more than the £117.00 still owed.')).toBeTruthy();
    expect(screen.getByLabelText('Amount (£)').getAttribute('aria-invalid')).toBe('true');
    input('Amount (£)', '0');
    submit();
    expect(await screen.findByText('Amount: must be more than nothing.')).toBeTruthy();
    input('Amount (£)', '12.345');
    typeInPicker('Received on', '21/03/2026');
    submit();
    expect(await screen.findByText('Amount: pounds and pence, like 150.00.')).toBeTruthy();
    expect(screen.getByText('Received on: cannot be later than today.')).toBeTruthy();
    input('Reference', 'x'.repeat(101));
    submit();
    expect(await screen.findByText('Reference: at most 100 characters.')).toBeTruthy();
    expect(calls).toEqual([]);
  });

  it('records a part payment in whole pence, with how and when it was paid', async () => {
    const { calls, onDone } = show();
    input('Amount (£)', '50');
    fireEvent.change(screen.getByLabelText('How it was paid'), { target: { value: 'cheque' } });
    typeInPicker('Received on', '18/03/2026');
    input('Reference', ' Cheque 100482 ');
    submit();
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(calls).toEqual([{ method: 'POST', path: `/api/invoices/${ISSUED.id}/payments`, body: { amountMinor: 5000, method: 'cheque', receivedOn: '2026-03-18', reference: 'Cheque 100482' } }]);
  });

  it("shows the server's refusal in its own words", async () => {
    show({ status: 422, body: { statusCode: 422, message: ['Nothing is owed on INV-0003.'], error: 'Unprocessable Entity' } } as never);
    submit();
    expect(await screen.findByText('Nothing is owed on INV-0003.')).toBeTruthy();
  });
});
