import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { type Conflict, type ConflictPage, fieldError, formatHlc, isFieldValue, isSyncEntity, SYNC_ENTITIES, type SyncEntityName } from '@wiretrail/core';
import { type EntityManager, In, IsNull, Not } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { PrintedRecord } from '../paperwork/entities/printed-record.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { SyncEngine } from '../sync/sync-engine.service.js';
import { toConflictReply } from '../sync/sync.service.js';
import { conflictSubjects } from './conflict-subjects.js';
import type { ListConflictsQueryDto } from './dto/list-conflicts-query.dto.js';
import type { ResolveConflictDto } from './dto/resolve-conflict.dto.js';

@Injectable()
export class ConflictsService {
  constructor(
    private readonly queue: WriteQueue,
    private readonly engine: SyncEngine,
  ) {}

  async list(user: AuthUser, q: ListConflictsQueryDto): Promise<ConflictPage> {
    // Conflicts are only ever about synced entities: any other name has none.
    const entity = q.entity ? (isSyncEntity(q.entity) ? q.entity : null) : undefined;
    if (entity === null) return { items: [], total: 0, page: q.page, pageSize: q.pageSize };
    const [rows, total] = await this.queue.read(async (em) => {
      const rowIds = q.jobId ? await this.rowsOfJob(em, user.organisationId, q.jobId) : null;
      const where = {
        organisationId: user.organisationId,
        resolvedAt: q.resolved ? Not(IsNull()) : IsNull(),
        ...(entity ? { entity } : {}),
        ...(q.rowId ? { rowId: q.rowId } : {}),
        ...(rowIds ? { rowId: In(q.rowId ? rowIds.filter((id) => id === q.rowId) : rowIds) } : {}),
      };
      const [found, count] = await syncRepository(em, 'conflict').findAndCount({ where, order: { version: 'DESC' }, skip: (q.page - 1) * q.pageSize, take: q.pageSize });
      return [await this.named(em, user.organisationId, found), count] as const;
    });
    return { items: rows, total, page: q.page, pageSize: q.pageSize };
  }

  /**
   * The rows a job's conflicts can be about: the job, its visits, what was recorded on them, the cable runs last
   * recorded on them, and every record its documents print. Deleted rows count too, since a deletion can be what conflicted.
   */
  private async rowsOfJob(em: EntityManager, organisationId: string, jobId: string): Promise<string[]> {
    const ids = async (entity: SyncEntityName, where: Record<string, unknown>) =>
      (await em.getRepository<SyncRecord>(entity).find({ where: { organisationId, ...where }, select: { id: true }, withDeleted: true })).map((r) => r.id);
    const visitIds = await ids('visit', { jobId });
    const recorded: string[] = [];
    if (visitIds.length) {
      // One query at a time: they share the transaction's connection.
      for (const e of ['photo', 'note', 'pointChange', 'testResult'] as const) recorded.push(...(await ids(e, { visitId: In(visitIds) })));
      recorded.push(...(await ids('cableRun', { lastVisitId: In(visitIds) })));
    }
    // And what the job's documents print, site-wide records included (the site's earthing, a board, a circuit).
    const documentIds = await ids('document', { jobId });
    if (documentIds.length) recorded.push(...(await em.findBy(PrintedRecord, { organisationId, documentId: In(documentIds) })).map((p) => p.rowId));
    return [...new Set([jobId, ...visitIds, ...recorded])];
  }

  async findOne(user: AuthUser, id: string): Promise<Conflict> {
    const row = await this.queue.read(async (em) => {
      const found = await syncRepository(em, 'conflict').findOneBy({ id, organisationId: user.organisationId });
      return found ? (await this.named(em, user.organisationId, [found]))[0]! : null;
    });
    if (!row) throw new NotFoundException('No such conflict.');
    return row;
  }

  /** The replies, each naming in words the record it is about. */
  private async named(em: EntityManager, organisationId: string, rows: SyncRecord<'conflict'>[]): Promise<Conflict[]> {
    const subjects = await conflictSubjects(em, organisationId, rows);
    return rows.map((r) => ({ ...toConflictReply(r), subject: subjects.get(`${r.entity}:${r.rowId}`) }));
  }

  /**
   * Settles a conflict: the chosen value is written through the sync engine as the office's own edit,
   * so every device receives it like any other change.
   */
  async resolve(user: AuthUser, id: string, dto: ResolveConflictDto): Promise<Conflict> {
    return this.queue.run(async (em) => {
      const conflict = await syncRepository(em, 'conflict').findOneBy({ id, organisationId: user.organisationId });
      if (!conflict) throw new NotFoundException('No such conflict.');
      if (conflict.resolvedAt) throw new ConflictException('This conflict was already settled.');
      const { entity, field } = conflict;
      const actor = { userId: user.id, organisationId: user.organisationId, role: user.role, deviceId: 'office' };
      const wantsChange = dto.choice !== 'kept';
      if (wantsChange && conflict.reason === 'locked-by-document') {
        throw new ConflictException('This record is behind an issued document; keep the recorded value, or issue a new document to change it.');
      }
      if (wantsChange && isSyncEntity(entity)) {
        const row = await syncRepository(em, entity).findOne({ where: { id: conflict.rowId }, withDeleted: true });
        if (!row) throw new NotFoundException('The record this conflict is about no longer exists.');
        const hlc = formatHlc({ ms: Date.now(), counter: 0, deviceId: 'office' });
        const base = { mutationId: uuidv7(), entity, id: row.id, baseVersion: row.version, hlc };
        let mutation;
        if (field === '*') {
          mutation = { ...base, delete: true as const };
        } else {
          const value = dto.choice === 'value' ? dto.value : conflict.discardedValue;
          const problem = SYNC_ENTITIES[entity].fields[field] ? fieldError(entity, field, value) : `${entity}.${field} cannot be set`;
          if (problem) throw new ConflictException(problem);
          // Both choices arrived as JSON, so this holds; the check lets the value travel typed.
          if (!isFieldValue(value)) throw new ConflictException(`${entity}.${field} must be a JSON value`);
          mutation = { ...base, set: { [field]: value } };
        }
        const [result] = await this.engine.applyAll(em, actor, [mutation]);
        if (result!.status === 'rejected') throw new ConflictException(result!.error);
      }
      await this.engine.serverWrite(em, actor, 'conflict', [{
        row: conflict,
        changes: {
          resolvedAt: new Date(),
          resolvedById: user.id,
          resolution: { choice: dto.choice, ...(dto.choice === 'value' ? { value: dto.value } : {}) },
        },
      }]);
      return (await this.named(em, user.organisationId, [await syncRepository(em, 'conflict').findOneByOrFail({ id })]))[0]!;
    });
  }
}
