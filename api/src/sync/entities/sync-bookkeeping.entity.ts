import type { MutationResult, SyncEntityName } from '@wiretrail/core';
import { Column, Entity, Index, PrimaryColumn } from 'typeorm';
import { TIMESTAMP, NOW } from '../../database/column-types.js';

/**
 * The latest change of every synced row, in server order. `seq` comes from one counter, so pulls page through
 * changes by sequence and never by a device's clock.
 */
@Entity('sync_change')
@Index('IDX_sync_change_org_seq', ['organisationId', 'seq'])
@Index('IDX_sync_change_site', ['siteId'])
@Index('IDX_sync_change_tombstone', ['deleted', 'changedAt'])
export class SyncChange {
  @PrimaryColumn({ type: 'varchar', length: 40 })
  entity: SyncEntityName;

  @PrimaryColumn({ type: 'varchar', length: 36 })
  rowId: string;

  @Column({ type: 'varchar', length: 36 })
  organisationId: string;

  @Column({ type: 'integer', unique: true })
  seq: number;

  @Column({ type: 'varchar', length: 36, nullable: true })
  siteId: string | null;

  @Column({ type: 'boolean', default: false })
  deleted: boolean;

  /** When the entry was last written: a tombstone older than the retention period is compacted away. */
  @Column({ type: TIMESTAMP, nullable: true })
  changedAt: Date | null;
}

/** One counter for the whole server: the sequence every change is stamped with. */
@Entity('sync_counter')
export class SyncCounter {
  @PrimaryColumn({ type: 'varchar', length: 20 })
  name: string;

  @Column({ type: 'integer' })
  value: number;
}

/** A mutation applied (or refused) once; a replay gets this stored result and changes nothing. */
@Entity('applied_mutation')
@Index('IDX_applied_mutation_applied', ['appliedAt'])
export class AppliedMutation {
  @PrimaryColumn({ type: 'varchar', length: 64 })
  mutationId: string;

  @Column({ type: 'varchar', length: 36 })
  organisationId: string;

  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'varchar', length: 64 })
  deviceId: string;

  @Column({ type: 'simple-json' })
  result: MutationResult;

  @Column({ type: TIMESTAMP, default: NOW })
  appliedAt: Date;
}

/**
 * What each device was last sent: the checkpoint and the scope (sites) it was computed with, and the pair before,
 * in case the last reply never arrived. A pull from any other checkpoint gets a reset.
 */
@Entity('sync_device')
export class SyncDevice {
  @PrimaryColumn({ type: 'varchar', length: 64 })
  deviceId: string;

  @Column({ type: 'varchar', length: 36 })
  organisationId: string;

  @Column({ type: 'varchar', length: 36 })
  userId: string;

  @Column({ type: 'integer', default: 0 })
  checkpoint: number;

  /** Site ids; null for office and admin, who see the whole organisation. */
  @Column({ type: 'simple-json', nullable: true })
  scope: string[] | null;

  @Column({ type: 'integer', nullable: true })
  previousCheckpoint: number | null;

  @Column({ type: 'simple-json', nullable: true })
  previousScope: string[] | null;

  @Column({ type: TIMESTAMP, nullable: true })
  lastPullAt: Date | null;
}

/**
 * How far an organisation's change log has been compacted: tombstones up to `throughSeq` are gone, so a device
 * whose checkpoint is below it may have missed a deletion and starts again from nothing (pull's `reset`).
 */
@Entity('sync_compaction')
export class SyncCompaction {
  @PrimaryColumn({ type: 'varchar', length: 36 })
  organisationId: string;

  @Column({ type: 'integer' })
  throughSeq: number;

  @Column({ type: TIMESTAMP })
  compactedAt: Date;
}

export const SYNC_BOOKKEEPING = [SyncChange, SyncCounter, AppliedMutation, SyncDevice, SyncCompaction];
