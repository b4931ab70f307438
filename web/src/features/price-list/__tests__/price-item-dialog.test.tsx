// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import type { PriceItem } from '@/lib/price-list';
import { PriceItemDialog } from '../components/price-item-dialog';

const RATES = { items: [{ id: 'v1', code: 'standard', name: 'Standard rate', basisPoints: 2000, active: true }, { id: 'v3', code: 'zero', name: 'Zero rate', basisPoints: 0, active: true }] };
const ITEM: PriceItem = { id: 'p1', version: 7, name: '2.5 mm² twin and earth cable', unit: 'm', category: 'Cable', code: 'LED-TE-25', costMinor: 95, sellMinor: 160, vatRateCode: 'standard', active: true };

function show(item: PriceItem | null) {
  const api = fakeApi((c: FakeCall) => (c.path === '/api/vat-rates' ? { status: 200, body: RATES } : { status: c.method === 'POST' ? 201 : 200, body: { ...ITEM, ...(c.body as object) } }));
  vi.stubGlobal('fetch', api.fetch);
  const onClose = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient()}>
      <PriceItemDialog open item={item} onClose={onClose} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onClose };
}

const input = (label: string, value: string) => fireEvent.input(screen.getByLabelText(label), { target: { value } });

describe('PriceItemDialog', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('names the field of each mistake and saves nothing', async () => {
    const { calls } = show(null);
    input('Unit', '');
    input('Cost (£)', '0.955');
    fireEvent.click(screen.getByRole('button', { name: 'Add' }));
    expect(await screen.findByText('Name: say what the item is.')).toBeTruthy();
    expect(screen.getByText('Unit: say what one of it is, like each or m.')).toBeTruthy();
    expect(screen.getByText('Cost: enter pounds and pence, like 12.50.')).toBeTruthy();
    expect(screen.getByText('Sell price: enter what one unit is charged at, before VAT.')).toBeTruthy();
    expect(calls.filter((c) => c.method !== 'GET')).toEqual([]);
  });

  it('sends a change in whole pence', async () => {
    const { calls, onClose } = show(ITEM);
    expect((screen.getByLabelText('Sell price (£)') as HTMLInputElement).value).toBe('1.60');
    input('Sell price (£)', '1.75');
    input('Code', '');
    fireEvent.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(calls.find((c) => c.method === 'PATCH')).toEqual({
      method: 'PATCH',
      path: '/api/price-items/p1',
      body: { name: ITEM.name, unit: 'm', category: 'Cable', code: null, costMinor: 95, sellMinor: 175, vatRateCode: 'standard', active: true },
    });
  });
});
