import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { NOTIFICATION_STATES, type NotificationState } from '@wiretrail/core';
import { Transform } from 'class-transformer';
import { IsIn, IsOptional, IsString, Matches, MaxLength, MinLength } from 'class-validator';

const trimmed = ({ value }: { value: unknown }) => (typeof value === 'string' ? value.trim() : value);
const DAY = /^\d{4}-\d{2}-\d{2}$/;

export class UpdateNotificationDto {
  @ApiProperty({ enum: NOTIFICATION_STATES })
  @IsIn(NOTIFICATION_STATES, { message: `state must be one of ${NOTIFICATION_STATES.join(', ')}` })
  state: NotificationState;

  @ApiPropertyOptional({ description: 'the scheme’s reference for the notification', example: 'NT-884213' })
  @IsOptional()
  @Transform(trimmed)
  @IsString({ message: 'schemeRef must be text' })
  @MinLength(1, { message: 'schemeRef must not be empty' })
  @MaxLength(60, { message: 'schemeRef must be at most 60 characters' })
  schemeRef?: string;

  @ApiPropertyOptional({ description: 'the day it was notified', example: '2026-12-04' })
  @IsOptional()
  @Matches(DAY, { message: 'notifiedOn must be a date like 2026-12-04' })
  notifiedOn?: string;

  @ApiPropertyOptional({ description: 'the day the customer’s compliance certificate was received', example: '2026-12-18' })
  @IsOptional()
  @Matches(DAY, { message: 'certificateReceivedOn must be a date like 2026-12-18' })
  certificateReceivedOn?: string;
}
