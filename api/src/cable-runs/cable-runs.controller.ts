import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CableRunsService } from './cable-runs.service.js';
import { ListCableRunsQueryDto } from './dto/list-cable-runs-query.dto.js';
import { UpdateCableRunDto } from './dto/update-cable-run.dto.js';

/** The office's cable schedule; technicians record cable runs on site and send them through sync. */
@ApiTags('cable-runs')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('cable-runs')
export class CableRunsController {
  constructor(private readonly cableRuns: CableRunsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListCableRunsQueryDto) {
    return this.cableRuns.list(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.cableRuns.findOne(user, id);
  }

  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateCableRunDto) {
    return this.cableRuns.update(user, id, dto);
  }
}
