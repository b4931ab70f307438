import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import type { ConfigType } from '@nestjs/config';
import { Brackets, type EntityManager, In, LessThan } from 'typeorm';
import { WriteQueue } from '../common/write-queue.js';
import { syncConfig } from '../config/app.config.js';
import { AppliedMutation, SyncChange, SyncCompaction } from './entities/sync-bookkeeping.entity.js';
import { selectMany } from './bulk-write.js';
import { SERVER_DEVICE_IDS } from './sync-engine.service.js';

const DAY_MS = 24 * 60 * 60 * 1000;
/** Entries removed per transaction: small enough that pushes waiting behind the write queue hardly notice. */
const CHUNK = 2_000;

/** What one compaction removed, and the moment before which it removed it. */
export interface CompactionReport {
  before: string;
  tombstones: number;
  replayRecords: number;
}

/**
 * Keeps the change log from growing without end. `sync_change` already holds one entry per row (a later change
 * replaces the earlier one); what is left to grow is deletions, whose tombstones every device must see once, and
 * the replay records of mutations (`applied_mutation`). After the retention period:
 * - a tombstone is removed, and the organisation's `sync_compaction.throughSeq` moves up to it, so that a device
 *   whose checkpoint is older starts again from nothing (pull's `reset`); the phone keeps its unsent changes through
 *   that, and pushes them before it pulls, against the checkpoint the server still holds for it;
 * - a replay record is removed once its device has pulled since (a phone pulls only after every push has its
 *   answer, so that mutation can never come again) or when a server writer made it (never replayed).
 * The deleted row itself stays, as the record of what was there. It works on the bookkeeping tables alone, so
 * every entity in the registry is covered as it is added.
 */
@Injectable()
export class ChangeLogCompaction implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('ChangeLogCompaction');
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<CompactionReport> | null = null;

  constructor(
    private readonly queue: WriteQueue,
    @Inject(syncConfig.KEY) private readonly config: ConfigType<typeof syncConfig>,
  ) {}

  onApplicationBootstrap(): void {
    if (!this.config.compactionIntervalMinutes) return;
    this.timer = setInterval(() => {
      void this.compact().catch((err) => this.logger.warn(`Compaction stopped: ${(err as Error).message}`));
    }, this.config.compactionIntervalMinutes * 60_000);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    await this.running?.catch(() => undefined);
  }

  /** Compacts one organisation's log, or every one; one run at a time, a second call waits for it and runs after. */
  async compact(options: { organisationId?: string; now?: Date } = {}): Promise<CompactionReport> {
    while (this.running) await this.running.catch(() => undefined);
    this.running = this.run(options);
    try {
      return await this.running;
    } finally {
      this.running = null;
    }
  }

  private async run({ organisationId, now = new Date() }: { organisationId?: string; now?: Date }): Promise<CompactionReport> {
    const before = new Date(now.getTime() - this.config.retentionDays * DAY_MS);
    let tombstones = 0;
    for (let removed = CHUNK; removed === CHUNK; tombstones += removed) {
      removed = await this.queue.run((em) => this.removeTombstones(em, before, organisationId));
    }
    let replayRecords = 0;
    for (let removed = CHUNK; removed === CHUNK; replayRecords += removed) {
      removed = await this.queue.run((em) => this.removeReplayRecords(em, before, organisationId));
    }
    if (tombstones || replayRecords) this.logger.log(`Compacted ${tombstones} tombstones and ${replayRecords} replay records from before ${before.toISOString()}`);
    return { before: before.toISOString(), tombstones, replayRecords };
  }

  /** The oldest tombstones first, so that each organisation's floor only ever moves up past what is gone. */
  private async removeTombstones(em: EntityManager, before: Date, organisationId: string | undefined): Promise<number> {
    const entries = await em.find(SyncChange, {
      select: { seq: true, organisationId: true },
      where: { deleted: true, changedAt: LessThan(before), ...(organisationId ? { organisationId } : {}) },
      order: { seq: 'ASC' },
      take: CHUNK,
    });
    if (!entries.length) return 0;
    const floors = new Map<string, number>();
    for (const e of entries) floors.set(e.organisationId, Math.max(floors.get(e.organisationId) ?? 0, e.seq));
    const known = new Map((await selectMany(em, SyncCompaction, 'organisationId', [...floors.keys()])).map((c) => [c.organisationId, c.throughSeq]));
    // The floor is written before the entries go, in the same transaction: no pull sees one without the other.
    for (const [org, seq] of floors) {
      const throughSeq = Math.max(seq, known.get(org) ?? 0);
      if (known.has(org)) await em.update(SyncCompaction, { organisationId: org }, { throughSeq, compactedAt: new Date() });
      else await em.insert(SyncCompaction, { organisationId: org, throughSeq, compactedAt: new Date() });
    }
    const seqs = entries.map((e) => e.seq);
    for (let i = 0; i < seqs.length; i += 500) await em.delete(SyncChange, { seq: In(seqs.slice(i, i + 500)) });
    return entries.length;
  }

  private async removeReplayRecords(em: EntityManager, before: Date, organisationId: string | undefined): Promise<number> {
    const qb = em
      .getRepository(AppliedMutation)
      .createQueryBuilder('a')
      .select('a.mutationId', 'mutationId')
      .where('a.appliedAt < :before', { before })
      .andWhere(new Brackets((b) => b
        .where('a.deviceId IN (:...servers)', { servers: [...SERVER_DEVICE_IDS] })
        .orWhere('EXISTS (SELECT 1 FROM "sync_device" "d" WHERE "d"."deviceId" = "a"."deviceId" AND "d"."lastPullAt" > "a"."appliedAt")')))
      .limit(CHUNK);
    if (organisationId) qb.andWhere('a.organisationId = :organisationId', { organisationId });
    const ids = (await qb.getRawMany<{ mutationId: string }>()).map((r) => r.mutationId);
    for (let i = 0; i < ids.length; i += 500) await em.delete(AppliedMutation, { mutationId: In(ids.slice(i, i + 500)) });
    return ids.length;
  }

  /** Where an organisation's log has been compacted to: a device checkpoint below it must start again. */
  static async floorOf(em: EntityManager, organisationId: string): Promise<number> {
    const [row] = await selectMany(em, SyncCompaction, 'organisationId', [organisationId]);
    return row?.throughSeq ?? 0;
  }
}
