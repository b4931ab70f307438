import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { paymentsConfig } from '../config/payments.config.js';
import { InvoicesModule } from '../invoices/invoices.module.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { ShareLinksModule } from '../share-links/share-links.module.js';
import { CardPaymentsService } from './card-payments.service.js';
import { CheckoutController } from './checkout.controller.js';
import { CardCheckout } from './entities/card-checkout.entity.js';
import { PaymentEvent } from './entities/payment-event.entity.js';
import { createPaymentProvider, PAYMENT_PROVIDER } from './payment-provider.js';
import { WebhookController } from './webhook.controller.js';

/** Card payments: the provider's hosted checkout from a share link, and its signed webhook. */
@Module({
  imports: [TypeOrmModule.forFeature([CardCheckout, PaymentEvent, Organisation]), InvoicesModule, ShareLinksModule],
  controllers: [CheckoutController, WebhookController],
  providers: [CardPaymentsService, { provide: PAYMENT_PROVIDER, inject: [paymentsConfig.KEY], useFactory: createPaymentProvider }],
})
export class CardPaymentsModule {}
