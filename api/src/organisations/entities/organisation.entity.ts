import { Column, Entity } from 'typeorm';
import { BaseRow } from '../../common/entities.js';

@Entity('organisation')
export class Organisation extends BaseRow {
  @Column({ type: 'varchar', length: 200 })
  name: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  address: string | null;

  @Column({ type: 'varchar', length: 50, nullable: true })
  phone: string | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  email: string | null;

  /** The office's own photo tags, offered after the built-in ones (PHOTO_TAGS). */
  @Column({ type: 'simple-json', default: '[]' })
  photoTags: string[];

  /** Whether the sizes the server makes of a photo keep its location (GPS) metadata; off unless the office wants it. */
  @Column({ type: 'boolean', default: false })
  keepPhotoLocation: boolean;
}
