import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * A record an issued document prints: a site, board, circuit, visit, test result, point change, cable run or photo.
 * Written with the document in its issuing transaction and never changed after; while the document stands (issued
 * and not superseded) the record does not change under anyone (documents/document-lock.ts).
 */
@Entity('printed_record')
@Index('IDX_printed_record_row', ['rowId'])
export class PrintedRecord {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  documentId: string;

  @PrimaryColumn({ type: 'varchar', length: 40 })
  entity: string;

  @PrimaryColumn({ type: 'varchar', length: 36 })
  rowId: string;

  @Column({ type: 'varchar', length: 36 })
  organisationId: string;
}
