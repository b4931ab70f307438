import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

/**
 * One of the organisation's VAT rates (standard, reduced, zero). A change of rate is a change to this row; lines
 * already on issued invoices keep the rate they were issued with, so nothing issued moves.
 */
@Entity('vat_rate')
@Index('IDX_vat_rate_organisation_code', ['organisationId', 'code'], { unique: true })
export class VatRate extends TenantRow {
  /** What price items and lines refer to: "standard". Never changes once made. */
  @Column({ type: 'varchar', length: 20 })
  code: string;

  @Column({ type: 'varchar', length: 60 })
  name: string;

  /** Hundredths of a per cent: 2000 is 20 %. */
  @Column({ type: 'integer' })
  basisPoints: number;

  /** A rate no longer offered for new lines; kept, since issued lines name it. */
  @Column({ type: 'boolean', default: true })
  active: boolean;
}
