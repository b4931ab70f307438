import { Body, Controller, Get, Param, ParseUUIDPipe, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnyRole, Roles } from '../common/decorators/roles.decorator.js';
import { UpdateOrganisationDto } from './dto/update-organisation.dto.js';
import { OrganisationsService } from './organisations.service.js';

@ApiTags('organisations')
@ApiBearerAuth()
@Controller('organisations')
export class OrganisationsController {
  constructor(private readonly organisations: OrganisationsService) {}

  @AnyRole()
  @Get('current')
  current(@CurrentUser() caller: AuthUser) {
    return this.organisations.findOwn(caller.organisationId, caller.organisationId);
  }

  @AnyRole()
  @Get(':id')
  findOne(@CurrentUser() caller: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.organisations.findOwn(caller.organisationId, id);
  }

  @Roles('admin')
  @Patch(':id')
  update(@CurrentUser() caller: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateOrganisationDto) {
    return this.organisations.update(caller.organisationId, id, dto);
  }
}
