import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * Attempts counted against one key ("address:203.0.113.7", "account:ann@example.com", "refresh:…", "session:…")
 * since its window opened. Kept in the database so that every API instance counts together.
 */
@Entity('attempt_count')
export class AttemptCount {
  @PrimaryColumn({ type: 'varchar', length: 300 })
  key: string;

  @Column({ type: 'integer' })
  attempts: number;

  @Index()
  @Column({ type: TIMESTAMP })
  windowStartedAt: Date;
}
