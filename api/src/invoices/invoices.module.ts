import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { JobsModule } from '../jobs/jobs.module.js';
import { MailModule } from '../mail/mail.module.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { PaperworkModule } from '../paperwork/paperwork.module.js';
import { LabourRate } from '../pricing/entities/labour-rate.entity.js';
import { VatRate } from '../pricing/entities/vat-rate.entity.js';
import { ShareLinksModule } from '../share-links/share-links.module.js';
import { StorageModule } from '../storage/storage.module.js';
import { Invoice } from './entities/invoice.entity.js';
import { InvoiceLine } from './entities/invoice-line.entity.js';
import { Payment } from './entities/payment.entity.js';
import { Refund } from './entities/refund.entity.js';
import { CardRefunds } from './card-refunds.js';
import { RefundsService } from './refunds.service.js';
import { InvoiceMailService } from './invoice-mail.service.js';
import { InvoicesController } from './invoices.controller.js';
import { InvoicesService } from './invoices.service.js';
import { OwedChanges } from './owed-changes.js';
import { PaymentsService } from './payments.service.js';
import { SharedInvoicesController } from './shared-invoices.controller.js';

/** Quotes, invoices and credit notes per job, payments against them and refunds, the aged debt, and their place on share pages. */
@Module({
  imports: [
    TypeOrmModule.forFeature([Invoice, InvoiceLine, Payment, Refund, Organisation, VatRate, LabourRate]),
    PaperworkModule,
    MailModule,
    ShareLinksModule,
    StorageModule,
    JobsModule,
  ],
  controllers: [InvoicesController, SharedInvoicesController],
  providers: [InvoicesService, PaymentsService, RefundsService, CardRefunds, InvoiceMailService, OwedChanges],
  exports: [InvoicesService, PaymentsService, OwedChanges, CardRefunds],
})
export class InvoicesModule {}
