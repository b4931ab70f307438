import { Body, Controller, Delete, Get, HttpCode, Inject, Param, ParseUUIDPipe, Patch, Post, Query, Req, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { type AuthUser, CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { SendDocumentDto } from '../paperwork/dto/send-document.dto.js';
import { sendIssuedPdf } from '../paperwork/issued-pdf.js';
import type { FileStorage } from '../storage/file-storage.js';
import { INVOICE_STORAGE } from '../storage/file-stores.js';
import { AgedDebtQueryDto } from './dto/aged-debt-query.dto.js';
import { CreateInvoiceDto } from './dto/create-invoice.dto.js';
import { ListInvoicesQueryDto } from './dto/list-invoices-query.dto.js';
import { RecordPaymentDto } from './dto/record-payment.dto.js';
import { RecordRefundDto } from './dto/record-refund.dto.js';
import { UpdateInvoiceDto } from './dto/update-invoice.dto.js';
import { InvoiceMailService } from './invoice-mail.service.js';
import { InvoicesService } from './invoices.service.js';
import { PaymentsService } from './payments.service.js';
import { RefundsService } from './refunds.service.js';

/** The office's quotes, invoices and credit notes, the payments it records, and who owes what. */
@ApiTags('invoices')
@ApiBearerAuth()
@Roles('office', 'admin')
@Controller()
export class InvoicesController {
  constructor(
    private readonly invoices: InvoicesService,
    private readonly payments: PaymentsService,
    private readonly refunds: RefundsService,
    private readonly mail: InvoiceMailService,
    @Inject(INVOICE_STORAGE) private readonly storage: FileStorage,
  ) {}

  @Get('jobs/:id/invoices')
  forJob(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string) {
    return this.invoices.forJob(user, jobId);
  }

  /** A draft, with warnings about what could not be priced from the job. */
  @Post('jobs/:id/invoices')
  create(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) jobId: string, @Body() dto: CreateInvoiceDto) {
    return this.invoices.create(user, jobId, dto);
  }

  @Get('invoices')
  list(@CurrentUser() user: AuthUser, @Query() query: ListInvoicesQueryDto) {
    return this.invoices.list(user, query);
  }

  @Get('invoices/aged-debt')
  agedDebt(@CurrentUser() user: AuthUser, @Query() query: AgedDebtQueryDto) {
    return this.payments.agedDebt(user, query.asOf);
  }

  @Get('invoices/:id')
  findOne(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.invoices.findOne(user, id);
  }

  /** Drafts only: an issued one answers 409. */
  @Patch('invoices/:id')
  update(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: UpdateInvoiceDto) {
    return this.invoices.update(user, id, dto);
  }

  @Delete('invoices/:id')
  @HttpCode(204)
  remove(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.invoices.remove(user, id);
  }

  /** Refused with 422 and every reason when it cannot be issued as it stands. */
  @Post('invoices/:id/issue')
  @HttpCode(200)
  issue(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.invoices.issue(user, id);
  }

  @Post('invoices/:id/credit-note')
  creditNote(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string) {
    return this.invoices.creditNote(user, id);
  }

  @ApiProduces('application/pdf')
  @Get('invoices/:id/pdf')
  async pdf(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Req() req: Request, @Res() res: Response) {
    await sendIssuedPdf(this.storage, await this.invoices.issued(user, id), req, res);
  }

  @Post('invoices/:id/send')
  @HttpCode(202)
  send(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: SendDocumentDto) {
    return this.mail.send(user, id, dto);
  }

  /** Cash, bank transfer or cheque; card payments are recorded by the provider's webhook. */
  @Post('invoices/:id/payments')
  recordPayment(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: RecordPaymentDto) {
    return this.payments.record(user, id, dto);
  }

  /**
   * Money given back to the customer, never more than they are owed on the invoice (409 with the reason): by hand,
   * or to a card payment through the provider (502 when it does not make it). The same requestId records it once.
   */
  @Post('invoices/:id/refunds')
  recordRefund(@CurrentUser() user: AuthUser, @Param('id', new ParseUUIDPipe()) id: string, @Body() dto: RecordRefundDto) {
    return this.refunds.record(user, id, dto);
  }
}
