import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * One refresh token. Tokens of one sign-in share a family: using a token that was
 * already rotated means it leaked, so the whole family is revoked.
 */
@Entity('refresh_token')
export class RefreshToken extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Index()
  @Column({ type: 'varchar', length: 36 })
  familyId: string;

  /** sha256 of the secret part; the secret itself is never stored. */
  @Column({ type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ type: TIMESTAMP })
  expiresAt: Date;

  @Column({ type: TIMESTAMP, nullable: true })
  rotatedAt: Date | null;

  @Column({ type: TIMESTAMP, nullable: true })
  revokedAt: Date | null;

  @Column({ type: 'varchar', length: 300, nullable: true })
  userAgent: string | null;
}
