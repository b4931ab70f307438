import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform, Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsInt, IsOptional, IsString, Max, MaxLength, Min, ValidateIf, ValidateNested } from 'class-validator';
import { MAX_LINES } from '../invoice-lines.js';
import { InvoiceLineDto } from './invoice-line.dto.js';

/** A draft's changes; lines, when sent, replace all of its lines in the order given. */
export class UpdateInvoiceDto {
  @ApiPropertyOptional({ type: [InvoiceLineDto] })
  @IsOptional()
  @IsArray({ message: 'lines must be a list of lines' })
  @ArrayMaxSize(MAX_LINES, { message: `lines must hold at most ${MAX_LINES} lines` })
  @ValidateNested({ each: true })
  @Type(() => InvoiceLineDto)
  lines?: InvoiceLineDto[];

  @ApiPropertyOptional({ nullable: true, description: 'printed on the document above its terms' })
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() || null : value))
  @ValidateIf((_, v) => v !== null && v !== undefined)
  @IsString({ message: 'notes must be text' })
  @MaxLength(2000, { message: 'notes must be at most 2000 characters' })
  notes?: string | null;

  @ApiPropertyOptional({ example: 30, description: 'days to pay an invoice, or days a quote stands' })
  @IsOptional()
  @IsInt({ message: 'termDays must be a whole number of days' })
  @Min(0, { message: 'termDays must be at least 0' })
  @Max(365, { message: 'termDays must be at most 365' })
  termDays?: number;
}
