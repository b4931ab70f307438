import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateCircuitDto } from './dto/create-circuit.dto.js';
import { ListCircuitsQueryDto } from './dto/list-circuits-query.dto.js';
import { UpdateCircuitDto } from './dto/update-circuit.dto.js';
import { CircuitsService } from './circuits.service.js';

/** The office's direct reads and writes; technicians get circuits through sync. */
@ApiTags('circuits')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('circuits')
export class CircuitsController {
  constructor(private readonly circuits: CircuitsService) {}

  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListCircuitsQueryDto) {
    return this.circuits.list(user, query);
  }

  @Get(':id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.circuits.findOne(user, id);
  }

  @Post()
  create(@CurrentUser() user: AuthUser, @Body() dto: CreateCircuitDto) {
    return this.circuits.create(user, dto);
  }

  @Patch(':id')
  update(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateCircuitDto) {
    return this.circuits.update(user, id, dto);
  }
}
