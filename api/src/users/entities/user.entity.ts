import type { Role } from '@wiretrail/core';
import { Column, Entity, Index, JoinColumn, ManyToOne, type Relation } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { Organisation } from '../../organisations/entities/organisation.entity.js';
import { TIMESTAMP } from '../../database/column-types.js';

@Entity('user')
export class User extends TenantRow {
  @ManyToOne(() => Organisation, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisationId' })
  organisation?: Relation<Organisation>;

  /** Stored lower-cased; unique across organisations because sign-in is by e-mail alone. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  role: Role;

  @Column({ type: 'varchar', length: 300, select: false })
  passwordHash: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @Column({ type: TIMESTAMP, nullable: true })
  lastSignInAt: Date | null;
}

/** What the API ever says about a user. */
export interface PublicUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  organisationId: string;
  active: boolean;
}

export function toPublicUser(u: User): PublicUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, organisationId: u.organisationId, active: u.active };
}
