import { isVoided, readingWords, voidWords } from '@wiretrail/core';
import type { ReactNode } from 'react';
import type { VisitRecord } from '../api/get-visit-record';

/** One line of a visit's record at the desk, in time order; `media` is a photo's thumbnail, given by the page. */
export interface TimelineEntry {
  id: string;
  at: string;
  title: string;
  detail?: string | null;
  by?: string | null;
  media?: ReactNode;
  /** "Void: typed the wrong label" for a record voided on site: shown struck through, kept for the office. */
  voided?: string | null;
}

/** The void words of a record voided on site, or null for one that counts. */
export const voidedOf = (row: { readonly voidedAt?: unknown; readonly voidReason?: unknown }): string | null => (isVoided(row) ? voidWords(row) : null);

const reading = (v: number | null | undefined, unit: string, label: string) => (v == null ? null : `${label} ${v} ${unit}`);

/** The figures of one circuit's readings, as a line: what was measured, not the verdict (the job's circuits judge). */
export function readingsLine(r: VisitRecord['testResults'][number]): string {
  return (
    [
      reading(r.r1r2Ohm, 'Ω', 'R1+R2'),
      reading(r.r2LeadOhm, 'Ω', 'R2'),
      r.irLiveEarthMOhm == null ? null : `IR L–E ${readingWords(r, 'irLiveEarthMOhm')}`,
      r.polarity ? `polarity ${r.polarity}` : null,
      reading(r.zsOhm, 'Ω', 'Zs'),
      reading(r.rcdTripMs, 'ms', 'RCD'),
    ]
      .filter(Boolean)
      .join(' · ') || 'No figures yet'
  );
}

/**
 * The visit's own moments (arrival, cautions read, departure, sign-off) and what the visit feature knows how to say
 * (notes, parts, readings), merged with the page's own entries, oldest first as a day is told.
 */
export function visitTimeline(record: VisitRecord, more: TimelineEntry[] = []): TimelineEntry[] {
  const { visit } = record;
  const moments: TimelineEntry[] = [
    visit.actualStart ? { id: 'arrived', at: visit.actualStart, title: 'Arrived on site' } : null,
    visit.cautionsReadAt ? { id: 'cautions', at: visit.cautionsReadAt, title: 'Safety cautions read before work on a circuit' } : null,
    visit.actualEnd ? { id: 'left', at: visit.actualEnd, title: 'Left site' } : null,
    visit.signedAt ? { id: 'signed', at: visit.signedAt, title: 'Signed off', by: visit.signedByName } : null,
  ].filter((e): e is TimelineEntry => e !== null);
  const entries: TimelineEntry[] = [
    ...moments,
    // When each was made on the phone, not when it reached the server.
    ...record.notes.map((n) => ({ id: n.id, at: n.recordedAt ?? n.createdAt ?? '', title: 'Note', detail: n.text, by: n.createdByName, voided: voidedOf(n) })),
    ...record.testResults.map((r) => ({ id: r.id, at: r.testedAt ?? r.recordedAt ?? r.createdAt ?? '', title: `Readings: circuit ${r.circuitLabel ?? 'not named'}`, detail: readingsLine(r), by: r.createdByName, voided: voidedOf(r) })),
    ...more,
  ];
  return entries.sort((a, b) => a.at.localeCompare(b.at) || a.id.localeCompare(b.id));
}
