import { ApiPropertyOptional } from '@nestjs/swagger';
import { NOTIFICATION_STATES } from '@wiretrail/core';
import { IsIn, IsOptional } from 'class-validator';

export const NOTIFIABLE_WORK_FILTERS = [...NOTIFICATION_STATES, 'overdue'] as const;

export class ListNotifiableWorkQueryDto {
  @ApiPropertyOptional({ enum: NOTIFIABLE_WORK_FILTERS, description: 'only jobs in this state; overdue is still to notify after the last day' })
  @IsOptional()
  @IsIn(NOTIFIABLE_WORK_FILTERS, { message: `state must be one of ${NOTIFIABLE_WORK_FILTERS.join(', ')}` })
  state?: (typeof NOTIFIABLE_WORK_FILTERS)[number];
}
