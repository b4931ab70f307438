import { describe, expect, it } from 'vitest';
import { bookingDay, clashesOf, UNASSIGNED, visitMovedTo } from './week';

const visit = (id: string, technicianIds: string[], start: string, end: string | null, status = 'planned') => ({ id, jobId: `job-${id}`, technicianIds, plannedStart: start, plannedEnd: end, status });

describe('double bookings', () => {
  const day = [
    visit('a', ['sam'], '2026-12-07T09:00:00.000Z', '2026-12-07T12:00:00.000Z'),
    visit('b', ['aled'], '2026-12-07T13:00:00.000Z', '2026-12-07T17:00:00.000Z'),
    visit('c', ['sam'], '2026-12-07T14:00:00.000Z', '2026-12-07T15:00:00.000Z', 'cancelled'),
  ];

  it('finds a chosen technician already on a visit that overlaps, and no one else', () => {
    const clashes = clashesOf(day, { technicianIds: ['sam', 'aled'], start: '2026-12-07T11:00:00.000Z', end: '2026-12-07T14:00:00.000Z' });
    expect(clashes.map((c) => [c.technicianId, c.visit.id])).toEqual([
      ['sam', 'a'],
      ['aled', 'b'],
    ]);
  });

  it('lets a visit end as the next begins, and ignores cancelled visits and the visit being changed', () => {
    expect(clashesOf(day, { technicianIds: ['sam'], start: '2026-12-07T12:00:00.000Z', end: '2026-12-07T13:00:00.000Z' })).toEqual([]);
    expect(clashesOf(day, { technicianIds: ['sam'], start: '2026-12-07T14:00:00.000Z', end: '2026-12-07T14:30:00.000Z' })).toEqual([]);
    expect(clashesOf(day, { id: 'a', technicianIds: ['sam'], start: '2026-12-07T10:00:00.000Z', end: '2026-12-07T11:00:00.000Z' })).toEqual([]);
  });
});

describe('the day a new booking starts on', () => {
  const monday = new Date('2026-12-07T00:00:00.000Z');
  it('is today in this week, and the Monday of a week ahead', () => {
    expect(bookingDay(monday, new Date('2026-12-09T10:00:00.000Z'))).toBe('2026-12-09');
    expect(bookingDay(monday, new Date('2026-12-05T10:00:00.000Z'))).toBe('2026-12-07');
  });
});

describe('moving a visit on the schedule', () => {
  const v = { technicianIds: ['sam', 'aled'], plannedStart: '2026-12-07T09:00:00.000Z', plannedEnd: '2026-12-07T12:30:00.000Z' };

  it("hands it from the row it left to the row it reached, keeping the others and its time of day", () => {
    expect(visitMovedTo(v, { fromRow: 'sam', toRow: 'rhys', day: '2026-12-09' })).toEqual({
      technicianIds: ['aled', 'rhys'],
      plannedStart: '2026-12-09T09:00:00.000Z',
      plannedEnd: '2026-12-09T12:30:00.000Z',
    });
  });

  it('takes new times, leaves a technician out when it is dropped on Unassigned, and never lists anyone twice', () => {
    expect(visitMovedTo(v, { fromRow: 'sam', toRow: UNASSIGNED, day: '2026-12-07', start: '13:00', end: '15:00' })).toEqual({
      technicianIds: ['aled'],
      plannedStart: '2026-12-07T13:00:00.000Z',
      plannedEnd: '2026-12-07T15:00:00.000Z',
    });
    expect(visitMovedTo(v, { fromRow: 'sam', toRow: 'aled', day: '2026-12-07' }).technicianIds).toEqual(['aled']);
    expect(visitMovedTo({ ...v, technicianIds: [] }, { fromRow: UNASSIGNED, toRow: 'sam', day: '2026-12-08' }).technicianIds).toEqual(['sam']);
  });
});
