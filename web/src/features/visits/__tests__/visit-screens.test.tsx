// @vitest-environment happy-dom
import 'fake-indexeddb/auto';
import { cleanup, fireEvent, render, screen, waitFor, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { Component as TodayScreen } from '@/app/routes/technician/today';
import { Component as VisitScreen } from '@/app/routes/technician/visit';
import { paths } from '@/config/paths';
import { db, type LocalRow } from '@/lib/db';
import { setSession } from '@/lib/session';

const USER = { id: '01900000-0000-7000-8000-0000000000aa', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };
const ids = {
  customer: '01900000-0000-7000-8000-000000000001',
  site: '01900000-0000-7000-8000-000000000002',
  job: '01900000-0000-7000-8000-000000000003',
  visit: '01900000-0000-7000-8000-000000000004',
  otherVisit: '01900000-0000-7000-8000-000000000005',
  board: '01900000-0000-7000-8000-000000000006',
};
const base = { _base: { version: 1, fieldVersions: {}, values: {} } } satisfies Pick<LocalRow, '_base'>;

function at(hours: number, dayOffset = 0): string {
  const d = new Date();
  d.setDate(d.getDate() + dayOffset);
  d.setHours(hours, 0, 0, 0);
  return d.toISOString();
}

function show(path: string) {
  const router = createMemoryRouter(
    [
      { path: paths.today.path, element: <TodayScreen /> },
      { path: paths.visit.path, element: <VisitScreen /> },
    ],
    { initialEntries: [path] },
  );
  render(<RouterProvider router={router} />);
  return router;
}

beforeEach(async () => {
  await db.open();
  await Promise.all(db.tables.map((t) => t.clear()));
  setSession({ accessToken: 'a', refreshToken: 'r', user: USER });
  await db.customer.put({ id: ids.customer, name: 'Hannah Greaves', ...base });
  await db.site.put({ id: ids.site, customerId: ids.customer, address: '14 Orchard Rise, Wendmouth', postcode: 'WM2 4HD', ...base });
  await db.job.put({ id: ids.job, siteId: ids.site, customerId: ids.customer, title: 'Move two lounge sockets', ...base });
  await db.visit.bulkPut([
    { id: ids.visit, jobId: ids.job, siteId: ids.site, technicianIds: [USER.id], plannedStart: at(9), plannedEnd: at(12), status: 'planned', ...base },
    // Someone else's visit, and one of mine too far ahead: neither belongs on Today.
    { id: ids.otherVisit, jobId: ids.job, siteId: ids.site, technicianIds: ['someone-else'], plannedStart: at(9), status: 'planned', ...base },
    { id: '01900000-0000-7000-8000-000000000007', jobId: ids.job, siteId: ids.site, technicianIds: [USER.id], plannedStart: at(9, 20), ...base },
  ]);
});

afterEach(() => {
  cleanup();
  setSession(null);
});

describe('Today', () => {
  it('lists my visits with the job, customer and address, read from the phone', async () => {
    show(paths.today.path);
    const visits = await screen.findByRole('region', { name: 'My visits' });
    const links = await within(visits).findAllByRole('link');
    expect(links).toHaveLength(1);
    expect(links[0]!.getAttribute('href')).toBe(`/visits/${ids.visit}`);
    expect(within(visits).getByText('Move two lounge sockets')).toBeTruthy();
    expect(within(visits).getByText('Hannah Greaves')).toBeTruthy();
    expect(within(visits).getByText('14 Orchard Rise, Wendmouth, WM2 4HD')).toBeTruthy();
    expect(within(visits).getByText(/Today · 09:00–12:00/)).toBeTruthy();
  });

  it('says so when nothing is booked', async () => {
    await db.visit.clear();
    show(paths.today.path);
    expect(await screen.findByText('No visits booked for you')).toBeTruthy();
  });
});

describe('Visit', () => {
  it('adds a note on the phone, newest first, waiting to send', async () => {
    await db.note.put({ id: '01900000-0000-7000-8000-000000000010', visitId: ids.visit, siteId: ids.site, text: 'Earlier note', createdAt: at(8), ...base });
    show(paths.visit.href(ids.visit));
    expect(await screen.findByRole('heading', { level: 1, name: 'Move two lounge sockets' })).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Add note' }));
    expect(await screen.findByText('Write the note first.')).toBeTruthy();

    fireEvent.change(screen.getByLabelText('Note'), { target: { value: 'Spaniel shut in the kitchen; isolated circuit 1 and proved dead' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add note' }));

    const list = await screen.findByRole('list', { name: 'Notes on this visit' });
    await waitFor(() => expect(within(list).getAllByRole('listitem')).toHaveLength(2));
    const [first, second] = within(list).getAllByRole('listitem');
    expect(first!.textContent).toContain('Spaniel shut in the kitchen');
    expect(first!.textContent).toContain('waiting to send');
    expect(second!.textContent).toContain('Earlier note');
    const outbox = await db.outbox.toArray();
    expect(outbox).toHaveLength(1);
    expect(outbox[0]).toMatchObject({ entity: 'note', set: { visitId: ids.visit, siteId: ids.site } });
  });

  it('adds a circuit, making the board first when the site has none, under a safety caution', async () => {
    show(paths.visit.href(ids.visit));
    expect(await screen.findByText(/prove dead/)).toBeTruthy();
    expect(screen.getByText(/regulations in force, local codes and licensed practice decide/)).toBeTruthy();

    fireEvent.change(await screen.findByLabelText('Board name'), { target: { value: 'Consumer unit, hall' } });
    fireEvent.change(screen.getByLabelText('Circuit number'), { target: { value: '5' } });
    fireEvent.change(screen.getByLabelText('Description'), { target: { value: 'Electric fire, fused spur' } });
    fireEvent.change(screen.getByLabelText('Kind'), { target: { value: 'radial' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add circuit' }));

    const list = await screen.findByRole('list', { name: 'Circuits on this site' });
    expect(await within(list).findByText('5 · Electric fire, fused spur')).toBeTruthy();
    expect(within(list).getByText('Consumer unit, hall')).toBeTruthy();
    expect(within(list).getByText('Radial · waiting to send')).toBeTruthy();
    expect((await db.outbox.orderBy('seq').toArray()).map((e) => e.entity)).toEqual(['board', 'circuit']);

    // The new board is now chosen for the next circuit.
    expect((screen.getByLabelText('Board') as HTMLSelectElement).value).toBe((await db.board.toArray())[0]!.id);
  });

  it('says so when the visit is not on this phone', async () => {
    show(paths.visit.href('01900000-0000-7000-8000-0000000000ff'));
    expect(await screen.findByText('This visit is not on this phone')).toBeTruthy();
  });
});
