import type { JobFile } from '../job-file.js';
import { DocumentLayout, INK } from './document-layout.js';
import { dateWords, joined } from './document-words.js';

/** What every document is about: who did the work and for whom, where. */
export function jobHeading(layout: DocumentLayout, file: JobFile, contractor: Array<[string, string]> = [['Registration number', file.organisation.registrationNumber ?? 'Not recorded']]): void {
  const { organisation: org, job, site, customer } = file;
  layout.sideBySide([
    {
      title: 'Contractor',
      pairs: [
        ['Name', org.name],
        ['Address', org.address ?? ''],
        ['Telephone and e-mail', joined([org.phone, org.email], ' · ')],
        ...contractor,
      ],
    },
    {
      title: 'Customer and site',
      pairs: [
        ['Customer', joined([customer?.name])],
        ['Site', joined([site.name, site.address, site.postcode])],
        ['Job', joined([job.reference, job.title], ' · ')],
        ['Customer’s address', joined([customer?.address])],
      ],
    },
  ]);
}

export interface Issue {
  number: string;
  issuedAt: Date;
  issuedBy: string;
  /** A revision: the document this one supersedes, and why. */
  supersedes?: { number: string; reason: string };
}

/** A new document for the job: its band (kind, number, date issued), then who did the work and for whom. */
export async function startJobDocument(o: {
  title: string;
  subtitle: string;
  issue: Issue;
  file: JobFile;
  landscape?: boolean;
  /** The contractor's particulars this document needs after name, address and contact: by default the registration number. */
  contractor?: Array<[string, string]>;
}): Promise<DocumentLayout> {
  const { issue, file } = o;
  const layout = await DocumentLayout.start({
    title: o.title,
    subtitle: o.subtitle,
    number: issue.number,
    issued: `Issued ${dateWords(issue.issuedAt, file.organisation.timeZone)}`,
    contractor: file.organisation.name,
    subject: `${file.job.reference ?? ''} ${file.job.title}`.trim(),
    landscape: o.landscape,
  });
  jobHeading(layout, file, o.contractor);
  if (issue.supersedes) {
    layout.notice(
      `Revision of ${issue.supersedes.number}`,
      `This document supersedes ${issue.supersedes.number}, which stays on record marked superseded. Why it was revised: ${issue.supersedes.reason}`,
    );
  }
  return layout;
}

/** The closing line: who issued it and when, for the contractor. */
export function issuedBy(layout: DocumentLayout, issue: Issue, file: JobFile): void {
  layout.paragraph(
    `Issued by ${issue.issuedBy} for ${file.organisation.name} on ${dateWords(issue.issuedAt, file.organisation.timeZone)}. ` +
      `The PDF's SHA-256 fingerprint is kept with the job, so any copy can be checked against the one issued.`,
    'regular',
    INK.muted,
    8,
  );
}
