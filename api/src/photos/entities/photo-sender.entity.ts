import { Entity, PrimaryColumn } from 'typeorm';

/**
 * Who has shown the server a photo's bytes: a person who uploaded them, or who named them while a photo with
 * them was on one of their sites. Knowing a hash is not enough to make a photo of it; holding the bytes is.
 */
@Entity('photo_sender')
export class PhotoSender {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  organisationId: string;

  @PrimaryColumn({ type: 'varchar', length: 64 })
  sha256: string;

  @PrimaryColumn({ type: 'varchar', length: 36 })
  userId: string;
}
