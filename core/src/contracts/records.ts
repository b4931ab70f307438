import type { DOCUMENT_COVERAGES, DOCUMENT_EMAIL_STATES, DOCUMENT_KINDS, RowOf, SyncEntityName } from '../sync/entities.js';

/** A synced record as the office reads it over REST: the registry's fields with the row's version. */
export type RecordReply<E extends SyncEntityName> = RowOf<E> & {
  version: number;
  fieldVersions?: Record<string, number>;
  createdAt?: string;
  updatedAt?: string;
  createdById?: string | null;
  updatedById?: string | null;
};

/** One page of a list of records. */
export interface RecordPage<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** A visit as a job's page lists it (`GET /api/visits?jobId=`). */
export type JobVisit = RecordReply<'visit'>;

export type DocumentKind = (typeof DOCUMENT_KINDS)[number];
export type DocumentEmailState = (typeof DOCUMENT_EMAIL_STATES)[number];
export type DocumentCoverage = (typeof DOCUMENT_COVERAGES)[number];

/**
 * An issued document as a job's documents list it (`GET /api/jobs/:id/documents`): issued documents carry all of these.
 * A revision names the document it supersedes and why; the superseded one names its revision.
 */
export type JobDocument = Pick<
  RowOf<'document'>,
  | 'id' | 'jobId' | 'kind' | 'title' | 'signerName' | 'issuedById' | 'emailState' | 'emailedTo' | 'emailedAt' | 'emailError'
  | 'coverage' | 'supersedesId' | 'revisionReason' | 'supersededAt' | 'supersededById'
> & {
  number: string;
  pdfSha256: string;
  pdfBytes: number;
  issuedAt: string;
};

/** A document just issued or revised (`POST /api/jobs/:id/documents`, `POST /api/documents/:id/revisions`), with what the office should know now: each cable that fails. */
export type IssuedDocument = JobDocument & { notices: string[] };

/** A change an issued document keeps back, beside the value the document printed (`GET /api/jobs/:id/held-changes`). */
export interface HeldChange {
  conflictId: string;
  documentId: string;
  number: string;
  entity: SyncEntityName;
  rowId: string;
  /** The record in the office's words: "Circuit 2 (Sockets, first floor)", "Cable OR-01", "The site". */
  record: string;
  /** The field changed, or `*` for a deletion. */
  field: string;
  issuedValue: unknown;
  pendingValue: unknown;
  changedById: string | null;
  changedHlc: string | null;
}
