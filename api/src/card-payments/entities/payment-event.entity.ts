import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * Every provider event taken in, by the provider's own id: a replayed or redelivered event is recognised here and
 * changes nothing. Written in the same transaction as whatever the event did.
 */
@Entity('payment_event')
export class PaymentEvent {
  @PrimaryColumn({ type: 'varchar', length: 255 })
  eventId: string;

  @Column({ type: 'varchar', length: 100 })
  type: string;

  @Column({ type: 'varchar', length: 36, nullable: true })
  organisationId: string | null;

  /** What it did, for someone reading the table: "recorded £120.00 against INV-0003". */
  @Column({ type: 'varchar', length: 300 })
  outcome: string;

  @CreateDateColumn({ type: TIMESTAMP })
  receivedAt: Date;
}
