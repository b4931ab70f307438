import { Controller, Get, Param, ParseUUIDPipe, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { pipeline } from 'node:stream/promises';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { AnyRole, Roles } from '../common/decorators/roles.decorator.js';
import { ListPhotosQueryDto } from './dto/list-photos-query.dto.js';
import { type PhotoFile, PhotosService } from './photos.service.js';
import type { StoredVariant } from './storage/photo-storage.js';

/** A photo's bytes never change under its name (its sha256), so browsers may keep them for good. */
const CACHE_FOREVER = 'private, max-age=31536000, immutable';

function matches(ifNoneMatch: string | undefined, etag: string): boolean {
  if (!ifNoneMatch) return false;
  return ifNoneMatch.split(',').some((tag) => {
    const t = tag.trim();
    return t === '*' || t === etag || t === `W/${etag}`;
  });
}

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
    res.setHeader('ETag', file.etag);
    res.setHeader('Cache-Control', CACHE_FOREVER);
    if (matches(req.headers['if-none-match'], file.etag)) {
      res.status(304).end();
      return;
    }
    const body = await this.photos.open(file);
    res.status(200);
    res.setHeader('Content-Type', file.contentType);
    if (file.bytes !== undefined) res.setHeader('Content-Length', String(file.bytes));
    if (file.filename) res.setHeader('Content-Disposition', `attachment; filename="${file.filename}"`);
    try {
      await pipeline(body, res);
    } catch {
      // The client went away, or storage failed part way: nothing more can be said on this response.
      res.destroy();
    }
  }
}
