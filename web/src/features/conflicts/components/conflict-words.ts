import { parseHlc, SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';

const ENTITY_NAMES: Record<string, string> = {
  customer: 'Customer', site: 'Site', area: 'Area', board: 'Board', circuit: 'Circuit', job: 'Job', visit: 'Visit',
  photo: 'Photo', note: 'Note', cableRun: 'Cable run', pointChange: 'Point change', testResult: 'Test result', document: 'Document',
  priceItem: 'Price list item', materialLine: 'Part used', linkTest: 'Performance results', photoMarkup: 'Routes on a photo',
};

export function entityName(entity: string): string {
  return ENTITY_NAMES[entity] ?? entity;
}

/** `deviceRatingA` → "Device rating A"; `*` is the whole record (a deletion). */
export function fieldName(field: string): string {
  if (field === '*') return 'Whole record';
  const words = field.replace(/([a-z])([A-Z0-9])/g, '$1 $2').replace(/Csa Mm2/, 'size (mm²)').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

export const REASONS: Record<string, string> = {
  'later-edit-wins': 'Changed on two devices before either had synced. The later change was kept.',
  'office-owned': 'An office detail changed twice at once. The change by the more senior role (or, between equals, the later one) was kept.',
  'edit-beats-delete': 'Deleted on one device while edited on another. The record was kept.',
  'locked-by-document': 'Changed after a certificate or report was issued for this work. The issued record stays as it was.',
  'locked-by-sign-off': 'Changed on a phone after the visit was finished and signed. The signed record stays as it was until you keep the change.',
};

export function showValue(value: unknown): string {
  if (value === null || value === undefined || value === '') return '(empty)';
  if (value === 'deleted') return 'Delete the record';
  if (value === 'kept') return 'Keep the record';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

export function whenFromClock(hlc: string | null): string | null {
  const parsed = hlc ? parseHlc(hlc) : null;
  return parsed ? new Date(parsed.ms).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' }) : null;
}

/** Turns what the office typed into the field's own type, or says why it cannot. */
export function parseTyped(entity: string, field: string, text: string): { value: unknown } | { error: string } {
  const spec = (SYNC_ENTITIES as Record<string, (typeof SYNC_ENTITIES)[SyncEntityName] | undefined>)[entity]?.fields[field];
  if (!spec) return { value: text };
  const trimmed = text.trim();
  if (trimmed === '') return spec.required ? { error: `${fieldName(field)} must not be empty.` } : { value: null };
  switch (spec.type.kind) {
    case 'number':
    case 'integer': {
      const n = Number(trimmed);
      return Number.isFinite(n) ? { value: n } : { error: `${fieldName(field)} must be a number.` };
    }
    case 'boolean':
      return /^(yes|true)$/i.test(trimmed) ? { value: true } : /^(no|false)$/i.test(trimmed) ? { value: false } : { error: 'Type yes or no.' };
    case 'enum':
      return spec.type.values.includes(trimmed) ? { value: trimmed } : { error: `Choose one of: ${spec.type.values.join(', ')}.` };
    case 'json':
    case 'refs':
      try {
        return { value: JSON.parse(trimmed) };
      } catch {
        return { error: 'That is not valid for this field.' };
      }
    default:
      return { value: trimmed };
  }
}

/** A server's refusal as words beside the field: "circuit.description: at most 500 characters" → "At most 500 characters". */
export function fieldMessage(message: string): string {
  const bare = message.replace(/^[\w.]+:\s*/, '');
  return bare.charAt(0).toUpperCase() + bare.slice(1);
}
