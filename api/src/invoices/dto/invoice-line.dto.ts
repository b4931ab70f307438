import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsIn, IsInt, IsOptional, IsString, IsUUID, Matches, Max, MaxLength, Min, MinLength } from 'class-validator';
import { LINE_KINDS, type LineKind } from '@wiretrail/core';

const trim = Transform(({ value }) => (typeof value === 'string' ? value.trim() : value));

export class InvoiceLineDto {
  @ApiProperty({ enum: LINE_KINDS })
  @IsIn(LINE_KINDS, { message: `kind must be one of: ${LINE_KINDS.join(', ')}` })
  kind: LineKind;

  @ApiProperty({ example: 'Twin switched socket-outlet, white' })
  @trim
  @IsString({ message: 'description must be text' })
  @MinLength(1, { message: 'description must not be empty' })
  @MaxLength(300, { message: 'description must be at most 300 characters' })
  description: string;

  @ApiProperty({ example: '2.5', description: 'an exact decimal with up to three places; negative on a credit note' })
  @Transform(({ value }) => (typeof value === 'number' && Number.isFinite(value) ? String(value) : typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'quantity must be a number' })
  @Matches(/^-?\d{1,9}(\.\d{1,3})?$/, { message: 'quantity must be a number with at most three decimal places, like 2.5' })
  quantity: string;

  @ApiPropertyOptional({ example: 'each', nullable: true })
  @IsOptional()
  @trim
  @IsString({ message: 'unit must be text' })
  @MaxLength(20, { message: 'unit must be at most 20 characters' })
  unit?: string | null;

  @ApiProperty({ example: 650, description: 'pence for one unit, before VAT' })
  @IsInt({ message: 'unitPriceMinor must be a whole number of pence' })
  @Min(0, { message: 'unitPriceMinor must be at least 0' })
  @Max(100_000_000, { message: 'unitPriceMinor must be at most 100000000' })
  unitPriceMinor: number;

  @ApiProperty({ example: 'standard' })
  @trim
  @IsString({ message: 'vatRateCode must be text' })
  @MinLength(1, { message: 'vatRateCode must not be empty' })
  @MaxLength(20, { message: 'vatRateCode must be at most 20 characters' })
  vatRateCode: string;

  @ApiPropertyOptional({ format: 'uuid', nullable: true, description: 'the visit the labour or part came from' })
  @IsOptional()
  @IsUUID('all', { message: 'visitId must be the id of a visit' })
  visitId?: string | null;

  @ApiPropertyOptional({ format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID('all', { message: 'priceItemId must be the id of a price item' })
  priceItemId?: string | null;

  @ApiPropertyOptional({ format: 'uuid', nullable: true })
  @IsOptional()
  @IsUUID('all', { message: 'labourRateId must be the id of a labour rate' })
  labourRateId?: string | null;

  @ApiPropertyOptional({ type: [String], nullable: true, description: 'the part uses (parts list rows of visits) a part line adds up' })
  @IsOptional()
  @IsArray({ message: 'partUseIds must be a list of part use ids' })
  @ArrayMaxSize(500, { message: 'partUseIds must have at most 500 items' })
  @IsUUID('all', { each: true, message: 'partUseIds must hold ids of part uses' })
  partUseIds?: string[] | null;
}
