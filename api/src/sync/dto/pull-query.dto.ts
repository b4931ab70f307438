import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { MAX_PULL_LIMIT } from '@wiretrail/core';
import { Type } from 'class-transformer';
import { IsInt, IsOptional, IsString, Matches, Max, Min } from 'class-validator';
import { DEVICE_ID } from './push.dto.js';

export class PullQueryDto {
  @ApiProperty({ description: 'The checkpoint of the last pull; 0 for everything' })
  @Type(() => Number) @IsInt({ message: 'checkpoint must be a whole number' }) @Min(0)
  checkpoint = 0;

  @ApiPropertyOptional({ default: 500, maximum: MAX_PULL_LIMIT })
  @IsOptional() @Type(() => Number) @IsInt({ message: 'limit must be a whole number' }) @Min(1) @Max(MAX_PULL_LIMIT)
  limit = 500;

  @ApiProperty()
  @IsString() @Matches(DEVICE_ID, { message: 'deviceId must be 4 to 64 letters, digits, _ or -' })
  deviceId: string;
}
