import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { CreateShareLinkDto } from './dto/create-share-link.dto.js';
import { ShareLinksService } from './share-links.service.js';

/** The office makes, lists and withdraws the links it gives customers. */
@ApiTags('share links')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller()
export class ShareLinksController {
  constructor(private readonly links: ShareLinksService) {}

  /** The answer carries the link's address; it is not shown again, since only a hash of it is kept. */
  @Post('jobs/:id/share-links')
  create(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string, @Body() dto: CreateShareLinkDto) {
    return this.links.create(user, jobId, dto);
  }

  @Get('jobs/:id/share-links')
  list(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string) {
    return this.links.list(user, jobId);
  }

  @Post('share-links/:id/revoke')
  @HttpCode(200)
  revoke(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.links.revoke(user, id);
  }
}
