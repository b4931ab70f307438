import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional } from 'class-validator';
import { PageQueryDto } from '../../records/page-query.dto.js';
import { INVOICE_KINDS, type InvoiceKind } from '@wiretrail/core';

export const INVOICE_FILTERS = ['draft', 'unpaid', 'overdue', 'paid'] as const;
export type InvoiceFilter = (typeof INVOICE_FILTERS)[number];

/** search matches the number, the job's reference or title, or the customer's name. */
export class ListInvoicesQueryDto extends PageQueryDto {
  @ApiPropertyOptional({ enum: INVOICE_KINDS })
  @IsOptional()
  @IsIn(INVOICE_KINDS, { message: `kind must be one of: ${INVOICE_KINDS.join(', ')}` })
  kind?: InvoiceKind;

  @ApiPropertyOptional({ enum: INVOICE_FILTERS, description: 'unpaid: issued invoices with something still owed' })
  @IsOptional()
  @IsIn(INVOICE_FILTERS, { message: `state must be one of: ${INVOICE_FILTERS.join(', ')}` })
  state?: InvoiceFilter;
}
