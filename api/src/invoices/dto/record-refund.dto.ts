import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { REFUND_METHODS, type RefundMethod } from '@wiretrail/core';
import { IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min } from 'class-validator';

const trim = Transform(({ value }) => (typeof value === 'string' ? value.trim() || undefined : value));

/** Money given back to the customer: by hand, or to one of the invoice's card payments. */
export class RecordRefundDto {
  @ApiProperty({ example: 5000, description: 'pence given back, no more than the customer is owed on the invoice' })
  @IsInt({ message: 'amountMinor must be a whole number of pence' })
  @Min(1, { message: 'amountMinor must be at least 1 (a penny)' })
  @Max(100_000_000_00, { message: 'amountMinor must be at most 10000000000' })
  amountMinor: number;

  @ApiProperty({ enum: REFUND_METHODS })
  @IsIn(REFUND_METHODS, { message: `method must be one of: ${REFUND_METHODS.join(', ')}` })
  method: RefundMethod;

  @ApiPropertyOptional({ description: 'with method card: the card payment to give the money back to' })
  @IsOptional()
  @IsUUID('all', { message: 'paymentId must be the id of one of the invoice’s card payments' })
  paymentId?: string;

  @ApiPropertyOptional({ example: '2026-03-14', description: 'the day the money went back, not later than today; today when left out (always today for a card)' })
  @IsOptional()
  @IsString({ message: 'refundedOn must be a date written YYYY-MM-DD' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'refundedOn must be a date written YYYY-MM-DD' })
  refundedOn?: string;

  @ApiPropertyOptional({ example: 'Transfer 2291', description: 'the transfer’s reference or the cheque number' })
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

  @ApiPropertyOptional({ description: 'one per refund the office means: sent again (a double click, a retry), it records and refunds once' })
  @IsOptional()
  @IsUUID('all', { message: 'requestId must be a UUID' })
  requestId?: string;
}
