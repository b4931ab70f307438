import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

export type CheckoutState = 'open' | 'complete' | 'expired';

/**
 * A hosted checkout the customer was sent to, for what the invoice still owed at that moment. Only the newest stays
 * open for an invoice: an older one is expired at the provider first, so the same debt cannot be paid twice.
 */
@Entity('card_checkout')
export class CardCheckout extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  invoiceId: string;

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 255 })
  sessionId: string;

  @Column({ type: 'integer' })
  amountMinor: number;

  @Column({ type: 'varchar', length: 10 })
  state: CheckoutState;

  /** The share link the customer paid from. */
  @Column({ type: 'varchar', length: 36 })
  shareLinkId: string;
}
