import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsOptional, IsString, Matches } from 'class-validator';

export class AgedDebtQueryDto {
  @ApiPropertyOptional({ example: '2026-03-31', description: 'the day to age debts on; today where the organisation is, if not given' })
  @IsOptional()
  @IsString({ message: 'asOf must be a date written YYYY-MM-DD' })
  @Matches(/^\d{4}-\d{2}-\d{2}$/, { message: 'asOf must be a date written YYYY-MM-DD' })
  asOf?: string;
}
