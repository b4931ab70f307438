import type { LineKind } from '@wiretrail/core';
import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';

/**
 * One priced line: labour from a visit's time on site, a part from the visit's parts list, or a fixed-price item.
 * The VAT rate is copied onto the line, so a later change of the organisation's rates leaves it as it was.
 */
@Entity('invoice_line')
export class InvoiceLine extends TenantRow {
  @Index()
  @Column({ type: 'varchar', length: 36 })
  invoiceId: string;

  @Column({ type: 'integer' })
  position: number;

  @Column({ type: 'varchar', length: 20 })
  kind: LineKind;

  @Column({ type: 'varchar', length: 300 })
  description: string;

  /** An exact decimal with up to three places, kept as text so no floating point touches it: "12.5". */
  @Column({ type: 'varchar', length: 16 })
  quantity: string;

  @Column({ type: 'varchar', length: 20, nullable: true })
  unit: string | null;

  /** Pence for one unit, before VAT. */
  @Column({ type: 'integer' })
  unitPriceMinor: number;

  @Column({ type: 'varchar', length: 20 })
  vatRateCode: string;

  /** The rate as it was when the line was priced, in hundredths of a per cent. */
  @Column({ type: 'integer' })
  vatBasisPoints: number;

  @Column({ type: 'integer' })
  netMinor: number;

  @Column({ type: 'integer' })
  vatMinor: number;

  @Column({ type: 'integer' })
  grossMinor: number;

  /** Where the line came from, when it was built from the job. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  visitId: string | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  priceItemId: string | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  labourRateId: string | null;

  /** The part uses a part line adds up (one per visit that used the part), so each is invoiced once. */
  @Column({ type: 'simple-json', nullable: true })
  partUseIds: string[] | null;
}
