import { BeforeInsert, Column, CreateDateColumn, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { TIMESTAMP } from '../database/column-types.js';

/** Ids are UUIDv7 so that devices can make them offline and they still sort by creation time. */
export abstract class BaseRow {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  id: string;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;

  @BeforeInsert()
  assignId(): void {
    if (!this.id) this.id = uuidv7();
  }
}

/** Every tenant row carries its organisation; services always filter by it. */
export abstract class TenantRow extends BaseRow {
  @Column({ type: 'varchar', length: 36 })
  organisationId: string;
}
