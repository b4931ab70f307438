// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { paths } from '@/config/paths';
import { db } from '@/lib/db';
import { addRing, at, base, ids, resetPhone, show, tidyUp } from '@/test/visit-fixtures';

beforeEach(resetPhone);

// Before the note the test adds, whatever the time of day the tests run.
const anHourAgo = () => new Date(Date.now() - 60 * 60_000).toISOString();
afterEach(tidyUp);

describe('Today', () => {
  it('lists my visits with the job, customer, address and access notes, read from the phone', async () => {
    show(paths.today.path);
    const visits = await screen.findByRole('region', { name: 'My visits' });
    const cards = await within(visits).findAllByRole('article');
    expect(cards).toHaveLength(1);
    const card = cards[0]!;
    expect(within(card).getByRole('link', { name: /^Open Move two lounge sockets/ }).getAttribute('href')).toBe(`/visits/${ids.visit}`);
    expect(within(card).getByText('Hannah Greaves')).toBeTruthy();
    expect(within(card).getByText('14 Orchard Rise, Wendmouth, WM2 4HD')).toBeTruthy();
    expect(within(card).getByText(/Today · 09:00–12:00/)).toBeTruthy();
    expect(within(card).getByText(/Key safe by the back door/)).toBeTruthy();
    expect(within(card).getByRole('link', { name: 'Directions' }).getAttribute('href')).toContain(encodeURIComponent('14 Orchard Rise, Wendmouth, WM2 4HD'));
  });

  it('records arrival at today’s visit with one tap, then opens the visit first and offers sign-off beside it', async () => {
    show(paths.today.path);
    fireEvent.click(await screen.findByRole('button', { name: 'I’m on site' }));
    expect((await screen.findByRole('link', { name: 'Open visit' })).getAttribute('href')).toBe(`/visits/${ids.visit}`);
    expect(screen.getByRole('link', { name: 'Sign off' }).getAttribute('href')).toBe(`/visits/${ids.visit}/sign-off`);
    expect(screen.queryByRole('dialog')).toBeNull();
    const visit = await db.visit.get(ids.visit);
    expect(visit).toMatchObject({ status: 'on-site' });
    expect(Date.parse(visit!.actualStart!)).toBeGreaterThan(Date.now() - 60_000);
    expect((await db.outbox.toArray()).map((e) => e.set)).toEqual([expect.objectContaining({ status: 'on-site', actualStart: visit!.actualStart })]);
  });

  it('takes a mistaken arrival back', async () => {
    show(paths.today.path);
    fireEvent.click(await screen.findByRole('button', { name: 'I’m on site' }));
    expect(await screen.findByText(/^Arrival recorded at \d\d:\d\d\.$/)).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Undo' }));
    expect(await screen.findByRole('button', { name: 'I’m on site' })).toBeTruthy();
    const visit = await db.visit.get(ids.visit);
    expect(visit).toMatchObject({ status: 'planned', actualStart: null });
  });

  it('asks before recording arrival at a visit booked for another day', async () => {
    await db.visit.update(ids.visit, { plannedStart: at(9, 1), plannedEnd: at(12, 1) });
    show(paths.today.path);
    fireEvent.click(await screen.findByRole('button', { name: 'I’m on site' }));
    const ask = await screen.findByRole('dialog', { name: 'On site for a visit booked tomorrow?' });
    expect(ask.textContent).toContain('Move two lounge sockets is booked for Tomorrow, 09:00–12:00.');
    fireEvent.click(within(ask).getByRole('button', { name: 'Not yet' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(await db.visit.get(ids.visit)).toMatchObject({ status: 'planned' });
    expect(await db.outbox.count()).toBe(0);
    fireEvent.click(screen.getByRole('button', { name: 'I’m on site' }));
    fireEvent.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'I’m on site now' }));
    expect(await screen.findByRole('link', { name: 'Open visit' })).toBeTruthy();
    expect(await db.visit.get(ids.visit)).toMatchObject({ status: 'on-site' });
  });

  it('says so when nothing is booked', async () => {
    await db.visit.clear();
    show(paths.today.path);
    expect(await screen.findByText('No visits booked for you')).toBeTruthy();
  });
});

describe('Visit', () => {
  it('adds a quick note that shows whole on the trail, newest first', async () => {
    await db.note.put({ id: '01900000-0000-7000-8000-000000000010', visitId: ids.visit, siteId: ids.site, text: 'Earlier note', createdAt: anHourAgo(), ...base });
    show(paths.visit.href(ids.visit));
    expect(await screen.findByRole('heading', { level: 1, name: 'Move two lounge sockets' })).toBeTruthy();

    fireEvent.click(await screen.findByRole('button', { name: 'Add note' }));
    expect(await screen.findByText('Write the note first.')).toBeTruthy();

    const long = 'Spaniel shut in the kitchen; isolated circuit 1 at the board, locked off and proved dead at the lounge socket before opening it up';
    fireEvent.change(screen.getByLabelText('Note'), { target: { value: long } });
    fireEvent.click(screen.getByRole('button', { name: 'Add note' }));

    const trail = await screen.findByRole('list', { name: 'Trail of this visit' });
    await waitFor(() => expect(within(trail).getAllByRole('listitem')).toHaveLength(2));
    const [first, second] = within(trail).getAllByRole('listitem');
    expect(first!.textContent).toContain(long);
    expect(second!.textContent).toContain('Earlier note');
    expect((await db.outbox.toArray())[0]).toMatchObject({ entity: 'note', set: { visitId: ids.visit, siteId: ids.site, text: long } });
  });

  it('shows the safety cautions once per visit before circuit work, and keeps when they were read', async () => {
    show(paths.visitCircuits.href(ids.visit));
    expect(await screen.findByRole('heading', { name: 'Before you work on a circuit' })).toBeTruthy();
    expect(screen.getByText(/Prove it dead at the point of work with an approved voltage indicator/)).toBeTruthy();
    expect(screen.queryByRole('form', { name: 'Add a circuit' })).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'I have read these cautions' }));
    expect(await screen.findByRole('form', { name: 'Add a circuit' })).toBeTruthy();
    expect(screen.getByText(/regulations in force, local codes and a competent person decide/)).toBeTruthy();
    expect((await db.visit.get(ids.visit))!.cautionsReadAt).toBeTruthy();
  });

  it('keeps the caution for tracing an unknown cable in view on the cable list and on a cable being recorded', async () => {
    // DESIGN §7: an unknown cable may be mains, a telephone line with ringing voltage or PoE
    for (const path of [paths.visitCables.href(ids.visit), paths.visitCable.href(ids.visit, 'new')]) {
      show(path);
      const caution = await screen.findByRole('note', { name: 'Tracing an unknown cable' });
      expect(caution.textContent).toMatch(/mains, a telephone line carrying ringing voltage or a data cable carrying PoE/);
      expect(caution.textContent).toMatch(/regulations in force, local codes and a competent person decide/);
      cleanup();
    }
  });

  it('adds a circuit found on site, making its board first, and refuses a rating that is not a number', async () => {
    await db.visit.update(ids.visit, { cautionsReadAt: at(9) });
    show(paths.visitCircuits.href(ids.visit));
    fireEvent.change(await screen.findByLabelText('Board name'), { target: { value: 'Consumer unit, hall' } });
    fireEvent.change(screen.getByLabelText('Circuit number'), { target: { value: '5' } });
    fireEvent.change(screen.getByLabelText('Description'), { target: { value: 'Electric fire, fused spur' } });
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'radial' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Rating (A)' }), { target: { value: 'sixteen' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add circuit' }));
    expect(await screen.findByText('The device rating must be a number, like 32 A.')).toBeTruthy();
    // Details that cannot be so, each named beside its field: no type B breaker is made in 17 A (BS 7671:2018+A2:2022
    // Table 41.3 lists 6 A to 125 A), there is no RCD of type Q, and a cpc is not larger than its live conductors.
    fireEvent.change(screen.getByLabelText('Protective device'), { target: { value: 'B' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Rating (A)' }), { target: { value: '17' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'RCD type' }), { target: { value: 'Q' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Live size (mm²)' }), { target: { value: '2.5' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Cpc size (mm²)' }), { target: { value: '4' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add circuit' }));
    expect(await screen.findByText('Rating: this device is not made in 17 A. Choose one of 6, 10, 16, 20, 25, 32, 40, 50, 63, 80, 100, 125 A.')).toBeTruthy();
    expect(screen.getByText('RCD type must be AC, A, F or B, with S if it is time-delayed.')).toBeTruthy();
    expect(screen.getByText('Cpc size: 4 mm² is larger than the 2.5 mm² live conductors it runs with; check both sizes.')).toBeTruthy();
    expect(await db.outbox.count()).toBe(0);
    fireEvent.change(screen.getByRole('combobox', { name: 'Rating (A)' }), { target: { value: '16' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'RCD type' }), { target: { value: '' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Live size (mm²)' }), { target: { value: '' } });
    fireEvent.change(screen.getByRole('combobox', { name: 'Cpc size (mm²)' }), { target: { value: '' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add circuit' }));

    const list = await screen.findByRole('list', { name: 'Circuits on this site' });
    expect(await within(list).findByText('5 · Electric fire, fused spur')).toBeTruthy();
    expect(within(list).getByText('Consumer unit, hall')).toBeTruthy();
    expect(within(list).getByText(/Radial · B16 · waiting to send/)).toBeTruthy();
    expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.entity)).toEqual(['board', 'circuit']);
    expect((await db.circuit.toArray())[0]).toMatchObject({ deviceType: 'B', deviceRatingA: 16, kind: 'radial' });
    await waitFor(async () => expect((screen.getByLabelText('Board') as HTMLSelectElement).value).toBe((await db.board.toArray())[0]!.id));
  });

  it('shows a finished visit as signed and locked', async () => {
    await addRing();
    await db.visit.update(ids.visit, { status: 'finished', signedAt: at(11), signedByName: 'Sam Brannigan', signatureSvg: '<svg xmlns="http://www.w3.org/2000/svg"/>', workDescription: 'Moved two sockets' });
    show(paths.visitSignOff.href(ids.visit));
    expect(await screen.findByText(/Signed off .* by Sam Brannigan/)).toBeTruthy();
    expect(await screen.findByRole('img', { name: 'Signature of Sam Brannigan' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Finish visit' })).toBeNull();
  });

  it('says so when the visit is not on this phone', async () => {
    show(paths.visit.href('01900000-0000-7000-8000-0000000000ff'));
    expect(await screen.findByText('This visit is not on this phone')).toBeTruthy();
  });
});
