// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeAnswer } from '@/lib/fake-api';
import type { SharedInvoices } from '../api/get-shared-invoices';
import type { SharedJob } from '../api/get-shared-job';
import { SharedJobPage } from '../components/shared-job-page';

const TOKEN = 'AbCdEfGhIjKlMnOpQrStUvWxYz0123456789-_abcde';
const JOB: SharedJob = {
  expiresAt: '2026-04-13T12:00:00.000Z',
  contractor: { name: 'Larkfield Electrical & Data', phone: '01632 960 418', email: 'office@larkfield.example' },
  job: { reference: 'LED-0033', title: 'Extra double socket in the front bedroom', status: 'paperwork', customerName: 'Hannah Greaves', siteAddress: '14 Orchard Rise, Wendmouth, WM2 4HD' },
  photos: [
    { id: 'p1', caption: 'Route chased down from the loft', area: 'Front bedroom', takenAt: '2026-03-08T09:35:00.000Z', thumbUrl: `/api/shared/${TOKEN}/photos/p1/thumb`, displayUrl: `/api/shared/${TOKEN}/photos/p1/display` },
    { id: 'p2', caption: 'Finished twin socket-outlet', area: 'Front bedroom', takenAt: '2026-03-08T10:40:00.000Z', thumbUrl: `/api/shared/${TOKEN}/photos/p2/thumb`, displayUrl: `/api/shared/${TOKEN}/photos/p2/display` },
  ],
  documents: [{ id: 'd1', number: 'MW-0001', kind: 'minor-works', title: null, issuedAt: '2026-03-14T11:00:00.000Z', pdfUrl: `/api/shared/${TOKEN}/documents/d1/pdf` }],
};

const NO_INVOICES: SharedInvoices = { cardPayments: false, items: [] };

function show(answer: FakeAnswer, invoices: FakeAnswer = { status: 200, body: NO_INVOICES }, checkout?: FakeAnswer, paidInvoiceId: string | null = null) {
  const api = fakeApi((c) => (c.method === 'POST' ? checkout : c.path.endsWith('/invoices') ? invoices : answer));
  vi.stubGlobal('fetch', api.fetch);
  render(
    <QueryClientProvider client={new QueryClient()}>
      <SharedJobPage token={TOKEN} paidInvoiceId={paidInvoiceId} />
    </QueryClientProvider>,
  );
  return api.calls;
}

const INVOICES: SharedInvoices = {
  cardPayments: true,
  items: [
    { id: 'q1', kind: 'quote', number: 'QU-0001', issueDate: '2026-03-01', dueDate: '2026-03-31', grossMinor: 78_600, creditsNumber: null, owedMinor: null, state: null, overdueDays: 0, lapsed: false, payByCard: false, pdfUrl: `/api/shared/${TOKEN}/invoices/q1/pdf` },
    { id: 'i1', kind: 'invoice', number: 'INV-0002', issueDate: '2026-03-14', dueDate: '2026-04-13', grossMinor: 20_868, creditsNumber: null, owedMinor: 20_868, state: 'awaiting', overdueDays: 0, lapsed: false, payByCard: true, pdfUrl: `/api/shared/${TOKEN}/invoices/i1/pdf` },
    { id: 'i2', kind: 'invoice', number: 'INV-0001', issueDate: '2026-02-01', dueDate: '2026-03-03', grossMinor: 36_000, creditsNumber: null, owedMinor: 0, state: 'paid', overdueDays: 0, lapsed: false, payByCard: false, pdfUrl: `/api/shared/${TOKEN}/invoices/i2/pdf` },
  ],
};

describe('SharedJobPage', () => {
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it("shows the customer their job, its documents and photos, without signing in", async () => {
    const calls = show({ status: 200, body: JOB });
    expect(await screen.findByRole('heading', { level: 1, name: 'Extra double socket in the front bedroom' })).toBeTruthy();
    expect(screen.getByText('Work done; paperwork being finished')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Download PDF of MW-0001' }).getAttribute('href')).toBe(JOB.documents[0]!.pdfUrl);
    const photos = screen.getByRole('list', { name: 'Photos' });
    // The thumbnails are named by the button around them, by the caption they show.
    expect(within(photos).getAllByRole('button').map((b) => b.querySelector('img')?.getAttribute('src'))).toEqual(JOB.photos.map((p) => p.thumbUrl));
    fireEvent.click(within(photos).getByRole('button', { name: /^Open photo: Finished twin socket-outlet/ }));
    const viewer = await screen.findByRole('dialog', { name: 'Finished twin socket-outlet' });
    expect(within(viewer).getByRole('img').getAttribute('src')).toBe(JOB.photos[1]!.displayUrl);
    expect(screen.getByText(/This link works until 13 April 2026/)).toBeTruthy();
    expect(calls.map((c) => `${c.method} ${c.path}`).sort()).toEqual([`GET /api/shared/${TOKEN}`, `GET /api/shared/${TOKEN}/invoices`]);
    // With no quotes or invoices, there is no section for them.
    expect(screen.queryByRole('heading', { name: 'Quotes and invoices' })).toBeNull();
  });

  it('lists the job’s quotes and invoices, and sends the customer to pay what is owed by card', async () => {
    const assign = vi.fn();
    vi.stubGlobal('location', { ...window.location, assign });
    const calls = show({ status: 200, body: JOB }, { status: 200, body: INVOICES }, { status: 201, body: { url: 'http://127.0.0.1:12111/checkout/cs_test_1', amountMinor: 20_868 } });
    const list = await screen.findByRole('list', { name: 'Quotes and invoices' });
    const owed = within(list).getByRole('listitem', { name: 'Invoice INV-0002' });
    expect(within(owed).getByText('£208.68 to pay by 13 April 2026.')).toBeTruthy();
    expect(within(list).getByRole('listitem', { name: 'Invoice INV-0001' }).textContent).toContain('Paid. Thank you.');
    expect(within(list).getByRole('listitem', { name: 'Quote QU-0001' }).textContent).toContain('This quote stands until 31 March 2026.');
    expect(within(list).getAllByRole('button', { name: 'Pay by card' })).toHaveLength(1);
    expect(within(owed).getByRole('link', { name: 'Download PDF of invoice INV-0002' }).getAttribute('href')).toBe(INVOICES.items[1]!.pdfUrl);
    fireEvent.click(within(owed).getByRole('button', { name: 'Pay by card' }));
    await waitFor(() => expect(assign).toHaveBeenCalledWith('http://127.0.0.1:12111/checkout/cs_test_1'));
    expect(calls.find((c) => c.method === 'POST')).toEqual({ method: 'POST', path: `/api/shared/${TOKEN}/invoices/i1/checkout`, body: undefined });
  });

  it('says the payment is being confirmed on the way back from the payment page, then that it was received', async () => {
    let confirmed = false;
    const api = fakeApi((c) =>
      c.path.endsWith('/invoices')
        ? { status: 200, body: confirmed ? { ...INVOICES, items: INVOICES.items.map((i) => (i.id === 'i1' ? { ...i, owedMinor: 0, state: 'paid', payByCard: false } : i)) } : INVOICES }
        : { status: 200, body: JOB },
    );
    vi.stubGlobal('fetch', api.fetch);
    render(
      <QueryClientProvider client={new QueryClient()}>
        <SharedJobPage token={TOKEN} paidInvoiceId="i1" />
      </QueryClientProvider>,
    );
    expect(await screen.findByText('Thank you. Your card payment for invoice INV-0002 is being confirmed; it shows here in a moment.')).toBeTruthy();
    // The provider's event arrives; the page, asking again by itself, shows it paid.
    confirmed = true;
    expect(await screen.findByText('Thank you: your payment for invoice INV-0002 has been received.', undefined, { timeout: 5000 })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Pay by card' })).toBeNull();
  });

  it('shows a plain page, and nothing of the job, when the link was withdrawn', async () => {
    show({ status: 410, body: { statusCode: 410, message: 'This link has been withdrawn by the contractor. Ask them for a new one if you still need it.', error: 'Gone' } });
    expect(await screen.findByRole('heading', { name: 'This link does not work' })).toBeTruthy();
    expect(screen.getByText('This link has been withdrawn by the contractor. Ask them for a new one if you still need it.')).toBeTruthy();
    expect(screen.queryByText(/Orchard/)).toBeNull();
  });
});
