import { Column, Entity } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

/** An hourly rate the office charges labour at ("Electrician", "Electrician and mate"), before VAT. */
@Entity('labour_rate')
export class LabourRate extends TenantRow {
  @Column({ type: 'varchar', length: 100 })
  name: string;

  /** Pence per hour, before VAT. */
  @Column({ type: 'integer' })
  hourlyMinor: number;

  @Column({ type: 'varchar', length: 20 })
  vatRateCode: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  /** The rate labour from a visit's times on site is priced at; one per organisation. */
  @Column({ type: 'boolean', default: false })
  isDefault: boolean;
}
