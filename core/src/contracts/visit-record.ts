import type { RecordReply } from './records.js';

/** A record as the office reads it on a visit's page, with the name of whoever made it where the server knows it. */
export type ByPerson<T> = T & { createdByName: string | null };

/**
 * Everything recorded on one visit, for the office's page of that visit (`GET /api/visits/:id/record`): the visit
 * with its times, sign-off and signature, and the notes, parts, cables, point changes and readings made on it.
 * Photos come page by page from `GET /api/photos?visitId=`.
 */
export interface VisitRecord {
  visit: RecordReply<'visit'>;
  job: { id: string; reference: string | null; title: string; status: string | null };
  site: { id: string; name: string | null; address: string | null; postcode: string | null };
  technicians: Array<{ id: string; name: string }>;
  notes: Array<ByPerson<RecordReply<'note'>>>;
  parts: Array<ByPerson<RecordReply<'materialLine'>>>;
  /** Cables whose last record was made on this visit. */
  cables: Array<ByPerson<RecordReply<'cableRun'>>>;
  pointChanges: Array<ByPerson<RecordReply<'pointChange'>> & { circuitLabel: string | null }>;
  testResults: Array<ByPerson<RecordReply<'testResult'>> & { circuitLabel: string | null }>;
}
