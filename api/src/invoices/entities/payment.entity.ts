import type { PaymentMethod } from '@wiretrail/core';
import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * Money received against an invoice: by card through the payment provider (recorded by its signed webhook), or
 * paid on site or into the bank and recorded by the office. Several part payments may settle one invoice.
 */
@Entity('payment')
export class Payment extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  invoiceId: string;

  /** Pence, more than nothing. */
  @Column({ type: 'integer' })
  amountMinor: number;

  @Column({ type: 'varchar', length: 20 })
  method: PaymentMethod;

  /** The day the money came in (YYYY-MM-DD). */
  @Column({ type: 'varchar', length: 10 })
  receivedOn: string;

  /** The cheque number, the bank transfer's reference, the provider's payment. */
  @Column({ type: 'varchar', length: 255, nullable: true })
  reference: string | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  note: string | null;

  /** Who recorded it; none for a card payment the provider reported. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  recordedById: string | null;

  /** The provider's checkout session a card payment settled: at most one payment each, however often it is reported. */
  @Index('IDX_payment_checkout_session', { unique: true })
  @Column({ type: 'varchar', length: 255, nullable: true })
  checkoutSessionId: string | null;

  /**
   * What goes back to the card: the part of a card payment above what was owed when its news arrived (the invoice
   * was paid another way or credited while the customer was at the checkout). Taken off what the payment settles.
   */
  @Column({ type: 'integer', default: 0 })
  refundMinor: number;

  /** When the provider confirmed the refund; empty while it is still to be made. */
  @Column({ type: TIMESTAMP, nullable: true })
  refundedAt: Date | null;

  /** The provider's refund. */
  @Column({ type: 'varchar', length: 255, nullable: true })
  refundReference: string | null;
}
