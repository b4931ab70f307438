import { Controller, Param, ParseUUIDPipe, Post, Req } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { requestOrigin } from '../common/request-origin.js';
import { Public } from '../common/decorators/public.decorator.js';
import { CardPaymentsService } from './card-payments.service.js';

/** "Pay by card" on the customer's share page: a hosted checkout for what the invoice still owes. */
@ApiTags('shared (customers)')
@Public()
@Controller('shared/:token/invoices/:invoiceId/checkout')
export class CheckoutController {
  constructor(private readonly cards: CardPaymentsService) {}

  /**
   * Answers with the checkout's address to send the customer to; the checkout sends them back to PUBLIC_URL, or
   * without it to the address this request came to.
   */
  @Post()
  start(@Param('token') token: string, @Param('invoiceId', new ParseUUIDPipe()) invoiceId: string, @Req() req: Request) {
    return this.cards.checkout(token, invoiceId, requestOrigin(req));
  }
}
