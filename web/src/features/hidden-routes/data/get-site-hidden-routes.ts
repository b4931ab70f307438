import { useLiveQuery } from 'dexie-react-hooks';
import { type AreaRow, type CableRunRow, type CircuitRow, db, type PhotoMarkupRow, type PhotoRow } from '@/lib/db';

export interface SiteHiddenRoutesOnPhone {
  entries: Array<{ photo: PhotoRow; markup: PhotoMarkupRow }>;
  areas: AreaRow[];
  cables: CableRunRow[];
  circuits: CircuitRow[];
  /** sha256 of the photos whose bytes this phone keeps. */
  kept: Set<string>;
}

const live = <T extends { voidedAt?: string | null }>(rows: T[]) => rows.filter((r) => !r.voidedAt);

/** Every marked photo of a site as this phone holds it: the map of hidden routes works with no signal. */
export async function getSiteHiddenRoutes(siteId: string): Promise<SiteHiddenRoutesOnPhone> {
  const [markups, areas, cables, circuits] = await Promise.all([
    db.photoMarkup.where('siteId').equals(siteId).toArray(),
    db.area.where('siteId').equals(siteId).toArray(),
    db.cableRun.where('siteId').equals(siteId).toArray(),
    db.circuit.where('siteId').equals(siteId).toArray(),
  ]);
  const drawn = live(markups).filter((m) => (m.routes ?? []).length > 0);
  const photos = new Map(live(await db.photo.bulkGet(drawn.map((m) => m.photoId)).then((rows) => rows.filter((p): p is PhotoRow => !!p))).map((p) => [p.id, p]));
  const entries = drawn.flatMap((markup) => {
    const photo = photos.get(markup.photoId);
    return photo ? [{ photo, markup }] : [];
  });
  const hashes = [...new Set(entries.map((e) => e.photo.sha256).filter((h): h is string => !!h))];
  const blobs = await db.photoBlobs.bulkGet(hashes);
  const kept = new Set(blobs.filter((b) => b && b.state !== 'freed' && b.bytes).map((b) => b!.sha256));
  return { entries, areas, cables: live(cables), circuits, kept };
}

export function useSiteHiddenRoutes(siteId: string): SiteHiddenRoutesOnPhone | undefined {
  return useLiveQuery(() => getSiteHiddenRoutes(siteId), [siteId]);
}

/** A photo's bytes as this phone keeps them, for a card on the map. */
export function useKeptPhoto(sha256: string | null | undefined): { bytes: ArrayBuffer; mime: string } | null | undefined {
  return useLiveQuery(async () => {
    const blob = sha256 ? await db.photoBlobs.get(sha256) : undefined;
    return blob && blob.state !== 'freed' && blob.bytes ? { bytes: blob.bytes, mime: blob.mime } : null;
  }, [sha256]);
}
