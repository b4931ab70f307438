import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * The last number given to each kind of document in an organisation. It moves in the same transaction that
 * writes the document, so a refused or failed issue never uses up a number and two issues never share one.
 */
@Entity('document_counter')
export class DocumentCounter {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  organisationId: string;

  @PrimaryColumn({ type: 'varchar', length: 40 })
  kind: string;

  @Column({ type: 'integer' })
  value: number;
}
