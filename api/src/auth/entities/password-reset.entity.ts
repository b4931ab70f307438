import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

/** A one-time link to set a new password, sent by an admin; only the hash of its secret is kept. */
@Entity('password_reset')
export class PasswordReset extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ type: 'datetime' })
  expiresAt: Date;

  @Column({ type: 'datetime', nullable: true })
  usedAt: Date | null;

  @Column({ type: 'varchar', length: 36 })
  requestedById: string;
}
