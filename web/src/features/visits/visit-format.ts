const time = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });
const day = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short' });

const startOfDay = (d: Date) => new Date(d.getFullYear(), d.getMonth(), d.getDate());

/** "Today", "Tomorrow" or a short date, as said on site. */
export function dayLabel(iso: string, now = new Date()): string {
  const days = Math.round((startOfDay(new Date(iso)).getTime() - startOfDay(now).getTime()) / 86_400_000);
  if (days === 0) return 'Today';
  if (days === 1) return 'Tomorrow';
  if (days === -1) return 'Yesterday';
  return day.format(new Date(iso));
}

export function timeWindow(start?: string | null, end?: string | null): string {
  if (!start) return 'Time to be arranged';
  return end ? `${time.format(new Date(start))}–${time.format(new Date(end))}` : `from ${time.format(new Date(start))}`;
}

const dated = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** "2 Dec 2026, 14:11": for records that stand as signed, where "today" would go stale. */
export function whenSigned(iso: string): string {
  return dated.format(new Date(iso));
}

export function whenRecorded(iso?: string | null, now = new Date()): string {
  if (!iso) return '';
  return `${dayLabel(iso, now)}, ${time.format(new Date(iso))}`;
}

const VISIT_STATUS_WORDS: Record<string, string> = { planned: 'Planned', 'on-site': 'On site', finished: 'Finished', cancelled: 'Cancelled' };
export const visitStatusWords = (status?: string | null) => VISIT_STATUS_WORDS[status ?? 'planned'] ?? status ?? 'Planned';


/** Today and the next seven days, from midnight. */
export function upcomingRange(now = new Date(), days = 7): { from: Date; to: Date } {
  const from = startOfDay(now);
  return { from, to: new Date(from.getFullYear(), from.getMonth(), from.getDate() + days + 1) };
}
