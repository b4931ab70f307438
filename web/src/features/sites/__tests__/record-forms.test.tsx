// @vitest-environment happy-dom
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { PROTECTIVE_DEVICE_WORDS } from '@wiretrail/core';
import type { ReactNode } from 'react';
import { describe, expect, it, vi } from 'vitest';
import { officeApiForEachTest, sentBy } from '@/testing/office-api';
import type { Area } from '../api/get-areas';
import type { Board, Circuit } from '../api/get-circuits';
import type { Customer } from '../api/get-customers';
import type { Site } from '../api/get-sites';
import { AreaDialog } from '../components/forms/area-dialog';
import { BoardDialog } from '../components/forms/board-dialog';
import { CircuitDialog } from '../components/forms/circuit-dialog';
import { CustomerDialog } from '../components/forms/customer-dialog';
import { SiteDialog } from '../components/forms/site-dialog';

const SITE_ID = '01900000-0000-7000-8000-000000000002';
const customer: Customer = { id: '01900000-0000-7000-8000-000000000001', name: 'Hannah Greaves', email: null, phone: null, address: null, notes: null };
const site: Site = {
  id: SITE_ID, customerId: customer.id, name: 'Orchard Rise', address: '14 Orchard Rise, Wendmouth', postcode: 'WM2 4HD',
  earthing: 'TN-C-S', zeOhm: 0.28, pfcKa: 1.8, accessNotes: null,
  earthingConductor: null, bondingWater: null, bondingGas: null, bondingOil: null, bondingSteel: null, bondingOther: null, bondingOtherWhat: null,
};
const boards: Board[] = [
  { id: '01900000-0000-7000-8000-000000000006', siteId: SITE_ID, areaId: null, name: 'Consumer unit', description: null, zdbOhm: null, replacedOnVisitId: null },
  { id: '01900000-0000-7000-8000-000000000007', siteId: SITE_ID, areaId: null, name: 'Garage sub-board', description: null, zdbOhm: null, replacedOnVisitId: null },
];
const areas: Area[] = [{ id: '01900000-0000-7000-8000-000000000008', siteId: SITE_ID, name: 'Lounge', level: 'Ground' }];
const circuit: Circuit = {
  id: '01900000-0000-7000-8000-000000000009', siteId: SITE_ID, boardId: boards[0]!.id, number: '1', description: 'Sockets, ground floor', kind: 'ring',
  deviceType: 'B', deviceRatingA: 32, rcdRatingMa: 30, rcdType: 'A', liveCsaMm2: 2.5, cpcCsaMm2: 1.5, lengthM: null, faultProtection: null, newOnVisitId: null, wiringType: null, deviceBreakingKa: null, recordedAt: null,
  deviceStandard: null, rcdStandard: null, rcdRatedCurrentA: null, afddStandard: null, referenceMethod: null, pointsServed: null, maxDisconnectionS: null,
};

const api = officeApiForEachTest();
const answer = (status: number, body: unknown) => api.fetch.mockResolvedValueOnce(new Response(JSON.stringify(body), { status }));
const sent = (n = 0) => sentBy(api.fetch, n);

function show(ui: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  render(<QueryClientProvider client={client}>{ui}</QueryClientProvider>);
  return within(screen.getByRole('dialog'));
}

const type = (dialog: ReturnType<typeof show>, label: string, value: string) => fireEvent.input(dialog.getByLabelText(label), { target: { value } });
const save = (dialog: ReturnType<typeof show>, name: string) => fireEvent.click(dialog.getByRole('button', { name }));


describe('the customer form', () => {
  it('names an empty name and a malformed e-mail instead of sending', async () => {
    const dialog = show(<CustomerDialog onClose={vi.fn()} />);
    type(dialog, 'Name', '   ');
    type(dialog, 'E-mail', 'hannah at example');
    save(dialog, 'Add customer');
    expect(await dialog.findByText('Name must not be empty.')).toBeTruthy();
    expect(dialog.getByText('E-mail must be an e-mail address, like name@example.com.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
  });

  it('names a phone number that cannot be dialled, and writes one that can as it is dialled', async () => {
    const dialog = show(<CustomerDialog onClose={vi.fn()} />);
    type(dialog, 'Name', 'Ada Fenwick');
    type(dialog, 'Phone', 'call me maybe');
    save(dialog, 'Add customer');
    expect(await dialog.findByText('Phone is not a phone number, like 07700 900871 or 01632 960123.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
    answer(201, { ...customer, id: 'new', name: 'Ada Fenwick' });
    type(dialog, 'Phone', '+447700900123');
    save(dialog, 'Add customer');
    await waitFor(() => expect(sent()).toEqual({ url: '/api/customers', method: 'POST', body: { name: 'Ada Fenwick', phone: '07700 900123' } }));
  });

  it('refuses a name longer than the registry allows (200 characters)', async () => {
    const dialog = show(<CustomerDialog onClose={vi.fn()} />);
    type(dialog, 'Name', 'x'.repeat(201));
    save(dialog, 'Add customer');
    expect(await dialog.findByText('Name must be at most 200 characters.')).toBeTruthy();
  });

  it('sends a new customer without the fields left empty, and closes', async () => {
    const onClose = vi.fn();
    answer(201, { ...customer, id: 'new', name: 'Ada Fenwick' });
    const dialog = show(<CustomerDialog onClose={onClose} />);
    type(dialog, 'Name', '  Ada Fenwick ');
    type(dialog, 'Phone', '07700 900123');
    save(dialog, 'Add customer');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sent()).toEqual({ url: '/api/customers', method: 'POST', body: { name: 'Ada Fenwick', phone: '07700 900123' } });
  });

  it("shows the server's refusal plainly and stays open", async () => {
    const onClose = vi.fn();
    answer(400, { statusCode: 400, message: ['customer.name must not be empty'], error: 'Bad Request' });
    const dialog = show(<CustomerDialog customer={customer} onClose={onClose} />);
    type(dialog, 'Phone', '07700 900412');
    save(dialog, 'Save changes');
    expect((await dialog.findByRole('alert')).textContent).toBe('The server did not save this: customer.name must not be empty');
    expect(onClose).not.toHaveBeenCalled();
  });
});

describe('the site form', () => {
  it('names each bad figure: a negative Ze, a Ze that is not a number, a fault current above 100 kA', async () => {
    const dialog = show(<SiteDialog site={site} customers={[customer]} onClose={vi.fn()} />);
    type(dialog, 'Ze (Ω)', '-1');
    type(dialog, 'Prospective fault current (kA)', '120');
    save(dialog, 'Save changes');
    expect(await dialog.findByText('Ze must be at least 0 Ω.')).toBeTruthy();
    expect(dialog.getByText('Prospective fault current must be at most 100 kA.')).toBeTruthy();
    type(dialog, 'Ze (Ω)', 'abc');
    save(dialog, 'Save changes');
    expect(await dialog.findByText('Ze must be a number, like 0.35 Ω.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
  });

  it('requires the address and the customer of a new site', async () => {
    const dialog = show(<SiteDialog customers={[customer]} onClose={vi.fn()} />);
    save(dialog, 'Add site');
    expect(await dialog.findByText('Address must not be empty.')).toBeTruthy();
    expect(dialog.getByText('Choose the customer.')).toBeTruthy();
  });

  it('names text that is not a postcode, and writes a postcode as Royal Mail does', async () => {
    const dialog = show(<SiteDialog site={site} customers={[customer]} onClose={vi.fn()} />);
    type(dialog, 'Postcode', 'Wendmouth');
    save(dialog, 'Save changes');
    expect(await dialog.findByText('Postcode is not a UK postcode, like WM4 1QT.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
    answer(200, { ...site, postcode: 'WM4 1QT' });
    type(dialog, 'Postcode', 'wm41qt');
    save(dialog, 'Save changes');
    await waitFor(() => expect(sent()).toEqual({ url: `/api/sites/${SITE_ID}`, method: 'PATCH', body: { postcode: 'WM4 1QT' } }));
  });

  it('sends only the changed Ze, read with a decimal comma, as a number', async () => {
    const onClose = vi.fn();
    answer(200, { ...site, zeOhm: 0.35 });
    const dialog = show(<SiteDialog site={site} customers={[customer]} onClose={onClose} />);
    type(dialog, 'Ze (Ω)', '0,35');
    save(dialog, 'Save changes');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sent()).toEqual({ url: `/api/sites/${SITE_ID}`, method: 'PATCH', body: { zeOhm: 0.35 } });
  });

  it('clears a figure left empty by sending null', async () => {
    answer(200, { ...site, pfcKa: null });
    const onClose = vi.fn();
    const dialog = show(<SiteDialog site={site} customers={[customer]} onClose={onClose} />);
    type(dialog, 'Prospective fault current (kA)', '');
    save(dialog, 'Save changes');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sent().body).toEqual({ pfcKa: null });
  });

  it('closes without asking the server when nothing changed', async () => {
    const onClose = vi.fn();
    const dialog = show(<SiteDialog site={site} customers={[customer]} onClose={onClose} />);
    save(dialog, 'Save changes');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(api.fetch).not.toHaveBeenCalled();
  });
});

describe('the circuit form', () => {
  it('names a rating that is not a number, an empty way number, a board not chosen and an RCD above 3000 mA', async () => {
    const dialog = show(<CircuitDialog siteId={SITE_ID} boards={boards} onClose={vi.fn()} />);
    type(dialog, 'Rating', 'abc');
    type(dialog, 'RCD rating', '5000');
    type(dialog, 'Live conductor size', '0.2');
    save(dialog, 'Add circuit');
    expect(await dialog.findByText('Rating must be a number, like 32 A.')).toBeTruthy();
    expect(dialog.getByText('Circuit number must not be empty.')).toBeTruthy();
    expect(dialog.getByText('Choose the board.')).toBeTruthy();
    expect(dialog.getByText('RCD rating must be at most 3000 mA.')).toBeTruthy();
    expect(dialog.getByText('Live conductor size must be at least 0.5 mm².')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
  });

  it("offers the protective devices in core's words, as the phone names them", async () => {
    show(<CircuitDialog siteId={SITE_ID} boards={boards} onClose={vi.fn()} />);
    fireEvent.mouseDown(within(screen.getByRole('dialog')).getByRole('combobox', { name: 'Protective device' }));
    const options = (await screen.findAllByRole('option')).map((o) => o.textContent);
    expect(options).toEqual(['Not recorded', ...Object.values(PROTECTIVE_DEVICE_WORDS)]);
    expect(options).toContain('BS 3036 semi-enclosed fuse');
  });

  it("offers the ratings the chosen device is made in, the RCD types and the cable sizes, and still takes a typed value", async () => {
    const dialog = show(<CircuitDialog siteId={SITE_ID} boards={[boards[0]!]} onClose={vi.fn()} />);
    fireEvent.mouseDown(dialog.getByRole('combobox', { name: 'Protective device' }));
    fireEvent.click(await screen.findByRole('option', { name: PROTECTIVE_DEVICE_WORDS.B }));
    const offered = async (label: string) => {
      fireEvent.mouseDown(dialog.getByRole('combobox', { name: label }));
      const list = (await screen.findAllByRole('option')).map((o) => o.textContent);
      fireEvent.keyDown(dialog.getByRole('combobox', { name: label }), { key: 'Escape' });
      return list;
    };
    // BS 7671:2018+A2:2022 Table 41.3: type B circuit-breakers 6 A to 125 A
    expect(await offered('Rating')).toEqual(['6', '10', '16', '20', '25', '32', '40', '50', '63', '80', '100', '125']);
    expect(await offered('RCD type')).toEqual(['A', 'AC', 'F', 'B', 'A S', 'AC S', 'F S', 'B S']);
    expect(await offered('cpc size')).toEqual(expect.arrayContaining(['1', '1.5', '2.5', '4', '6', '10', '16']));
    // A value off the list is typed, and the check says why it cannot be so, beside its field.
    type(dialog, 'Circuit number', '5');
    type(dialog, 'Rating', '17');
    type(dialog, 'RCD type', 'Q');
    type(dialog, 'Live conductor size', '2.5');
    type(dialog, 'cpc size', '4');
    save(dialog, 'Add circuit');
    expect(await dialog.findByText('Rating: this device is not made in 17 A. Choose one of 6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125 A.')).toBeTruthy();
    expect(dialog.getByText('RCD type must be AC, A, F or B, with S if it is time-delayed.')).toBeTruthy();
    expect(dialog.getByText('Cpc size: 4 mm² is larger than the 2.5 mm² live conductors it runs with; check both sizes.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
  });

  it('adds a circuit to the only board with its figures as numbers', async () => {
    const onClose = vi.fn();
    answer(201, { ...circuit, id: 'new', number: '5' });
    const dialog = show(<CircuitDialog siteId={SITE_ID} boards={[boards[0]!]} onClose={onClose} />);
    type(dialog, 'Circuit number', '5');
    type(dialog, 'Description', 'Garden office');
    type(dialog, 'Rating', '20');
    type(dialog, 'RCD rating', '30');
    type(dialog, 'Live conductor size', '2.5');
    type(dialog, 'cpc size', '1.5');
    save(dialog, 'Add circuit');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sent()).toEqual({
      url: '/api/circuits',
      method: 'POST',
      body: { siteId: SITE_ID, boardId: boards[0]!.id, number: '5', description: 'Garden office', deviceRatingA: 20, rcdRatingMa: 30, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 },
    });
  });

  it('changes one figure of a recorded circuit', async () => {
    const onClose = vi.fn();
    answer(200, { ...circuit, deviceRatingA: 20 });
    const dialog = show(<CircuitDialog siteId={SITE_ID} circuit={circuit} boards={boards} onClose={onClose} />);
    type(dialog, 'Rating', '20');
    save(dialog, 'Save changes');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sent()).toEqual({ url: `/api/circuits/${circuit.id}`, method: 'PATCH', body: { deviceRatingA: 20 } });
  });
});

describe('the area and board forms', () => {
  it('need a name', async () => {
    const area = show(<AreaDialog siteId={SITE_ID} onClose={vi.fn()} />);
    save(area, 'Add area');
    expect(await area.findByText('Area name must not be empty.')).toBeTruthy();
    cleanup();
    const board = show(<BoardDialog siteId={SITE_ID} areas={areas} onClose={vi.fn()} />);
    save(board, 'Add board');
    expect(await board.findByText('Board name must not be empty.')).toBeTruthy();
    expect(api.fetch).not.toHaveBeenCalled();
  });

  it('add an area on the site', async () => {
    const onClose = vi.fn();
    answer(201, { id: 'new', siteId: SITE_ID, name: 'Loft', level: null });
    const dialog = show(<AreaDialog siteId={SITE_ID} onClose={onClose} />);
    type(dialog, 'Area name', 'Loft');
    save(dialog, 'Add area');
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    expect(sent()).toEqual({ url: '/api/areas', method: 'POST', body: { siteId: SITE_ID, name: 'Loft' } });
  });
});
