import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ListNotifiableWorkQueryDto } from './dto/list-notifiable-work-query.dto.js';
import { UpdateNotificationDto } from './dto/update-notification.dto.js';
import { NotifiableWorkService } from './notifiable-work.service.js';

@ApiTags('notifiable-work')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('notifiable-work')
export class NotifiableWorkController {
  constructor(private readonly work: NotifiableWorkService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() q: ListNotifiableWorkQueryDto) {
    return this.work.list(user, q);
  }

  @Patch(':jobId')
  update(@CurrentUser() user: AuthUser, @Param('jobId', new ParseUUIDPipe()) jobId: string, @Body() dto: UpdateNotificationDto) {
    return this.work.update(user, jobId, dto);
  }
}
