import { describe, expect, it } from 'vitest';
import { addDays } from '../money/aged-debt.js';
import { notifiableWork, notificationOverdue } from './notifiable-work.js';

const none = { newCircuits: 0, boardReplaced: false };

describe('notifiable work in England', () => {
  // Building Regulations 2010 reg 12(6A) and Schedule 4; Approved Document P 2013 incl. 2016 amendments, section 2:
  // a new circuit, a consumer unit replacement, and an addition or alteration in a special location are notifiable.
  it('a new circuit is notifiable, due 30 days after completion (reg 20, from memory)', () => {
    const v = notifiableWork('england', { ...none, newCircuits: 1 }, '2026-11-20');
    expect(v.notifiable).toBe(true);
    expect(v.reasons.map((r) => r.id)).toEqual(['new-circuit']);
    expect(v.reasons[0]!.source).toContain('Approved Document P');
    expect(v.dueBy).toBe('2026-12-20');
    expect(v.daysSource).toContain('from memory');
  });

  it('a consumer unit replacement is notifiable (Schedule 4; ADP section 2)', () => {
    expect(notifiableWork('england', { ...none, boardReplaced: true }, '2026-01-15').reasons.map((r) => r.id)).toEqual(['board-replaced']);
  });

  it('an alteration in a bathroom is notifiable; one in a kitchen is not since 2013 (ADP 2013, section 2)', () => {
    expect(notifiableWork('england', { ...none, specialLocation: true }, '2026-01-15').notifiable).toBe(true);
    expect(notifiableWork('england', { ...none, kitchen: true, outdoors: true }, '2026-01-15').notifiable).toBe(false);
  });

  it('an alteration to an existing circuit elsewhere is not notifiable, and has no due date', () => {
    const v = notifiableWork('england', none, '2026-01-15');
    expect(v).toMatchObject({ notifiable: false, reasons: [], dueBy: null });
  });

  it('has no due date until the work is complete', () => {
    expect(notifiableWork('england', { ...none, newCircuits: 2 }, null)).toMatchObject({ notifiable: true, dueBy: null });
  });
});

describe('notifiable work in Wales', () => {
  // Approved Document P (Wales) kept kitchens and outdoor work notifiable (from memory).
  it('an alteration in a kitchen or outdoors is notifiable, with every rule marked from memory', () => {
    const v = notifiableWork('wales', { ...none, kitchen: true, outdoors: true }, '2026-02-01');
    expect(v.reasons.map((r) => r.id)).toEqual(['kitchen', 'outdoors']);
    expect(v.reasons.every((r) => r.fromMemory)).toBe(true);
    expect(v.dueBy).toBe('2026-03-03');
  });
});

describe('nations not covered', () => {
  it.each(['scotland', 'northern-ireland'] as const)('%s says to check locally and never says "not notifiable"', (nation) => {
    const v = notifiableWork(nation, { ...none, newCircuits: 1, boardReplaced: true }, '2026-02-01');
    expect(v).toMatchObject({ covered: false, notifiable: null, dueBy: null });
    expect(v.note).toContain('check locally');
    expect(v.caution).toContain('building control body decide');
  });
});

describe('dates', () => {
  it('adds days on the calendar across months, years and a leap day', () => {
    expect(addDays('2026-12-15', 30)).toBe('2027-01-14');
    expect(addDays('2028-02-10', 30)).toBe('2028-03-11');
    expect(() => addDays('2026-02-31', 30)).toThrow();
  });

  it('is overdue only while still to notify after the last day', () => {
    expect(notificationOverdue('to-notify', '2026-12-20', '2026-12-21')).toBe(true);
    expect(notificationOverdue('to-notify', '2026-12-20', '2026-12-20')).toBe(false);
    expect(notificationOverdue('notified', '2026-12-20', '2027-01-30')).toBe(false);
    expect(notificationOverdue('to-notify', null, '2027-01-30')).toBe(false);
  });
});
