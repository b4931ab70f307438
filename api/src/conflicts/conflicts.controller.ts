import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { ConflictsService } from './conflicts.service.js';
import { ListConflictsQueryDto } from './dto/list-conflicts-query.dto.js';
import { ResolveConflictDto } from './dto/resolve-conflict.dto.js';

@ApiTags('conflicts')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('conflicts')
export class ConflictsController {
  constructor(private readonly conflicts: ConflictsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() q: ListConflictsQueryDto) {
    return this.conflicts.list(user, q);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.conflicts.findOne(user, id);
  }

  @Post(':id/resolve')
  @HttpCode(200)
  resolve(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: ResolveConflictDto) {
    return this.conflicts.resolve(user, id, dto);
  }
}
