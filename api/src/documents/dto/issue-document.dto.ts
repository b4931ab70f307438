import { DOCUMENT_COVERAGES, DOCUMENT_KINDS, type DocumentCoverage, type DocumentKind } from '@wiretrail/core';
import { ChoiceField } from '../../records/record-fields.js';

export type { DocumentCoverage, DocumentKind };

export class IssueDocumentDto {
  @ChoiceField(DOCUMENT_KINDS, { required: true, description: 'which document to issue for the job' })
  kind: DocumentKind;

  @ChoiceField(DOCUMENT_COVERAGES, { description: 'for a cabling report: the cables of this job’s visits (job, the default) or the site’s whole schedule (site)' })
  coverage?: DocumentCoverage;
}
