// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { InvoiceDetail } from '../api/get-invoice';
import { LineEditor } from '../components/line-editor';
import { DRAFT, LABOUR_RATES, PRICE_ITEMS, VAT_RATES } from './invoice-fixtures';

// Totals are worked by hand with the rule in core/src/money/vat.ts (VAT per line to the nearer penny,
// HMRC VAT Notice 700 §17.5; the paragraph from memory): 20 % of £91.00 is £18.20 and of £6.50 is £1.30.

function show(invoice: InvoiceDetail = DRAFT, leftOut?: string[]) {
  const api = fakeApi((c: FakeCall) => {
    if (c.method === 'PATCH') return { status: 200, body: { ...invoice, ...(c.body as object) } };
    if (c.path === '/api/vat-rates') return { status: 200, body: VAT_RATES };
    if (c.path.startsWith('/api/price-items')) return { status: 200, body: PRICE_ITEMS };
    if (c.path === '/api/labour-rates') return { status: 200, body: LABOUR_RATES };
    return undefined;
  });
  vi.stubGlobal('fetch', api.fetch);
  const onSaved = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient({ defaultOptions: { queries: { retry: false } } })}>
      <LineEditor invoice={invoice} leftOut={leftOut} onSaved={onSaved} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onSaved };
}

const line = (n: number) => screen.getByRole('group', { name: `Line ${n}` });
const field = (n: number, label: string) => within(line(n)).getByLabelText(label, { exact: true }) as HTMLInputElement;
const type = (n: number, label: string, value: string) => fireEvent.input(field(n, label), { target: { value } });
const totals = () => screen.getByRole('table', { name: 'Totals' }).textContent;

// Each test types, submits and re-renders a form of many fields; on a busy two-core machine that takes seconds.
describe('LineEditor', { timeout: 15_000 }, () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('shows each line with its rate once the rates arrive, and the totals as they will be issued', async () => {
    show();
    await waitFor(() => expect((field(1, 'VAT rate') as unknown as HTMLSelectElement).value).toBe('standard'));
    expect(within(line(1)).getByRole('option', { name: '20 % standard rate' })).toBeTruthy();
    expect(screen.getByLabelText('Line 1 net').textContent).toBe('£91.00');
    expect(totals()).toContain('Total before VAT£97.50');
    expect(totals()).toContain('VAT at 20 %£19.50');
    expect(totals()).toContain('Total£117.00');
  });

  it('names the line and the field of every mistake, and sends nothing', async () => {
    const { calls } = show();
    await screen.findAllByRole('option', { name: '20 % standard rate' });
    type(1, 'Quantity', 'two');
    type(2, 'Unit price (£)', '2.105');
    type(2, 'Description', '   ');
    expect(screen.getByLabelText('Line 1 net').textContent).toBe('—');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('Line 1: Quantity: a number with at most three decimal places, like 2.5.')).toBeTruthy();
    expect(screen.getByText('Line 2: Description: say what the line is for. Unit price: pounds and pence, like 12.50.')).toBeTruthy();
    expect(field(1, 'Quantity').getAttribute('aria-invalid')).toBe('true');
    expect(field(1, 'Quantity').getAttribute('aria-describedby')).toBeTruthy();
    expect(field(2, 'Unit price (£)').getAttribute('aria-invalid')).toBe('true');
    expect(field(1, 'Unit').getAttribute('aria-invalid')).toBe('false');
    type(1, 'Quantity', '0');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('Line 1: Quantity: must not be nothing.')).toBeTruthy();
    type(1, 'Quantity', '-1');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('Line 1: Quantity: must be more than nothing.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'PATCH')).toEqual([]);
  });

  it('sends whole pence and exact quantities, with a part added from the price list', async () => {
    const { calls, onSaved } = show();
    await screen.findAllByRole('option', { name: /Cat6 keystone jack/ });
    type(2, 'Quantity', '2.5');
    type(2, 'Unit price (£)', '6.5');
    fireEvent.change(screen.getByLabelText('Add a part from the price list'), { target: { value: 'p9' } });
    expect(field(3, 'Description').value).toBe('Cat6 keystone jack');
    expect(field(3, 'Unit price (£)').value).toBe('4.20');
    // £91.00 + 2.5 × £6.50 = £16.25 + £4.20: £111.45 net; VAT £18.20 + £3.25 + £0.84 = £22.29.
    expect(totals()).toContain('Total before VAT£111.45');
    expect(totals()).toContain('VAT at 20 %£22.29');
    fireEvent.input(screen.getByLabelText('Days to pay'), { target: { value: '14' } });
    fireEvent.click(screen.getByRole('button', { name: 'Save and issue…' }));
    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(expect.anything(), true));
    const patch = calls.find((c) => c.method === 'PATCH')!;
    expect(patch.path).toBe(`/api/invoices/${DRAFT.id}`);
    expect(patch.body).toEqual({
      lines: [
        { kind: 'labour', description: 'Labour on 8 Mar 2026: 1 h 40 min on site', quantity: '1.75', unit: 'h', unitPriceMinor: 5200, vatRateCode: 'standard', visitId: DRAFT.lines[0]!.visitId, priceItemId: null, labourRateId: null },
        // Where the part line came from goes back with it, so its part uses stay invoiced once.
        { kind: 'material', description: 'Twin switched socket-outlet, white', quantity: '2.5', unit: 'each', unitPriceMinor: 650, vatRateCode: 'standard', visitId: null, priceItemId: 'p1', labourRateId: null, partUseIds: DRAFT.lines[1]!.partUseIds },
        { kind: 'material', description: 'Cat6 keystone jack', quantity: '1', unit: 'each', unitPriceMinor: 420, vatRateCode: 'standard', visitId: null, priceItemId: 'p9', labourRateId: null },
      ],
      notes: null,
      termDays: 14,
    });
  });

  it('tells the office what the build left out because another invoice already asks for it', async () => {
    show(DRAFT, ['Visit 3 Dec 2026: labour and 2 parts already on INV-0002, so not taken again.']);
    const note = screen.getByRole('status', { name: 'Left out' });
    expect(within(note).getByText('Left out: already invoiced')).toBeTruthy();
    expect(within(note).getByRole('listitem').textContent).toBe('Visit 3 Dec 2026: labour and 2 parts already on INV-0002, so not taken again.');
    expect(note.textContent).toContain('credit that invoice in full first');
  });

  it('says nothing was left out when nothing was', () => {
    show();
    expect(screen.queryByRole('status', { name: 'Left out' })).toBeNull();
  });

  it('on a credit note, wants quantities below nothing and offers only the rates its invoice charged', async () => {
    const credit: InvoiceDetail = {
      ...DRAFT,
      kind: 'credit-note',
      creditsInvoiceId: 'i1',
      creditsNumber: 'INV-0003',
      lines: DRAFT.lines.map((l) => ({ ...l, quantity: `-${l.quantity}`, netMinor: -l.netMinor, vatMinor: -l.vatMinor, grossMinor: -l.grossMinor })),
    };
    const { calls } = show(credit);
    expect(within(field(1, 'VAT rate') as unknown as HTMLElement).getAllByRole('option').map((o) => o.textContent)).toEqual(['Choose…', '20 % standard']);
    expect(screen.queryByLabelText('Add a part from the price list')).toBeNull();
    expect(totals()).toContain('Total credited-£117.00');
    type(2, 'Quantity', '1');
    fireEvent.click(screen.getByRole('button', { name: 'Save draft' }));
    expect(await screen.findByText('Line 2: Quantity: on a credit note it is below nothing, as it takes back what was charged.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'PATCH')).toEqual([]);
  });
});
