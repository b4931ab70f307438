// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Person } from '@/lib/directory';
import type { Job, Visit } from '../api/schedule-data';
import { MoveVisitDialog } from '../components/move-visit-dialog';

afterEach(cleanup);

const sam: Person = { id: 'sam', name: 'Sam Brannigan', role: 'technician', active: true };
const aled: Person = { id: 'aled', name: 'Aled Pryce', role: 'technician', active: true };
const jobs: Job[] = [
  { id: 'j1', siteId: 's', reference: 'LED-0041', title: 'Move two sockets', status: 'booked' },
  { id: 'j2', siteId: 's', reference: 'LED-0042', title: 'Cat6 to reception', status: 'booked' },
];
// Far ahead, so that no day of the test's run has gone by.
const visit: Visit = { id: 'v1', jobId: 'j1', siteId: 's', technicianIds: ['sam'], plannedStart: '2036-12-08T09:00:00.000Z', plannedEnd: '2036-12-08T12:00:00.000Z', status: 'planned' };
const aledsDay: Visit = { id: 'v2', jobId: 'j2', siteId: 's', technicianIds: ['aled'], plannedStart: '2036-12-09T10:00:00.000Z', plannedEnd: '2036-12-09T13:00:00.000Z', status: 'planned' };

describe('moving a dragged visit', () => {
  it("warns that the technician it reaches is booked then, and moves it anyway at the times chosen", () => {
    const onConfirm = vi.fn();
    render(<MoveVisitDialog move={{ visit, fromRow: 'sam', toRow: 'aled', day: '2036-12-09' }} visits={[visit, aledsDay]} jobs={jobs} technicians={[sam, aled]} pending={false} onCancel={() => {}} onConfirm={onConfirm} />);
    expect(screen.getByText(/from Sam Brannigan to Aled Pryce, on Tuesday 9 December/)).toBeTruthy();
    expect(screen.getByText('Aled Pryce is already booked 10:00–13:00 that day on LED-0042 Cat6 to reception.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Move anyway' }));
    expect(onConfirm).toHaveBeenCalledWith({ technicianIds: ['aled'], plannedStart: '2036-12-09T09:00:00.000Z', plannedEnd: '2036-12-09T12:00:00.000Z' });
  });

  it('says when the day has gone by, and asks nothing of a day still to come', () => {
    const { rerender } = render(
      <MoveVisitDialog move={{ visit, fromRow: 'sam', toRow: 'sam', day: '2020-01-06' }} visits={[visit]} jobs={jobs} technicians={[sam, aled]} pending={false} onCancel={() => {}} onConfirm={() => {}} />,
    );
    expect(screen.getByText('That time has already passed: check the day before moving it there.')).toBeTruthy();
    rerender(<MoveVisitDialog move={{ visit, fromRow: 'sam', toRow: 'sam', day: '2036-12-10' }} visits={[visit]} jobs={jobs} technicians={[sam, aled]} pending={false} onCancel={() => {}} onConfirm={() => {}} />);
    expect(screen.queryByRole('alert')).toBeNull();
    expect(screen.getByRole('button', { name: 'Move visit' })).toBeTruthy();
  });
});
