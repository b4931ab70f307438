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

  /** The contractor's registration with its competent-person scheme, printed on every certificate. */
  @Column({ type: 'varchar', length: 60, nullable: true })
  registrationNumber: string | null;

  /** Where dates and times on documents are given: a certificate states the local date the work was signed off. */
  @Column({ type: 'varchar', length: 60, default: 'Europe/London' })
  timeZone: string;

  /** The office's own photo tags, offered after the built-in ones (PHOTO_TAGS). */
  @Column({ type: 'simple-json', default: '[]' })
  photoTags: string[];

  /** Whether the sizes the server makes of a photo keep its location (GPS) metadata; off unless the office wants it. */
  @Column({ type: 'boolean', default: false })
  keepPhotoLocation: boolean;

  /** The contractor's VAT registration number, printed on invoices; a contractor without one charges no VAT. */
  @Column({ type: 'varchar', length: 20, nullable: true })
  vatNumber: string | null;

  /** Days a customer has to pay an invoice, unless the invoice says otherwise. */
  @Column({ type: 'integer', default: 30 })
  paymentTermsDays: number;

  /** Days a quote stands for. */
  @Column({ type: 'integer', default: 30 })
  quoteValidDays: number;

  /** The terms printed under every invoice and quote. */
  @Column({ type: 'varchar', length: 1000, nullable: true })
  paymentTerms: string | null;

  /** Which nation's Building Regulations the contractor works under (NATIONS in core): decides what is notifiable. */
  @Column({ type: 'varchar', length: 30, default: 'england' })
  nation: string;

  /** The competent person scheme the contractor notifies through, by name. */
  @Column({ type: 'varchar', length: 100, nullable: true })
  competentPersonScheme: string | null;

  /** How to pay other than by card: the bank account, who cheques are payable to. */
  @Column({ type: 'varchar', length: 1000, nullable: true })
  paymentInstructions: string | null;
}
