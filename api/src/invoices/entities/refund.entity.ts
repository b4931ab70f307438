import type { RefundMethod } from '@wiretrail/core';
import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

export type RefundState = 'made' | 'pending' | 'failed';

/**
 * Money the office gives back to a customer on an invoice, never more than the customer is owed there: by hand
 * (cash, bank transfer, cheque), or to one of the invoice's card payments through the provider. A card refund is
 * `pending` from the moment it is recorded (so a second one cannot take the same money) until the provider has made
 * it; one the provider refuses is `failed` and counts for nothing.
 */
@Entity('refund')
@Index('IDX_refund_request', ['organisationId', 'requestId'], { unique: true })
export class Refund extends TenantRow {
  @Index('IDX_refund_invoice')
  @Column({ type: 'varchar', length: 36 })
  invoiceId: string;

  /** Pence, more than nothing. */
  @Column({ type: 'integer' })
  amountMinor: number;

  @Column({ type: 'varchar', length: 20 })
  method: RefundMethod;

  /** The card payment the money goes back to; none for a refund by hand. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  paymentId: string | null;

  /** The day the money went back (YYYY-MM-DD). */
  @Column({ type: 'varchar', length: 10 })
  refundedOn: string;

  /** The transfer's reference, the cheque number, the provider's refund. */
  @Column({ type: 'varchar', length: 255, nullable: true })
  reference: string | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  note: string | null;

  @Column({ type: 'varchar', length: 10 })
  state: RefundState;

  /** Why the provider did not make a card refund. */
  @Column({ type: 'varchar', length: 500, nullable: true })
  failure: string | null;

  /** The office's form sends one per refund it means: the same request sent twice records (and refunds) once. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  requestId: string | null;

  @Column({ type: 'varchar', length: 36 })
  recordedById: string;
}
