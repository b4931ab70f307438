import type { Role } from '@wiretrail/core';
import { Column, Entity, Index, JoinColumn, ManyToOne, type Relation } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { Organisation } from '../../organisations/entities/organisation.entity.js';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * A person's membership of one organisation: their name, role and whether they may still sign in there. Every
 * record names the membership (`user.id`), never the person, so each organisation sees only its own.
 */
@Entity('user')
@Index(['organisationId', 'email'], { unique: true })
export class User extends TenantRow {
  @ManyToOne(() => Organisation, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'organisationId' })
  organisation?: Relation<Organisation>;

  /** The person who signs in with this membership (`person`). SQLite adds a NOT NULL column only with a default. */
  @Index()
  @Column({ type: 'varchar', length: 36, default: '' })
  personId: string;

  /** The person's address, kept beside the membership so the office lists and searches its own rows alone. */
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  role: Role;

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
