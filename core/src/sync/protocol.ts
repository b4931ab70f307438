import type { SyncEntityName } from './entities.js';

/** Field values travel as JSON. */
export type FieldValue = string | number | boolean | null | FieldValue[] | { [key: string]: FieldValue };

/** Whether a value survives the trip as JSON unchanged: plain objects and lists of text, finite numbers, booleans and null. */
export function isFieldValue(value: unknown): value is FieldValue {
  if (value === null || typeof value === 'string' || typeof value === 'boolean') return true;
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(isFieldValue);
  if (typeof value !== 'object') return false;
  // A Date, a Map or a class instance would arrive as something else, or as nothing.
  const proto: unknown = Object.getPrototypeOf(value);
  return (proto === Object.prototype || proto === null) && Object.values(value).every(isFieldValue);
}

/** One change made on a device, pushed through `POST /api/sync/push`. */
export interface Mutation {
  /** Made on the device (UUIDv7); the server applies each one exactly once. */
  mutationId: string;
  entity: SyncEntityName;
  id: string;
  /** The row version the device last saw; 0 for a row it created. */
  baseVersion: number;
  set?: Record<string, FieldValue>;
  delete?: true;
  hlc: string;
}

export interface PushRequest {
  deviceId: string;
  mutations: Mutation[];
}

export type MutationStatus = 'applied' | 'merged' | 'rejected';

export interface MutationResult {
  mutationId: string;
  status: MutationStatus;
  version?: number;
  fieldVersions?: Record<string, number>;
  conflictIds?: string[];
  /** The issued document that holds the row, by number, when the change was kept back for that reason. */
  heldBy?: string;
  error?: string;
}

export interface PushResponse {
  results: MutationResult[];
}

/** A row as the server holds it, as sent by pull. */
export interface SyncedRow {
  id: string;
  version: number;
  fieldVersions: Record<string, number>;
  [field: string]: unknown;
}

export interface Change {
  entity: SyncEntityName;
  id: string;
  version: number;
  /** A deletion, or the row left this user's scope: the device drops it. */
  deleted: boolean;
  row: SyncedRow | null;
}

export interface PullResponse {
  changes: Change[];
  checkpoint: number;
  hasMore: boolean;
  /** The device must clear its synced tables (keeping its outbox) and pull from 0. */
  reset?: boolean;
}

/** Largest batch a push may carry; larger gets 413. */
export const MAX_PUSH_MUTATIONS = 500;
/** Largest page a pull returns. */
export const MAX_PULL_LIMIT = 1000;
