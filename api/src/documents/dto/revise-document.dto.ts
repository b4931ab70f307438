import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsObject, IsOptional } from 'class-validator';
import { IdListField, TextField } from '../../records/record-fields.js';

export class ReviseDocumentDto {
  @TextField(1000, { required: true, example: 'Circuit 2’s breaker was recorded as 32 A; it is a 20 A type B.', description: 'why the document is revised, printed on the revision' })
  reason: string;

  @IdListField('conflict', { description: 'changes kept back by the document’s lock to make before the revision is issued' })
  take?: string[];

  @ApiPropertyOptional({ type: 'object', additionalProperties: true, description: 'for an installation certificate: particulars given again (else those of the document revised)' })
  @IsOptional()
  @IsObject({ message: 'particulars must be an object' })
  particulars?: Record<string, unknown>;
}
