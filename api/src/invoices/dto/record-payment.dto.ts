import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { OFFICE_PAYMENT_METHODS, type OfficePaymentMethod } from '@wiretrail/core';
import { IsIn, IsInt, IsOptional, IsString, Matches, Max, MaxLength, Min } from 'class-validator';

const trim = Transform(({ value }) => (typeof value === 'string' ? value.trim() || undefined : value));

/** Card payments come from the provider; the office records money taken any other way. */
export class RecordPaymentDto {
  @ApiProperty({ example: 15000, description: 'pence received' })
  @IsInt({ message: 'amountMinor must be a whole number of pence' })
  @Min(1, { message: 'amountMinor must be at least 1 (a penny)' })
  @Max(100_000_000_00, { message: 'amountMinor must be at most 10000000000' })
  amountMinor: number;

  @ApiProperty({ enum: OFFICE_PAYMENT_METHODS })
  @IsIn(OFFICE_PAYMENT_METHODS, { message: `method must be one of: ${OFFICE_PAYMENT_METHODS.join(', ')}` })
  method: OfficePaymentMethod;

  @ApiProperty({ example: '2026-03-14', description: 'the day the money came in, not later than today' })
  @IsString({ message: 'receivedOn must be a date written YYYY-MM-DD' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'receivedOn must be a date written YYYY-MM-DD' })
  receivedOn: string;

  @ApiPropertyOptional({ example: 'Cheque 100482', description: 'the cheque number or the transfer’s reference' })
  @IsOptional()
  @trim
  @IsString({ message: 'reference must be text' })
  @MaxLength(100, { message: 'reference must be at most 100 characters' })
  reference?: string;

  @ApiPropertyOptional()
  @IsOptional()
  @trim
  @IsString({ message: 'note must be text' })
  @MaxLength(500, { message: 'note must be at most 500 characters' })
  note?: string;
}
