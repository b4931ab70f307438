import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { TIMESTAMP } from '../../database/column-types.js';

/** A one-time link to set a new password, sent by an admin; only the hash of its secret is kept. */
@Entity('password_reset')
export class PasswordReset extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ type: TIMESTAMP })
  expiresAt: Date;

  @Column({ type: TIMESTAMP, nullable: true })
  usedAt: Date | null;

  @Column({ type: 'varchar', length: 36 })
  requestedById: string;
}
