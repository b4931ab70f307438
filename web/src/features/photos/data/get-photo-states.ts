import { useLiveQuery } from 'dexie-react-hooks';
import { db, type PhotoBlobState } from '@/lib/db';
import { setKeepOriginalsDays } from '@/lib/photos/free-originals';

export interface PhotoStates {
  /** Where each photo's bytes stand on this phone, by sha256. */
  bySha: Map<string, { state: PhotoBlobState; reason?: string | null }>;
  /** How far an unfinished upload got (0–1), by sha256. */
  partly: Map<string, number>;
}

const FINGERPRINT = /^wiretrail-([0-9a-f]{64})$/;
const STATES: PhotoBlobState[] = ['waiting', 'confirmed', 'freed'];

/** Read from the indexes and the small upload table only: no photo bytes are loaded to draw a badge. */
export async function getPhotoStates(): Promise<PhotoStates> {
  const [keyLists, refused, uploads] = await Promise.all([
    Promise.all(STATES.map((s) => db.photoBlobs.where('state').equals(s).primaryKeys())),
    // Rare, and they carry the reason to show.
    db.photoBlobs.where('state').equals('refused').toArray(),
    db.photoUploads.toArray(),
  ]);
  const bySha = new Map<string, { state: PhotoBlobState; reason?: string | null }>();
  STATES.forEach((state, i) => keyLists[i]!.forEach((sha) => bySha.set(sha as string, { state })));
  for (const r of refused) bySha.set(r.sha256, { state: 'refused', reason: r.refusedReason });
  const partly = new Map<string, number>();
  for (const u of uploads) {
    const sha = FINGERPRINT.exec(u.fingerprint)?.[1];
    if (sha && u.size && u.offset) partly.set(sha, u.offset / u.size);
  }
  return { bySha, partly };
}

export function usePhotoStates(): PhotoStates | undefined {
  return useLiveQuery(getPhotoStates, []);
}

export interface PhotoStorageSummary {
  waiting: number;
  waitingBytes: number;
  refused: { sha256: string; reason: string; caption: string | null }[];
  /** Full-size photos still on the phone (waiting, refused, or confirmed and not yet freed). */
  kept: number;
  keptBytes: number;
  keepOriginalsDays: number | undefined;
}

/** For the Sync page: what is waiting and what the phone holds, sized from the photo rows (no bytes are read). */
export async function getPhotoStorageSummary(userId: string): Promise<PhotoStorageSummary> {
  const [waiting, confirmed, refusedRows, days] = await Promise.all([
    db.photoBlobs.where('state').equals('waiting').primaryKeys(),
    db.photoBlobs.where('state').equals('confirmed').primaryKeys(),
    db.photoBlobs.where('state').equals('refused').toArray(),
    db.getMeta('keepOriginalsDays'),
  ]);
  const mine = refusedRows.filter((r) => r.userId === userId);
  const hashes = [...waiting, ...confirmed, ...mine.map((r) => r.sha256)] as string[];
  const rows = hashes.length ? await db.photo.where('sha256').anyOf(hashes).toArray() : [];
  const size = new Map<string, number>();
  const caption = new Map<string, string | null>();
  for (const r of rows) {
    if (!r.sha256) continue;
    size.set(r.sha256, Number(r.sizeBytes) || 0);
    if (!caption.get(r.sha256)) caption.set(r.sha256, r.caption ?? null);
  }
  for (const r of mine) size.set(r.sha256, r.size);
  const sum = (list: readonly unknown[]) => list.reduce<number>((total, sha) => total + (size.get(sha as string) ?? 0), 0);
  return {
    waiting: waiting.length,
    waitingBytes: sum(waiting),
    refused: mine.map((r) => ({ sha256: r.sha256, reason: r.refusedReason ?? 'Refused by the office system.', caption: caption.get(r.sha256) ?? null })),
    kept: hashes.length,
    keptBytes: sum(hashes),
    keepOriginalsDays: days,
  };
}

export function usePhotoStorageSummary(userId: string): PhotoStorageSummary | undefined {
  return useLiveQuery(() => getPhotoStorageSummary(userId), [userId]);
}

/** Keeps full-size photos that long after the office has them; answers how many were freed now. */
export const keepOriginalsFor = (days: number): Promise<number> => setKeepOriginalsDays(db, days);
