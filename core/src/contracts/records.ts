import type { DOCUMENT_EMAIL_STATES, DOCUMENT_KINDS, RowOf, SyncEntityName } from '../sync/entities.js';

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

/** An issued document as a job's documents list it (`GET /api/jobs/:id/documents`): issued documents carry all of these. */
export type JobDocument = Pick<
  RowOf<'document'>,
  'id' | 'jobId' | 'kind' | 'title' | 'signerName' | 'issuedById' | 'emailState' | 'emailedTo' | 'emailedAt' | 'emailError'
> & {
  number: string;
  pdfSha256: string;
  pdfBytes: number;
  issuedAt: string;
};
