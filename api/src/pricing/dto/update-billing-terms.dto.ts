import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min, ValidateIf } from 'class-validator';

/** Empty text clears a value: an organisation with no VAT number charges no VAT. */
const trimToNull = Transform(({ value }) => (typeof value === 'string' ? value.trim() || null : value));

export class UpdateBillingTermsDto {
  @ApiPropertyOptional({ example: 'GB 999 0417 21', nullable: true, description: 'the VAT registration number printed on invoices; null if not registered' })
  @trimToNull
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsString({ message: 'vatNumber must be text' })
  @Matches(/^[A-Z]{0,2} ?[0-9][0-9 ]{4,16}$/i, { message: 'vatNumber must be a VAT registration number such as GB 123 4567 89' })
  vatNumber?: string | null;

  @ApiPropertyOptional({ example: 30, description: 'days a customer has to pay an invoice' })
  @IsOptional()
  @IsInt({ message: 'paymentTermsDays must be a whole number of days' })
  @Min(0, { message: 'paymentTermsDays must be at least 0 (due on receipt)' })
  @Max(365, { message: 'paymentTermsDays must be at most 365' })
  paymentTermsDays?: number;

  @ApiPropertyOptional({ example: 30, description: 'days a quote stands for' })
  @IsOptional()
  @IsInt({ message: 'quoteValidDays must be a whole number of days' })
  @Min(1, { message: 'quoteValidDays must be at least 1' })
  @Max(365, { message: 'quoteValidDays must be at most 365' })
  quoteValidDays?: number;

  @ApiPropertyOptional({ nullable: true, description: 'the terms printed under every invoice and quote' })
  @trimToNull
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsString({ message: 'paymentTerms must be text' })
  @MaxLength(1000, { message: 'paymentTerms must be at most 1000 characters' })
  paymentTerms?: string | null;

  @ApiPropertyOptional({ nullable: true, description: 'how to pay other than by card: bank account, cheques payable to' })
  @trimToNull
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsString({ message: 'paymentInstructions must be text' })
  @MaxLength(1000, { message: 'paymentInstructions must be at most 1000 characters' })
  paymentInstructions?: string | null;
}
