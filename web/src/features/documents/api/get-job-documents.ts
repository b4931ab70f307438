import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

export type DocumentKind = 'minor-works' | 'cabling-report' | 'photo-record';
export type EmailState = 'queued' | 'sent' | 'failed';
export type DocumentCoverage = 'job' | 'site';

/** A document row as the API gives it. */
export interface JobDocument {
  id: string;
  jobId: string;
  kind: DocumentKind;
  number: string;
  title: string | null;
  signerName: string | null;
  pdfSha256: string;
  pdfBytes: number;
  issuedAt: string;
  issuedById: string | null;
  emailState: EmailState | null;
  emailedTo: string | null;
  emailedAt: string | null;
  emailError: string | null;
  /** A cabling report's cables: the job's, or the site's whole schedule. */
  coverage: DocumentCoverage | null;
  /** A revision names the document it supersedes and why; the superseded one names its revision. */
  supersedesId: string | null;
  revisionReason: string | null;
  supersededAt: string | null;
  supersededById: string | null;
}

/** An issue or a revision as the API answers it: the document, and what the office should know now (a cable that fails). */
export type IssuedDocument = JobDocument & { notices: string[] };

/** While an e-mail is on its way, the list asks again every few seconds so the state moves on by itself. */
const WHILE_SENDING_MS = 3000;

export const jobDocumentsQueryOptions = (jobId: string) =>
  queryOptions({
    queryKey: ['documents', { jobId }],
    queryFn: ({ signal }) => api.get<{ items: JobDocument[] }>(`/jobs/${encodeURIComponent(jobId)}/documents`, signal),
    refetchInterval: (query) => (query.state.data?.items.some((d) => d.emailState === 'queued') ? WHILE_SENDING_MS : false),
  });

export function useJobDocuments(jobId: string) {
  return useQuery(jobDocumentsQueryOptions(jobId));
}
