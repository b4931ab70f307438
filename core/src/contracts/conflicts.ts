import type { SyncEntityName } from '../sync/entities.js';

/** Why a value was not kept: settled by the merge, or refused because the record is locked. */
export type ConflictReason = 'later-edit-wins' | 'office-owned' | 'edit-beats-delete' | 'locked-by-document' | 'locked-by-sign-off';

/**
 * A conflict's own fields. Conflicts are made by the server only, so the field registry does not list them.
 * `When` is how a time travels: a Date where the server stores it, ISO text in a reply.
 */
// A type rather than an interface, so that a stored conflict reads as a row of fields by name where the engine needs one.
export type ConflictFields<When = string> = {
  entity: SyncEntityName;
  rowId: string;
  /** The field whose value was not kept; `*` for a deletion. */
  field: string;
  reason: ConflictReason;
  baseVersion: number;
  keptValue: unknown;
  keptById: string | null;
  keptHlc: string | null;
  discardedValue: unknown;
  discardedById: string | null;
  discardedHlc: string | null;
  discardedDeviceId: string | null;
  resolvedAt: When | null;
  resolvedById: string | null;
  resolution: unknown;
};

/** Which record a conflict is about, in words: "Circuit 2 · Sockets, first floor", on "board Consumer unit", "Orchard Rise", "Hannah Greaves". */
export interface ConflictSubject {
  title: string;
  context: string[];
}

/** A conflict as `GET /api/conflicts` and `POST /api/conflicts/:id/resolve` answer it. */
export type Conflict = ConflictFields & {
  /** Given by the office's list and answers; absent where only the stored row is at hand. */
  subject?: ConflictSubject;
  id: string;
  version: number;
  fieldVersions?: Record<string, number>;
  createdAt?: string;
  updatedAt?: string;
  createdById?: string | null;
  updatedById?: string | null;
};

export interface ConflictPage {
  items: Conflict[];
  total: number;
  page: number;
  pageSize: number;
}

/** What the office chose for a conflict (`POST /api/conflicts/:id/resolve`). */
export type ConflictResolution = { choice: 'kept' } | { choice: 'discarded' } | { choice: 'value'; value: unknown };
