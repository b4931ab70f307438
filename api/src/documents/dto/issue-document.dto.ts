import { DOCUMENT_KINDS, type DocumentKind } from '@wiretrail/core';
import { ChoiceField } from '../../records/record-fields.js';

export type { DocumentKind };

export class IssueDocumentDto {
  @ChoiceField(DOCUMENT_KINDS, { required: true, description: 'which document to issue for the job' })
  kind: DocumentKind;
}
