import { Controller, Get, Inject, Param, ParseUUIDPipe, Req, Res } from '@nestjs/common';
import { ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { Public } from '../common/decorators/public.decorator.js';
import { sendIssuedPdf } from '../paperwork/issued-pdf.js';
import type { FileStorage } from '../storage/file-storage.js';
import { INVOICE_STORAGE } from '../storage/file-stores.js';
import { InvoicesService } from './invoices.service.js';

/** The job's quotes, invoices and credit notes on the customer's share page; the link is the only key. */
@ApiTags('shared (customers)')
@Public()
@Controller('shared/:token/invoices')
export class SharedInvoicesController {
  constructor(
    private readonly invoices: InvoicesService,
    @Inject(INVOICE_STORAGE) private readonly storage: FileStorage,
  ) {}

  @Get()
  list(@Param('token') token: string) {
    return this.invoices.shared(token);
  }

  @ApiProduces('application/pdf')
  @Get(':invoiceId/pdf')
  async pdf(@Param('token') token: string, @Param('invoiceId', new ParseUUIDPipe()) invoiceId: string, @Req() req: Request, @Res() res: Response) {
    await sendIssuedPdf(this.storage, await this.invoices.sharedIssued(token, invoiceId), req, res);
  }
}
