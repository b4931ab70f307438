import { Body, Controller, Get, HttpCode, Inject, Param, ParseUUIDPipe, Post, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { SendDocumentDto, SendDocumentsDto } from '../paperwork/dto/send-document.dto.js';
import { sendIssuedPdf } from '../paperwork/issued-pdf.js';
import { DocumentsService } from './documents.service.js';
import { IssueDocumentDto } from './dto/issue-document.dto.js';
import { ReviseDocumentDto } from './dto/revise-document.dto.js';
import type { FileStorage } from '../storage/file-storage.js';
import { DOCUMENT_STORAGE } from '../storage/file-stores.js';

/** The office's certificates and reports; technicians get document rows (and their e-mail state) through sync. */
@ApiTags('documents')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller()
export class DocumentsController {
  constructor(
    private readonly documents: DocumentsService,
    @Inject(DOCUMENT_STORAGE) private readonly storage: FileStorage,
  ) {}

  /** Refused with 422 and every reason (naming the circuit and reading) when the records cannot support it yet. */
  @Post('jobs/:id/documents')
  issue(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string, @Body() dto: IssueDocumentDto) {
    return this.documents.issue(user, jobId, dto.kind, dto.coverage, dto.particulars);
  }

  /** Which certificate the job's signed work needs, the particulars to start from, and what the records still lack. */
  @Get('jobs/:id/installation-certificate')
  installationPreview(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string) {
    return this.documents.installationPreview(user, jobId);
  }

  /** Changes that the job's issued documents keep back, each beside the value as issued. */
  @Get('jobs/:id/held-changes')
  heldChanges(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string) {
    return this.documents.heldChanges(user, jobId);
  }

  /**
   * A correction: a new document with a new number naming this one and why, taking the chosen held changes; this one
   * stays, marked superseded. An issued document is never deleted, by this route or any other.
   */
  @Post('documents/:id/revisions')
  revise(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: ReviseDocumentDto) {
    return this.documents.revise(user, id, dto);
  }

  @Get('jobs/:id/documents')
  list(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string) {
    return this.documents.list(user, jobId);
  }

  @Get('documents/:id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.documents.findOne(user, id);
  }

  @ApiProduces('application/pdf')
  @Get('documents/:id/pdf')
  async pdf(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Req() req: Request, @Res() res: Response) {
    await sendIssuedPdf(this.storage, await this.documents.row(user, id), req, res);
  }

  /** Accepted for sending: the outbox delivers it and the document's emailState follows. */
  @Post('documents/:id/send')
  @HttpCode(202)
  send(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: SendDocumentDto) {
    return this.documents.send(user, id, dto);
  }

  /** Several of the job's issued documents in one e-mail, with the office's own message and a copy to another address. */
  @Post('jobs/:id/documents/send')
  @HttpCode(202)
  sendSeveral(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string, @Body() dto: SendDocumentsDto) {
    return this.documents.sendAll(user, jobId, dto.documentIds, dto);
  }
}
