import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateAreaDto } from './dto/create-area.dto.js';
import { ListAreasQueryDto } from './dto/list-areas-query.dto.js';
import { UpdateAreaDto } from './dto/update-area.dto.js';
import { AreasService } from './areas.service.js';

/** The office's direct reads and writes; technicians get areas through sync. */
@ApiTags('areas')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('areas')
export class AreasController {
  constructor(private readonly areas: AreasService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListAreasQueryDto) {
    return this.areas.list(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.areas.findOne(user, id);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateAreaDto) {
    return this.areas.create(user, dto);
  }

  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateAreaDto) {
    return this.areas.update(user, id, dto);
  }
}
