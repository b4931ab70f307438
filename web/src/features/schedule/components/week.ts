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
