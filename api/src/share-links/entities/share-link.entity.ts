import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * A link the office gives a customer to read one job's record without an account. Only the sha256 of its random
 * token is kept: the link itself is shown once, when it is made (and sent in the e-mail that carries it).
 */
@Entity('share_link')
export class ShareLink extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  jobId: string;

  @Index({ unique: true })
  @Column({ type: 'varchar', length: 64 })
  tokenHash: string;

  /** Who it is for or why it was made, for the office's list. */
  @Column({ type: 'varchar', length: 200, nullable: true })
  label: string | null;

  @Column({ type: TIMESTAMP })
  expiresAt: Date;

  @Column({ type: TIMESTAMP, nullable: true })
  revokedAt: Date | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  revokedById: string | null;

  @Column({ type: 'varchar', length: 36 })
  createdById: string;

  @Column({ type: TIMESTAMP, nullable: true })
  lastOpenedAt: Date | null;

  @Column({ type: 'integer', default: 0 })
  openCount: number;
}
