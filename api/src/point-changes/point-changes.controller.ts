import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ListPointChangesQueryDto } from './dto/list-point-changes-query.dto.js';
import { PointChangesService } from './point-changes.service.js';

/** What the office reads of points added, moved, removed or replaced; technicians record them through sync. */
@ApiTags('point-changes')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('point-changes')
export class PointChangesController {
  constructor(private readonly pointChanges: PointChangesService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListPointChangesQueryDto) {
    return this.pointChanges.list(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.pointChanges.findOne(user, id);
  }
}
