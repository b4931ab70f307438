import { CardCheckout } from '../card-payments/entities/card-checkout.entity.js';
import { PaymentEvent } from '../card-payments/entities/payment-event.entity.js';
import { Invoice } from '../invoices/entities/invoice.entity.js';
import { InvoiceLine } from '../invoices/entities/invoice-line.entity.js';
import { Payment } from '../invoices/entities/payment.entity.js';
import { Refund } from '../invoices/entities/refund.entity.js';
import { AttemptCount } from '../auth/entities/attempt-count.entity.js';
import { PasswordReset } from '../auth/entities/password-reset.entity.js';
import { RefreshToken } from '../auth/entities/refresh-token.entity.js';
import { DocumentCounter } from '../paperwork/entities/document-counter.entity.js';
import { PrintedRecord } from '../paperwork/entities/printed-record.entity.js';
import { OutboxMessage } from '../mail/entities/outbox-message.entity.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { LabourRate } from '../pricing/entities/labour-rate.entity.js';
import { VatRate } from '../pricing/entities/vat-rate.entity.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { PhotoSender } from '../photos/entities/photo-sender.entity.js';
import { SYNC_BOOKKEEPING } from '../sync/entities/sync-bookkeeping.entity.js';
import { ALL_SYNC_SCHEMAS } from '../sync/entities/sync-schemas.js';
import { ShareLink } from '../share-links/entities/share-link.entity.js';
import { Person } from '../users/entities/person.entity.js';
import { User } from '../users/entities/user.entity.js';

import { BuildingNotification } from '../notifiable-work/entities/building-notification.entity.js';

/** For the migration CLI and scripts; the Nest app registers entities per feature module. */
export const ALL_ENTITIES = [
  Organisation, Person, User, RefreshToken, PasswordReset, AttemptCount, PhotoBlob, PhotoSender, DocumentCounter, PrintedRecord, OutboxMessage, ShareLink,
  VatRate, LabourRate, Invoice, InvoiceLine, Payment, Refund, CardCheckout, PaymentEvent, BuildingNotification, ...SYNC_BOOKKEEPING, ...ALL_SYNC_SCHEMAS,
];
