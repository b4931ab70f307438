import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { TIMESTAMP } from '../../database/column-types.js';

export type OutboxState = 'queued' | 'sent' | 'failed';

/**
 * One e-mail waiting to go, or gone: the outbox the API works through, so that a message asked for survives a
 * restart and a mail provider that is down for a while. `purpose` and `subjectId` say what it is about (a
 * document), so the feature that queued it can attach its files and hear how it went.
 */
@Entity('outgoing_mail')
@Index('IDX_outgoing_mail_due', ['state', 'nextAttemptAt'])
export class OutboxMessage extends TenantRow {
  @Column({ type: 'varchar', length: 40 })
  purpose: string;

  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  subjectId: string | null;

  @Column({ type: 'varchar', length: 254 })
  toAddress: string;

  /** Who gets a copy, seen by the one it is sent to. */
  @Column({ type: 'varchar', length: 254, nullable: true })
  ccAddress: string | null;

  /** When one e-mail carries several of the purpose's subjects (a job's documents), all of them, in order. */
  @Column({ type: 'simple-json', nullable: true })
  subjectIds: string[] | null;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  /** Emptied once the message is sent or given up: it may hold a share link, which is not kept in the clear. */
  @Column({ type: 'text', nullable: true })
  text: string | null;

  @Column({ type: 'text', nullable: true })
  html: string | null;

  @Column({ type: 'varchar', length: 10, default: 'queued' })
  state: OutboxState;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @Column({ type: TIMESTAMP })
  nextAttemptAt: Date;

  /** While one worker is sending it, others leave it alone; a worker that died lets go when this passes. */
  @Column({ type: TIMESTAMP, nullable: true })
  claimedUntil: Date | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  lastError: string | null;

  @Column({ type: TIMESTAMP, nullable: true })
  sentAt: Date | null;

  @Column({ type: 'varchar', length: 36 })
  createdById: string;
}
