import { describe, expect, it } from 'vitest';
import { bookingDay, clashesOf } from './week';

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
