import { DOCUMENT_COVERAGES, DOCUMENT_KINDS, type DocumentCoverage, type DocumentKind } from '@wiretrail/core';
import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsObject, IsOptional } from 'class-validator';
import { ChoiceField } from '../../records/record-fields.js';

export type { DocumentCoverage, DocumentKind };

export class IssueDocumentDto {
  @ChoiceField(DOCUMENT_KINDS, { required: true, description: 'which document to issue for the job' })
  kind: DocumentKind;

  @ChoiceField(DOCUMENT_COVERAGES, { description: 'for a cabling report: the cables of this job’s visits (job, the default) or the site’s whole schedule (site)' })
  coverage?: DocumentCoverage;

  // Checked field by field by core's readParticulars in the service, so the office's form and the server agree.
  @ApiPropertyOptional({ type: 'object', additionalProperties: true, description: 'for an installation certificate: the supply, the origin and who answers for the work (core’s InstallationParticulars)' })
  @IsOptional()
  @IsObject({ message: 'particulars must be an object' })
  particulars?: Record<string, unknown>;
}
