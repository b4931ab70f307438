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
