import type { InvoiceEmailState, InvoiceKind, InvoiceStatus } from '@wiretrail/core';
import { Column, Entity, Index } from 'typeorm';
import { TenantRow } from '../../common/entities.js';
import { TIMESTAMP } from '../../database/column-types.js';

/**
 * A quote, an invoice or a credit note for a job: the same shape of priced lines and totals. A draft can be edited
 * and has no number; issuing numbers it (per organisation and kind, without gaps), prints its PDF and freezes it:
 * an issued invoice is corrected only by a credit note, whose lines are the negatives of the ones it takes back.
 */
@Entity('invoice')
@Index('IDX_invoice_job', ['organisationId', 'jobId'])
@Index('IDX_invoice_standing', ['organisationId', 'kind', 'status'])
@Index('IDX_invoice_number', ['organisationId', 'kind', 'number'], { unique: true })
export class Invoice extends TenantRow {
  @Column({ type: 'varchar', length: 36 })
  jobId: string;

  @Column({ type: 'varchar', length: 20 })
  kind: InvoiceKind;

  @Column({ type: 'varchar', length: 10, default: 'draft' })
  status: InvoiceStatus;

  /** INV-0001, QU-0001, CN-0001: given when issued. */
  @Column({ type: 'varchar', length: 40, nullable: true })
  number: string | null;

  /** A credit note's invoice. */
  @Index()
  @Column({ type: 'varchar', length: 36, nullable: true })
  creditsInvoiceId: string | null;

  /** An invoice made from a quote. */
  @Column({ type: 'varchar', length: 36, nullable: true })
  fromQuoteId: string | null;

  /** Days to pay an invoice, or days a quote stands; the organisation's unless changed on the draft. */
  @Column({ type: 'integer' })
  termDays: number;

  /** Printed on the document above its terms: what the work was, anything the customer should know. */
  @Column({ type: 'varchar', length: 2000, nullable: true })
  notes: string | null;

  /** The date of issue, which is also the tax point here (YYYY-MM-DD, the contractor's local date). */
  @Column({ type: 'varchar', length: 10, nullable: true })
  issueDate: string | null;

  /** When an invoice must be paid by, or until when a quote stands (YYYY-MM-DD). */
  @Column({ type: 'varchar', length: 10, nullable: true })
  dueDate: string | null;

  @Column({ type: TIMESTAMP, nullable: true })
  issuedAt: Date | null;

  @Column({ type: 'varchar', length: 36, nullable: true })
  issuedById: string | null;

  /** Totals of the lines in pence, kept with the lines (a credit note's are negative). */
  @Column({ type: 'integer', default: 0 })
  netMinor: number;

  @Column({ type: 'integer', default: 0 })
  vatMinor: number;

  @Column({ type: 'integer', default: 0 })
  grossMinor: number;

  /** What was printed, as it stood when issued: the organisation's details may change later, the document does not. */
  @Column({ type: 'varchar', length: 20, nullable: true })
  vatNumber: string | null;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  terms: string | null;

  @Column({ type: 'varchar', length: 1000, nullable: true })
  paymentInstructions: string | null;

  @Column({ type: 'varchar', length: 64, nullable: true })
  pdfSha256: string | null;

  @Column({ type: 'integer', nullable: true })
  pdfBytes: number | null;

  /** Sending by e-mail, as with documents: queued, then sent, or failed with the reason. */
  @Column({ type: 'varchar', length: 10, nullable: true })
  emailState: InvoiceEmailState | null;

  @Column({ type: 'varchar', length: 254, nullable: true })
  emailedTo: string | null;

  @Column({ type: TIMESTAMP, nullable: true })
  emailedAt: Date | null;

  @Column({ type: 'varchar', length: 500, nullable: true })
  emailError: string | null;

  @Column({ type: 'varchar', length: 36 })
  createdById: string;
}
