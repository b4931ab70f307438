import { Controller, Get, Param, ParseUUIDPipe } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { HiddenRoutesService } from './hidden-routes.service.js';

/** The office's map of a site's hidden routes; technicians have theirs on the phone, from sync. */
@ApiTags('hidden-routes')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller('sites')
export class HiddenRoutesController {
  constructor(private readonly hiddenRoutes: HiddenRoutesService) {}

  @Get(':id/hidden-routes')
  siteMap(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.hiddenRoutes.siteMap(user, id);
  }
}
