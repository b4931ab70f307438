// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, type FakeCall } from '@/lib/fake-api';
import { setSession } from '@/lib/session';
import { NewJobDialog } from '../components/new-job-dialog';

const CUSTOMERS = { items: [{ id: 'c1', name: 'Hannah Greaves', sites: [{ id: 's1', name: 'Orchard Rise' }] }], total: 1, page: 1, pageSize: 200 };

function show(props: { customerId?: string; siteId?: string } = {}, refuseJobOnce = false) {
  let refused = false;
  const api = fakeApi((c: FakeCall) => {
    if (c.method === 'GET' && c.path.startsWith('/api/customers')) return { status: 200, body: CUSTOMERS };
    if (c.method === 'POST' && c.path === '/api/customers') return { status: 201, body: { id: 'c-new', ...(c.body as object) } };
    if (c.method === 'POST' && c.path === '/api/sites') return { status: 201, body: { id: 's-new', ...(c.body as object) } };
    if (c.method === 'POST' && c.path === '/api/jobs') {
      if (refuseJobOnce && !refused) {
        refused = true;
        return { status: 400, body: { statusCode: 400, message: ['title: too long'] } };
      }
      return { status: 201, body: { id: 'j-new', reference: 'LED-0046', ...(c.body as object) } };
    }
    return undefined;
  });
  vi.stubGlobal('fetch', api.fetch);
  const onCreated = vi.fn();
  render(
    <QueryClientProvider client={new QueryClient()}>
      <NewJobDialog {...props} onClose={vi.fn()} onCreated={onCreated} />
    </QueryClientProvider>,
  );
  return { calls: api.calls, onCreated };
}

const input = (label: string, value: string) => fireEvent.input(screen.getByLabelText(label), { target: { value } });
async function choose(label: string, option: string) {
  fireEvent.mouseDown(screen.getByRole('combobox', { name: label }));
  fireEvent.click(await within(await screen.findByRole('listbox')).findByRole('option', { name: option }));
}
const writes = (calls: FakeCall[]) => calls.filter((c) => c.method !== 'GET').map((c) => [c.method, c.path, c.body]);

describe('a new job at the desk', () => {
  beforeEach(() => setSession({ accessToken: 'a', refreshToken: 'r', user: { id: 'u', email: 'office@larkfield.example', name: 'Dan Whitlow', role: 'office', organisationId: 'o' } }));
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
    setSession(null);
  });

  it('says what is missing next to each field and sends nothing', { timeout: 20_000 }, async () => {
    const { calls } = show();
    fireEvent.click(screen.getByRole('button', { name: 'Take the job' }));
    expect(await screen.findByText('Choose who the job is for, or take a new customer.')).toBeTruthy();
    expect(screen.getByText('What the job is must not be empty.')).toBeTruthy();
    await choose('Customer', 'A new customer…');
    fireEvent.click(screen.getByRole('button', { name: 'Take the job' }));
    expect(await screen.findByText('Give the new customer’s name.')).toBeTruthy();
    expect(screen.getByText('Give the address where the work is.')).toBeTruthy();
    expect(writes(calls)).toEqual([]);
  });

  it('takes a new customer and a new site there and then, and the job for them, in that order', { timeout: 20_000 }, async () => {
    const { calls, onCreated } = show();
    await choose('Customer', 'A new customer…');
    input('Name', 'Priya Natarajan');
    input('Phone', '07700 900871');
    input('Address', '3 Mill Lane, Wendmouth');
    input('Postcode', 'WM4 1QT');
    input('What the job is', 'Replace the kitchen downlights');
    fireEvent.click(screen.getByRole('button', { name: 'Take the job' }));
    await waitFor(() => expect(onCreated).toHaveBeenCalled());
    expect(writes(calls)).toEqual([
      ['POST', '/api/customers', { name: 'Priya Natarajan', phone: '07700 900871', email: null }],
      ['POST', '/api/sites', { address: '3 Mill Lane, Wendmouth', postcode: 'WM4 1QT', accessNotes: null, customerId: 'c-new' }],
      ['POST', '/api/jobs', { customerId: 'c-new', siteId: 's-new', title: 'Replace the kitchen downlights', description: null, status: 'enquiry' }],
    ]);
  });

  it('starts from the site it was opened on, and after a refusal tries again without making the customer or site twice', async () => {
    const { calls, onCreated } = show({ customerId: 'c1', siteId: 's1' }, true);
    await waitFor(() => expect(screen.getByRole('combobox', { name: 'Site' }).textContent).toBe('Orchard Rise'));
    input('What the job is', 'Outside socket by the shed');
    fireEvent.click(screen.getByRole('button', { name: 'Take the job' }));
    expect(await screen.findByText(/The server did not save this: title: too long/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Take the job' }));
    await waitFor(() => expect(onCreated).toHaveBeenCalled());
    expect(writes(calls).map(([m, p]) => `${m} ${p}`)).toEqual(['POST /api/jobs', 'POST /api/jobs']);
  });
});
