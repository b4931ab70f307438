/** A visit's time (planned, or when it was signed) as the office reads it: "Thu 3 Dec, 09:00". */
export function visitWhen(iso: string | null | undefined): string {
  if (!iso) return '—';
  return new Date(iso).toLocaleString('en-GB', { weekday: 'short', day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
}
