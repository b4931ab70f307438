import { Controller, Get, Inject, Param, ParseUUIDPipe, Req, Res } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Public } from '../common/decorators/public.decorator.js';
import { sendStoredFile } from '../common/stored-file-response.js';
import { sendIssuedPdf } from '../paperwork/issued-pdf.js';
import { PhotosService } from '../photos/photos.service.js';
import type { FileStorage } from '../storage/file-storage.js';
import { DOCUMENT_STORAGE } from '../storage/file-stores.js';
import { ShareLinksService } from './share-links.service.js';

/**
 * A customer's read-only view through a share link: no account, only the token. Everything is scoped to the link's
 * job; an unknown, expired or withdrawn link is refused and gives no data. Rate-limited in app.setup.ts.
 */
@ApiTags('shared (customers)')
@Public()
@Controller('shared/:token')
export class SharedController {
  constructor(
    private readonly links: ShareLinksService,
    private readonly photos: PhotosService,
    @Inject(DOCUMENT_STORAGE) private readonly documents: FileStorage,
  ) {}

  @Get()
  view(@Param('token') token: string) {
    return this.links.view(token);
  }

  @ApiProduces('image/webp')
  @Get('photos/:photoId/thumb')
  thumb(@Param('token') token: string, @Param('photoId', new ParseUUIDPipe()) photoId: string, @Req() req: Request, @Res() res: Response) {
    return this.photo(token, photoId, 'thumb', req, res);
  }

  @ApiProduces('image/webp')
  @Get('photos/:photoId/display')
  display(@Param('token') token: string, @Param('photoId', new ParseUUIDPipe()) photoId: string, @Req() req: Request, @Res() res: Response) {
    return this.photo(token, photoId, 'display', req, res);
  }

  @ApiProduces('application/pdf')
  @Get('documents/:documentId/pdf')
  async pdf(@Param('token') token: string, @Param('documentId', new ParseUUIDPipe()) documentId: string, @Req() req: Request, @Res() res: Response) {
    await sendIssuedPdf(this.documents, await this.links.document(token, documentId), req, res);
  }

  private async photo(token: string, photoId: string, variant: 'thumb' | 'display', req: Request, res: Response): Promise<void> {
    const link = await this.links.open(token);
    const file = await this.photos.fileOnJob(link.organisationId, link.jobId, photoId, variant);
    // Not kept for long: once the link is withdrawn, the photos should stop showing too.
    await sendStoredFile(req, res, { ...file, cacheControl: 'private, max-age=300', open: () => this.photos.open(file) });
  }
}
