import { ApiPropertyOptional, OmitType, PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateVatRateDto } from './create-vat-rate.dto.js';

/** A new rate from a date is a change of basisPoints; lines already issued keep the rate they were issued at. */
export class UpdateVatRateDto extends PartialType(OmitType(CreateVatRateDto, ['code'] as const)) {
  @ApiPropertyOptional({ description: 'offered for new lines' })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}
