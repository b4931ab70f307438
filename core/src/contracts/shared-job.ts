/** What a customer sees through a share link (`GET /api/shared/:token`): the job, its photo trail and its documents, and nothing else. */
export interface SharedJob {
  expiresAt: string;
  contractor: { name: string; phone: string | null; email: string | null };
  job: { reference: string | null; title: string; status: string | null; customerName: string | null; siteAddress: string };
  photos: Array<{ id: string; caption: string | null; area: string | null; takenAt: string | null; thumbUrl: string; displayUrl: string }>;
  documents: Array<{ id: string; number: string; kind: string; title: string | null; issuedAt: string; pdfUrl: string }>;
}

export type ShareLinkState = 'active' | 'expired' | 'revoked';

/** A share link as the office lists it (`GET /api/jobs/:id/share-links`). */
export interface ShareLinkView {
  id: string;
  jobId: string;
  label: string | null;
  createdAt: string;
  createdById: string;
  expiresAt: string;
  revokedAt: string | null;
  lastOpenedAt: string | null;
  openCount: number;
  state: ShareLinkState;
}

/** A link just made: the only time its address is known, since only the token's hash is kept. */
export interface NewShareLink extends ShareLinkView {
  url: string;
}
