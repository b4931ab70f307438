import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * The bytes of one photo as an organisation's storage holds them, named by their sha256, with the sizes made
 * from them. Photo rows point at it by hash, so a photo taken on two devices, or sent twice, is stored once.
 * Per organisation: whether another organisation holds the same bytes is never asked or told.
 */
@Entity('photo_blob')
export class PhotoBlob {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  organisationId: string;

  @PrimaryColumn({ type: 'varchar', length: 64 })
  sha256: string;

  /** Of the original, as read from its content. */
  @Column({ type: 'varchar', length: 40 })
  mime: string;

  @Column({ type: 'integer' })
  bytes: number;

  /** As displayed, after the camera's orientation is applied. */
  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;
}
