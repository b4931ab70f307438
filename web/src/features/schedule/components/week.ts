/** Monday 00:00 UTC of the week holding `day`: the schedule works in whole weeks. */
export function weekStart(day: Date): Date {
  const d = new Date(Date.UTC(day.getUTCFullYear(), day.getUTCMonth(), day.getUTCDate()));
  const offset = (d.getUTCDay() + 6) % 7;
  d.setUTCDate(d.getUTCDate() - offset);
  return d;
}

export function addDays(day: Date, n: number): Date {
  const d = new Date(day);
  d.setUTCDate(d.getUTCDate() + n);
  return d;
}

export function dayKey(iso: string | Date): string {
  return (typeof iso === 'string' ? iso : iso.toISOString()).slice(0, 10);
}

/** `2026-12-02` and `09:30` → ISO instant; the schedule books in UTC, as the phones show it. */
export function toInstant(date: string, time: string): string {
  return new Date(`${date}T${time}:00.000Z`).toISOString();
}

export function timeOf(iso: string | null): string {
  return iso ? iso.slice(11, 16) : '';
}

/** A visit another of the chosen technicians is already on at an overlapping time. */
export interface Clash {
  technicianId: string;
  visit: { id: string; jobId: string; plannedStart: string | null; plannedEnd: string | null };
}

/**
 * The chosen technicians' other visits that overlap the window [start, end): cancelled ones and the visit being
 * changed do not count. A visit with no finish is taken to run to its start.
 */
export function clashesOf(
  visits: readonly { id: string; jobId: string; technicianIds?: string[] | null; plannedStart: string | null; plannedEnd: string | null; status?: string | null }[],
  chosen: { id?: string; technicianIds: string[]; start: string; end: string },
): Clash[] {
  const from = Date.parse(chosen.start);
  const to = Date.parse(chosen.end);
  const found: Clash[] = [];
  for (const v of visits) {
    if (v.id === chosen.id || v.status === 'cancelled' || !v.plannedStart) continue;
    const vFrom = Date.parse(v.plannedStart);
    const vTo = v.plannedEnd ? Date.parse(v.plannedEnd) : vFrom;
    if (!(vFrom < to && from < Math.max(vTo, vFrom + 1))) continue;
    for (const t of v.technicianIds ?? []) if (chosen.technicianIds.includes(t)) found.push({ technicianId: t, visit: v });
  }
  return found;
}

/** The day "Book a visit" starts on: today when it is in the week shown, else that week's Monday. */
export function bookingDay(monday: Date, today = new Date()): string {
  const inWeek = today >= monday && today < addDays(monday, 7);
  return dayKey(inWeek ? today : monday);
}

/** Who is on a visit and when: what moving it changes. */
export interface VisitPlace {
  technicianIds: string[];
  plannedStart: string;
  plannedEnd: string;
}

/** The row of the schedule that stands for visits with nobody on them. */
export const UNASSIGNED = 'unassigned';

/**
 * Where a visit lands when it is moved from one technician's row to another's (or to Unassigned) and to another day:
 * the technician whose row it left gives it up, the one whose row it reaches takes it, the others keep it, and its
 * start and finish keep their time of day unless new ones are given.
 */
export function visitMovedTo(
  visit: { technicianIds?: string[] | null; plannedStart: string | null; plannedEnd: string | null },
  move: { fromRow: string; toRow: string; day: string; start?: string; end?: string },
): VisitPlace {
  const kept = (visit.technicianIds ?? []).filter((id) => id !== move.fromRow || move.fromRow === move.toRow);
  const technicianIds = move.toRow === UNASSIGNED || kept.includes(move.toRow) ? kept : [...kept, move.toRow];
  const start = move.start ?? (timeOf(visit.plannedStart) || '09:00');
  const end = move.end ?? (timeOf(visit.plannedEnd) || start);
  return { technicianIds, plannedStart: toInstant(move.day, start), plannedEnd: toInstant(move.day, end) };
}
