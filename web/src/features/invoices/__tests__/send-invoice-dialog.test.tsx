// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { InvoiceDetail } from '../api/get-invoice';
import { SendInvoiceDialog } from '../components/send-invoice-dialog';
import { DRAFT } from './invoice-fixtures';

const ISSUED: InvoiceDetail = { ...DRAFT, status: 'issued', number: 'INV-0007', customer: { ...DRAFT.customer!, email: 'hannah@example.com' } } as InvoiceDetail;

describe('SendInvoiceDialog', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('sends a copy and a message of the office’s own with the invoice, and refuses a copy to the same address', async () => {
    const api = fakeApi(() => ({ status: 200, body: { invoice: ISSUED, shareLink: { id: 'l', expiresAt: '2027-01-01T00:00:00.000Z' } } }));
    vi.stubGlobal('fetch', api.fetch);
    const onClose = vi.fn();
    render(
      <QueryClientProvider client={new QueryClient()}>
        <SendInvoiceDialog invoice={ISSUED} onClose={onClose} />
      </QueryClientProvider>,
    );
    const dialog = await screen.findByRole('dialog');
    fireEvent.input(within(dialog).getByLabelText('Copy to (optional)'), { target: { value: 'HANNAH@example.com' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Send' }));
    expect(await within(dialog).findByText('Copy to: another address than To.')).toBeTruthy();
    fireEvent.input(within(dialog).getByLabelText('Copy to (optional)'), { target: { value: 'accounts@example.com' } });
    fireEvent.input(within(dialog).getByLabelText('Your message (optional)'), { target: { value: 'Thank you for having us in.' } });
    fireEvent.click(within(dialog).getByRole('button', { name: 'Send' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    const sent = api.calls.find((c) => c.method === 'POST')!;
    expect(sent.body).toEqual({ to: 'hannah@example.com', linkDays: 30, cc: 'accounts@example.com', message: 'Thank you for having us in.' });
  });
});
