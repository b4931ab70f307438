import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsBoolean, IsOptional } from 'class-validator';
import { CreateLabourRateDto } from './create-labour-rate.dto.js';

export class UpdateLabourRateDto extends PartialType(CreateLabourRateDto) {
  @ApiPropertyOptional({ description: 'offered for new lines' })
  @IsOptional()
  @IsBoolean({ message: 'active must be true or false' })
  active?: boolean;
}
