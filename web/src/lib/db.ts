import { type FieldValue, type Mutation, SYNC_ENTITY_NAMES, type SyncEntityName } from '@wiretrail/core';
import Dexie, { type Table } from 'dexie';

/**
 * The server's view of a row, kept beside the values shown on the phone:
 * `version`/`fieldVersions` are the base for the next push, and `values` holds the server's value
 * of each field that still has a local change waiting to be sent (to fall back on if that change is refused).
 */
export interface RowBase {
  version: number;
  fieldVersions: Record<string, number>;
  values: Record<string, FieldValue | undefined>;
}

/** A synced row as the screens read it: the server's fields with this phone's unsent changes on top. */
export interface LocalRow {
  id: string;
  createdAt?: string;
  updatedAt?: string;
  _base: RowBase;
  [field: string]: unknown;
}

export interface CustomerRow extends LocalRow {
  name: string;
  email?: string | null;
  phone?: string | null;
  address?: string | null;
}
export interface SiteRow extends LocalRow {
  customerId: string;
  name?: string | null;
  address: string;
  postcode?: string | null;
  accessNotes?: string | null;
}
export interface JobRow extends LocalRow {
  siteId: string;
  customerId: string;
  reference?: string | null;
  title: string;
  status?: string | null;
}
export interface VisitRow extends LocalRow {
  jobId: string;
  siteId: string;
  technicianIds?: string[] | null;
  plannedStart?: string | null;
  plannedEnd?: string | null;
  status?: string | null;
}
export interface BoardRow extends LocalRow {
  siteId: string;
  name: string;
  description?: string | null;
}
export interface CircuitRow extends LocalRow {
  siteId: string;
  boardId: string;
  number: string;
  description?: string | null;
  kind?: string | null;
}
export interface NoteRow extends LocalRow {
  visitId: string;
  siteId: string;
  text: string;
}

/** A change made on this phone and not yet acknowledged by the server, in the order it was made. */
export interface OutboxEntry extends Mutation {
  seq?: number;
  /** Only the user who made a change sends it, even if someone else signs in on this phone meanwhile. */
  userId: string;
  createdAt: string;
  attempts: number;
  lastError?: string | null;
  /** For a deletion: the row as it was, put back if the server refuses the deletion. */
  restore?: LocalRow;
}

/** A change the server refused for good, kept so the user can see what and why. */
export interface FailedEntry {
  seq?: number;
  mutationId: string;
  entity: SyncEntityName;
  id: string;
  set?: Record<string, FieldValue>;
  delete?: true;
  userId: string;
  createdAt: string;
  failedAt: string;
  error: string;
}

export interface MetaValues {
  deviceId: string;
  hlc: string;
  checkpoint: number;
  lastSyncAt: string;
  lastError: string | null;
  userId: string;
  persistAsked: boolean;
  persisted: boolean;
}
export type MetaKey = keyof MetaValues;
export interface MetaEntry<K extends MetaKey = MetaKey> {
  key: K;
  value: MetaValues[K];
}

/** Indexed fields only: the rest of each row is stored but not indexed. */
const ENTITY_INDEXES: Record<SyncEntityName, string> = {
  customer: 'id',
  site: 'id, customerId',
  area: 'id, siteId',
  board: 'id, siteId',
  circuit: 'id, siteId, boardId',
  job: 'id, siteId, customerId',
  visit: 'id, jobId, siteId, plannedStart, *technicianIds',
  photo: 'id, visitId, siteId, sha256',
  note: 'id, visitId, siteId',
  cableRun: 'id, siteId',
  pointChange: 'id, visitId, siteId, circuitId',
  testResult: 'id, visitId, siteId, circuitId',
  document: 'id, jobId, siteId',
  conflict: 'id',
};

export class WiretrailDb extends Dexie {
  declare customer: Table<CustomerRow, string>;
  declare site: Table<SiteRow, string>;
  declare area: Table<LocalRow, string>;
  declare board: Table<BoardRow, string>;
  declare circuit: Table<CircuitRow, string>;
  declare job: Table<JobRow, string>;
  declare visit: Table<VisitRow, string>;
  declare photo: Table<LocalRow, string>;
  declare note: Table<NoteRow, string>;
  declare cableRun: Table<LocalRow, string>;
  declare pointChange: Table<LocalRow, string>;
  declare testResult: Table<LocalRow, string>;
  declare document: Table<LocalRow, string>;
  declare conflict: Table<LocalRow, string>;
  declare outbox: Table<OutboxEntry, number>;
  declare failed: Table<FailedEntry, number>;
  declare meta: Table<MetaEntry, MetaKey>;

  constructor(name = 'wiretrail') {
    super(name);
    this.version(1).stores({
      ...ENTITY_INDEXES,
      outbox: '++seq, &mutationId, [entity+id], userId',
      failed: '++seq, mutationId, userId',
      meta: 'key',
    });
  }

  /** The local table of a synced entity. */
  rows(entity: SyncEntityName): Table<LocalRow, string> {
    return this.table(entity);
  }

  /** Every synced table, for transactions that may touch any of them. */
  syncedTables(): Table<LocalRow, string>[] {
    return SYNC_ENTITY_NAMES.map((name) => this.rows(name));
  }

  async getMeta<K extends MetaKey>(key: K): Promise<MetaValues[K] | undefined> {
    return (await this.meta.get(key))?.value as MetaValues[K] | undefined;
  }

  async setMeta<K extends MetaKey>(key: K, value: MetaValues[K]): Promise<void> {
    await this.meta.put({ key, value } as MetaEntry);
  }
}

export const db = new WiretrailDb();
