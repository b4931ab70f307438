import { Column, Entity, Index } from 'typeorm';
import { BaseRow } from '../../common/entities.js';

/**
 * Someone who signs in: their e-mail address and their one password. What they may do is their membership of an
 * organisation (`user`), one per organisation they work for, so a subcontractor working for two contractors signs
 * in once and chooses. The only row without an organisation: it says nothing any organisation may read.
 */
@Entity('person')
export class Person extends BaseRow {
  /** Stored lower-cased; unique because signing in is by e-mail alone. */
  @Index({ unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ type: 'varchar', length: 300, select: false })
  passwordHash: string;
}
