import { ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsInt, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';

export const SHARE_LINK_DAYS = { min: 1, max: 90, default: 30 } as const;

export class CreateShareLinkDto {
  @ApiPropertyOptional({ minimum: SHARE_LINK_DAYS.min, maximum: SHARE_LINK_DAYS.max, default: SHARE_LINK_DAYS.default, description: 'how many days the link works for' })
  @IsOptional()
  @IsInt({ message: 'days must be a whole number of days' })
  @Min(SHARE_LINK_DAYS.min, { message: `days must be at least ${SHARE_LINK_DAYS.min}` })
  @Max(SHARE_LINK_DAYS.max, { message: `days must be at most ${SHARE_LINK_DAYS.max}` })
  days?: number;

  @ApiPropertyOptional({ example: 'For Hannah Greaves', description: 'who the link is for, for the office’s list' })
  @IsOptional()
  @Transform(({ value }) => (typeof value === 'string' ? value.trim() : value))
  @IsString({ message: 'label must be text' })
  @MaxLength(200, { message: 'label must be at most 200 characters' })
  label?: string;
}
