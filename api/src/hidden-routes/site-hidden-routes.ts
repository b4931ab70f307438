import { type MarkedRoute, unvoided } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import { inTurn } from '../common/in-turn.js';
import { live } from '../paperwork/job-file.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';

export interface LoadedMarkedPhoto {
  photo: SyncRecord<'photo'>;
  markup: SyncRecord<'photoMarkup'>;
}

export interface LoadedHiddenRoutes {
  entries: LoadedMarkedPhoto[];
  /** Marked photos whose bytes have not reached the server yet. */
  waiting: number;
  areas: SyncRecord<'area'>[];
  cables: SyncRecord<'cableRun'>[];
  circuits: SyncRecord<'circuit'>[];
}

const hasRoutes = (m: SyncRecord<'photoMarkup'>) => Array.isArray(m.routes) && m.routes.some((r: MarkedRoute) => r.points.length >= 2);

/**
 * Every marked photo of a site, newest first: markups with a route drawn, neither they nor their photos voided, and,
 * when `held` is asked for, only photos whose bytes the server has (a document can print no others).
 */
export async function loadSiteHiddenRoutes(em: EntityManager, organisationId: string, siteId: string, held = false): Promise<LoadedHiddenRoutes> {
  const where = { siteId, ...live(organisationId) };
  const [markups, areas, cables, circuits] = await inTurn(
    () => syncRepository(em, 'photoMarkup').find({ where }),
    () => syncRepository(em, 'area').find({ where }),
    () => syncRepository(em, 'cableRun').find({ where }),
    () => syncRepository(em, 'circuit').find({ where }),
  );
  const drawn = unvoided(markups).filter(hasRoutes);
  const photos = drawn.length ? unvoided(await syncRepository(em, 'photo').find({ where: { id: In(drawn.map((m) => m.photoId)), ...live(organisationId) } })) : [];
  let have: Set<string> | null = null;
  if (held) {
    const hashes = [...new Set(photos.map((p) => p.sha256).filter((h): h is string => typeof h === 'string'))];
    const blobs = hashes.length ? await em.find(PhotoBlob, { where: { organisationId, sha256: In(hashes) }, select: { sha256: true } }) : [];
    have = new Set(blobs.map((b) => b.sha256));
  }
  const byId = new Map(photos.map((p) => [p.id, p]));
  const all = drawn.flatMap((markup) => {
    const photo = byId.get(markup.photoId);
    return photo ? [{ photo, markup }] : [];
  });
  const entries = have ? all.filter((e) => e.photo.sha256 !== null && have.has(e.photo.sha256)) : all;
  const when = (e: LoadedMarkedPhoto) => String(e.photo.takenAt ?? e.photo.createdAt.toISOString());
  entries.sort((a, b) => when(b).localeCompare(when(a)) || b.photo.id.localeCompare(a.photo.id));
  return { entries, waiting: all.length - entries.length, areas, cables: unvoided(cables), circuits };
}
