import { type ConflictFields, type FieldStamp, type FieldType, type RowOf, SYNC_ENTITIES, SYNC_ENTITY_NAMES, type SyncEntityName } from '@wiretrail/core';
import { type EntityManager, EntitySchema, type EntitySchemaColumnOptions, type Repository } from 'typeorm';
import { TIMESTAMP } from '../../database/column-types.js';

/** The bookkeeping every synced row carries beside its own fields. */
export type SyncBookkeeping = {
  id: string;
  organisationId: string;
  version: number;
  fieldMeta: Record<string, FieldStamp>;
  deletedAt: Date | null;
  createdById: string | null;
  updatedById: string | null;
  createdAt: Date;
  updatedAt: Date;
};

/**
 * A synced row as stored: the registry's fields of the entity plus the bookkeeping. Without an entity it is the
 * loose row the sync engine walks field by field.
 */
export type SyncRecord<E extends SyncEntityName | undefined = undefined> = SyncBookkeeping &
  (E extends 'conflict' ? ConflictFields<Date> : E extends SyncEntityName ? RowOf<E> : { [field: string]: unknown });

function columnFor(type: FieldType, required: boolean): EntitySchemaColumnOptions {
  const nullable = !required;
  switch (type.kind) {
    case 'string':
      return type.max > 2000 ? { type: 'text', nullable } : { type: 'varchar', length: type.max, nullable };
    case 'number':
      return { type: 'float', nullable };
    case 'integer':
      return { type: 'integer', nullable };
    case 'boolean':
      return { type: 'boolean', nullable };
    case 'datetime':
      // Kept as the ISO string the device sent, so a value round-trips unchanged through sync.
      return { type: 'varchar', length: 30, nullable };
    case 'ref':
      return { type: 'varchar', length: 36, nullable };
    case 'enum':
      return { type: 'varchar', length: 40, nullable };
    case 'refs':
    case 'json':
      return { type: 'simple-json', nullable };
  }
}

const COMMON_COLUMNS: Record<string, EntitySchemaColumnOptions> = {
  id: { type: 'varchar', length: 36, primary: true },
  organisationId: { type: 'varchar', length: 36 },
  version: { type: 'integer' },
  fieldMeta: { type: 'simple-json' },
  deletedAt: { type: TIMESTAMP, nullable: true },
  createdById: { type: 'varchar', length: 36, nullable: true },
  updatedById: { type: 'varchar', length: 36, nullable: true },
  createdAt: { type: TIMESTAMP, createDate: true },
  updatedAt: { type: TIMESTAMP, updateDate: true },
};

/** Conflicts are made by the server only; they sync to office devices like any other row. */
const CONFLICT_COLUMNS: Record<string, EntitySchemaColumnOptions> = {
  entity: { type: 'varchar', length: 40 },
  rowId: { type: 'varchar', length: 36 },
  field: { type: 'varchar', length: 60 },
  reason: { type: 'varchar', length: 30 },
  baseVersion: { type: 'integer' },
  keptValue: { type: 'simple-json', nullable: true },
  keptById: { type: 'varchar', length: 36, nullable: true },
  keptHlc: { type: 'varchar', length: 120, nullable: true },
  discardedValue: { type: 'simple-json', nullable: true },
  discardedById: { type: 'varchar', length: 36, nullable: true },
  discardedHlc: { type: 'varchar', length: 120, nullable: true },
  discardedDeviceId: { type: 'varchar', length: 64, nullable: true },
  resolvedAt: { type: TIMESTAMP, nullable: true },
  resolvedById: { type: 'varchar', length: 36, nullable: true },
  resolution: { type: 'simple-json', nullable: true },
};

/**
 * Indexes for the office's lists, where their query plans showed whole-table scans on five years of data
 * (`npm run bench -- scale`): a page of jobs reads its visits and documents by job, the jobs table filters by
 * status in date order, and the conflicts inbox reads the open ones newest first.
 */
const LIST_INDEXES: Partial<Record<SyncEntityName, Array<{ name: string; columns: string[] }>>> = {
  job: [{ name: 'IDX_job_status_created', columns: ['organisationId', 'status', 'createdAt'] }],
  visit: [{ name: 'IDX_visit_job', columns: ['jobId'] }],
  document: [{ name: 'IDX_document_job', columns: ['jobId'] }],
  conflict: [{ name: 'IDX_conflict_open', columns: ['organisationId', 'resolvedAt', 'version'] }],
};

function buildSchema(name: SyncEntityName): EntitySchema<SyncRecord> {
  const spec = SYNC_ENTITIES[name];
  const own = Object.fromEntries(Object.entries(spec.fields).map(([field, f]) => [field, columnFor(f.type, !!f.required)]));
  const indices = [{ name: `IDX_${spec.table}_organisation_version`, columns: ['organisationId', 'version'] }];
  if (spec.siteField === 'siteId') indices.push({ name: `IDX_${spec.table}_site`, columns: ['siteId'] });
  if (spec.visitField === 'visitId') indices.push({ name: `IDX_${spec.table}_visit`, columns: ['visitId'] });
  indices.push(...(LIST_INDEXES[name] ?? []));
  return new EntitySchema<SyncRecord>({
    name,
    tableName: spec.table,
    columns: { ...COMMON_COLUMNS, ...(name === 'conflict' ? CONFLICT_COLUMNS : own) },
    indices,
  });
}

/** Each entity's schema, typed with its own row: `em.getRepository(SYNC_SCHEMAS.job)` reads `SyncRecord<'job'>`. */
export const SYNC_SCHEMAS: { readonly [E in SyncEntityName]: EntitySchema<SyncRecord<E>> } = {
  customer: buildSchema('customer'),
  site: buildSchema('site'),
  area: buildSchema('area'),
  board: buildSchema('board'),
  circuit: buildSchema('circuit'),
  job: buildSchema('job'),
  visit: buildSchema('visit'),
  photo: buildSchema('photo'),
  note: buildSchema('note'),
  cableRun: buildSchema('cableRun'),
  pointChange: buildSchema('pointChange'),
  testResult: buildSchema('testResult'),
  document: buildSchema('document'),
  conflict: buildSchema('conflict'),
  priceItem: buildSchema('priceItem'),
  materialLine: buildSchema('materialLine'),
  linkTest: buildSchema('linkTest'),
  photoMarkup: buildSchema('photoMarkup'),
};

export const ALL_SYNC_SCHEMAS = SYNC_ENTITY_NAMES.map((n) => SYNC_SCHEMAS[n]);

/** The repository of one synced entity, with its rows typed from the registry. */
export function syncRepository<E extends SyncEntityName>(em: EntityManager, entity: E): Repository<SyncRecord<E>> {
  return em.getRepository(SYNC_SCHEMAS[entity]);
}

/** A loose row's field as text, or null when it holds none: the engine reads ids this way without trusting a cast. */
export const textOrNull = (value: unknown): string | null => (typeof value === 'string' ? value : null);
