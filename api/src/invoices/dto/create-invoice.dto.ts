import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsUUID, ValidateIf } from 'class-validator';

export const DRAFT_KINDS = ['quote', 'invoice'] as const;
export const DRAFT_SOURCES = ['job', 'quote', 'blank'] as const;

export class CreateInvoiceDto {
  @ApiProperty({ enum: DRAFT_KINDS, description: 'a quote or an invoice; credit notes are raised from their invoice' })
  @IsIn(DRAFT_KINDS, { message: `kind must be one of: ${DRAFT_KINDS.join(', ')}` })
  kind: (typeof DRAFT_KINDS)[number];

  @ApiPropertyOptional({
    enum: DRAFT_SOURCES,
    default: 'job',
    description: 'job: labour from the visits’ times on site and the parts they used; quote: the lines of an issued quote; blank: no lines',
  })
  @IsOptional()
  @IsIn(DRAFT_SOURCES, { message: `from must be one of: ${DRAFT_SOURCES.join(', ')}` })
  from?: (typeof DRAFT_SOURCES)[number];

  @ApiPropertyOptional({ format: 'uuid', description: 'the issued quote to copy, with from: quote' })
  @ValidateIf((dto: CreateInvoiceDto) => dto.from === 'quote' || dto.quoteId !== undefined)
  @IsUUID('all', { message: 'quoteId must be the id of an issued quote of this job' })
  quoteId?: string;
}
