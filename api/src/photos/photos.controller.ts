import { Controller, Get, Param, ParseUUIDPipe, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnyRole, Roles } from '../common/decorators/roles.decorator.js';
import { sendStoredFile } from '../common/stored-file-response.js';
import { ListPhotosQueryDto } from './dto/list-photos-query.dto.js';
import { type PhotoFile, PhotosService } from './photos.service.js';
import type { StoredVariant } from '../storage/file-stores.js';

/** A photo's bytes never change under its name (its sha256), so browsers may keep them for good. */
const CACHE_FOREVER = 'private, max-age=31536000, immutable';

@ApiTags('photos')
@ApiBearerAuth()
@Controller('photos')
export class PhotosController {
  constructor(private readonly photos: PhotosService) {}

  /** The office's photo trail; technicians get photo rows through sync. */
  @Roles('office', 'admin')
  @Get()
  list(@CurrentUser() user: AuthUser, @Query() query: ListPhotosQueryDto) {
    return this.photos.list(user, query);
  }

  @AnyRole()
  @ApiProduces('image/webp')
  @Get(':id/thumb')
  thumb(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Req() req: Request, @Res() res: Response) {
    return this.send(user, id, 'thumb', req, res);
  }

  @AnyRole()
  @ApiProduces('image/webp')
  @Get(':id/display')
  display(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Req() req: Request, @Res() res: Response) {
    return this.send(user, id, 'display', req, res);
  }

  @AnyRole()
  @ApiProduces('image/jpeg', 'image/png', 'image/webp', 'image/heic', 'image/avif')
  @Get(':id/original')
  original(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Req() req: Request, @Res() res: Response) {
    return this.send(user, id, 'original', req, res);
  }

  private async send(user: AuthUser, id: string, variant: StoredVariant, req: Request, res: Response): Promise<void> {
    const file: PhotoFile = await this.photos.file(user, id, variant);
    await sendStoredFile(req, res, { ...file, cacheControl: CACHE_FOREVER, open: () => this.photos.open(file) });
  }
}
