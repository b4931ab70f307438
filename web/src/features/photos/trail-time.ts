const time = new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit' });
const dayAndTimeFormat = new Intl.DateTimeFormat('en-GB', { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

const sameDay = (a: Date, b: Date) => a.getFullYear() === b.getFullYear() && a.getMonth() === b.getMonth() && a.getDate() === b.getDate();

/** "Tue 3 Mar, 09:12", whatever the day. */
export function dayAndTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '' : dayAndTimeFormat.format(d);
}

/** "09:12" today, "Tue 3 Mar, 09:12" on other days. */
export function trailTime(iso: string | null | undefined, now = new Date()): string {
  if (!iso) return '';
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '';
  return sameDay(d, now) ? time.format(d) : dayAndTimeFormat.format(d);
}

/** A photo's tags as stored (a JSON list, or the list itself). */
export function tagList(tags: unknown): string[] {
  if (Array.isArray(tags)) return tags.filter((t): t is string => typeof t === 'string');
  if (typeof tags === 'string') {
    try {
      return tagList(JSON.parse(tags));
    } catch {
      return [];
    }
  }
  return [];
}
