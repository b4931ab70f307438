import { Controller, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../common/decorators/public.decorator.js';
import { CardPaymentsService } from './card-payments.service.js';

/** "Pay by card" on the customer's share page: a hosted checkout for what the invoice still owes. */
@ApiTags('shared (customers)')
@Public()
@Controller('shared/:token/invoices/:invoiceId/checkout')
export class CheckoutController {
  constructor(private readonly cards: CardPaymentsService) {}

  /** Answers with the checkout's address to send the customer to. */
  @Post()
  start(@Param('token') token: string, @Param('invoiceId', new ParseUUIDPipe()) invoiceId: string) {
    return this.cards.checkout(token, invoiceId);
  }
}
