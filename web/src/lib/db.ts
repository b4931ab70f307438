import { type ConflictFields, type DraftRowOf, type FieldValue, type Mutation, SYNC_ENTITY_NAMES, type SyncEntityName } from '@wiretrail/core';
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

/** Any synced row as the screens read it, field by field: for code that works on every entity (sync, outbox). */
export interface LocalRow {
  id: string;
  createdAt?: string;
  updatedAt?: string;
  _base: RowBase;
  [field: string]: unknown;
}

/**
 * A synced row of one entity as the screens read it: the field registry's fields, the server's view and this
 * phone's unsent changes on top. Optional fields may be absent on a row made on this phone.
 */
export type LocalRowOf<E extends SyncEntityName> = (E extends 'conflict' ? { id: string } & ConflictFields : DraftRowOf<E>) & {
  createdAt?: string;
  updatedAt?: string;
  /** Who made the row, as the server recorded it (absent until it has been pulled). */
  createdById?: string | null;
  updatedById?: string | null;
  _base: RowBase;
};

export type CustomerRow = LocalRowOf<'customer'>;
export type SiteRow = LocalRowOf<'site'>;
export type JobRow = LocalRowOf<'job'>;
export type VisitRow = LocalRowOf<'visit'>;
export type AreaRow = LocalRowOf<'area'>;
export type BoardRow = LocalRowOf<'board'>;
export type CircuitRow = LocalRowOf<'circuit'>;
export type CableRunRow = LocalRowOf<'cableRun'>;
export type PointChangeRow = LocalRowOf<'pointChange'>;
export type TestResultRow = LocalRowOf<'testResult'>;
/** `uploadState`: 'waiting' until the server has the bytes and has made its sizes ('ready'), or 'refused'. */
export type PhotoRow = LocalRowOf<'photo'>;
export type NoteRow = LocalRowOf<'note'>;
export type DocumentRow = LocalRowOf<'document'>;
export type ConflictRow = LocalRowOf<'conflict'>;
export type PriceItemRow = LocalRowOf<'priceItem'>;
export type MaterialLineRow = LocalRowOf<'materialLine'>;
export type LinkTestRow = LocalRowOf<'linkTest'>;
/** Routes drawn over a photo: the photo itself never changes. */
export type PhotoMarkupRow = LocalRowOf<'photoMarkup'>;

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

/**
 * Where a photo's bytes stand on this phone: waiting to reach the server, confirmed there (still kept here),
 * freed (confirmed, and the full-size bytes dropped to save space; the thumbnail stays), or refused by the server.
 */
export type PhotoBlobState = 'waiting' | 'confirmed' | 'freed' | 'refused';

/** A photo's bytes as sent, keyed by their sha256. ArrayBuffer, never Blob: storing Blobs fails on some iPhones. */
export interface PhotoBlobRow {
  sha256: string;
  mime: string;
  /** null once freed. */
  bytes: ArrayBuffer | null;
  size: number;
  createdAt: string;
  /** Who took it: only they send it, as with the outbox. */
  userId: string;
  state: PhotoBlobState;
  confirmedAt?: string | null;
  freedAt?: string | null;
  /** The server's reason, shown as it is. */
  refusedReason?: string | null;
  /** The last failed try that will be tried again (no signal, server busy). */
  lastError?: string | null;
}

/**
 * The small JPEG made on the phone for lists. Kept apart from the bytes because IndexedDB always reads whole
 * records: a list of 300 thumbnails must not read 300 full-size photos.
 */
export interface PhotoThumbRow {
  sha256: string;
  mime: string;
  bytes: ArrayBuffer;
  width: number;
  height: number;
}

/** Where an upload was left: the server's upload URL and how far it got, so a reload carries on from there. */
export interface PhotoUploadRow {
  key: string;
  fingerprint: string;
  uploadUrl: string | null;
  parallelUploadUrls: string[] | null;
  size: number | null;
  metadata: Record<string, string>;
  creationTime: string;
  /** Bytes the server has acknowledged so far. */
  offset?: number;
}

export interface MetaValues {
  /** The one device id from before ids were per person (see lib/sync/device-id.ts). */
  deviceId: string;
  /** Per person signed in on this phone, the device id they sync under. */
  deviceIds: Record<string, string>;
  hlc: string;
  checkpoint: number;
  lastSyncAt: string;
  lastError: string | null;
  userId: string;
  persistAsked: boolean;
  persisted: boolean;
  /** Days a full-size photo stays on the phone after the server confirmed it. */
  keepOriginalsDays: number;
  /** The organisation's own photo tags, kept for use offline. */
  photoTags: string[];
}
export type MetaKey = keyof MetaValues;
export interface MetaEntry<K extends MetaKey = MetaKey> {
  key: K;
  value: MetaValues[K];
}

/** Indexed fields only: the rest of each row is stored but not indexed. Tables as first shipped (version 1). */
const ENTITY_INDEXES: Record<Exclude<SyncEntityName, 'priceItem' | 'materialLine' | 'linkTest' | 'photoMarkup'>, string> = {
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
  declare area: Table<AreaRow, string>;
  declare board: Table<BoardRow, string>;
  declare circuit: Table<CircuitRow, string>;
  declare job: Table<JobRow, string>;
  declare visit: Table<VisitRow, string>;
  declare photo: Table<PhotoRow, string>;
  declare note: Table<NoteRow, string>;
  declare cableRun: Table<CableRunRow, string>;
  declare pointChange: Table<PointChangeRow, string>;
  declare testResult: Table<TestResultRow, string>;
  declare document: Table<DocumentRow, string>;
  declare conflict: Table<ConflictRow, string>;
  declare priceItem: Table<PriceItemRow, string>;
  declare materialLine: Table<MaterialLineRow, string>;
  declare linkTest: Table<LinkTestRow, string>;
  declare photoMarkup: Table<PhotoMarkupRow, string>;
  declare outbox: Table<OutboxEntry, number>;
  declare failed: Table<FailedEntry, number>;
  declare meta: Table<MetaEntry, MetaKey>;
  declare photoBlobs: Table<PhotoBlobRow, string>;
  declare photoThumbs: Table<PhotoThumbRow, string>;
  declare photoUploads: Table<PhotoUploadRow, string>;

  constructor(name = 'wiretrail') {
    super(name);
    this.version(1).stores({
      ...ENTITY_INDEXES,
      outbox: '++seq, &mutationId, [entity+id], userId',
      failed: '++seq, mutationId, userId',
      meta: 'key',
    });
    // Photo bytes, their thumbnails and unfinished uploads, beside the synced photo rows.
    this.version(2).stores({
      photoBlobs: 'sha256, state, [state+createdAt]',
      photoThumbs: 'sha256',
      photoUploads: 'key, fingerprint',
    });
    // The price list, and the parts used on visits.
    this.version(3).stores({
      priceItem: 'id, category',
      materialLine: 'id, visitId, siteId',
    });
    // Links' performance results, found by their cable.
    this.version(4).stores({
      linkTest: 'id, visitId, siteId, cableRunId',
    });
    // Routes drawn over photos, found by their photo and by site for the map of hidden routes.
    this.version(5).stores({
      photoMarkup: 'id, photoId, visitId, siteId',
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
