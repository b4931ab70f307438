import { Controller, Headers, HttpCode, Post, type RawBodyRequest, Req } from '@nestjs/common';
import { ApiExcludeEndpoint, ApiTags } from '@nestjs/swagger';
import type { Request } from 'express';
import { Public } from '../common/decorators/public.decorator.js';
import { CardPaymentsService } from './card-payments.service.js';

/** Where the payment provider posts its signed events; the signature, checked on the raw body, is the only key. */
@ApiTags('payments')
@Public()
@Controller('payments')
export class WebhookController {
  constructor(private readonly cards: CardPaymentsService) {}

  @ApiExcludeEndpoint()
  @Post('webhook')
  @HttpCode(200)
  take(@Req() req: RawBodyRequest<Request>, @Headers('stripe-signature') signature: string | undefined) {
    return this.cards.takeEvent(req.rawBody, signature);
  }
}
