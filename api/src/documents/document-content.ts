import { assessCableRun, type CableRunAssessment, judgeMinorWorks, type MinorWorksJudgement, type RuleSet } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import { inTurn } from '../common/in-turn.js';
import { type JobFile, jobVisits, live } from '../paperwork/job-file.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { User } from '../users/entities/user.entity.js';

export interface MinorWorksContent extends MinorWorksJudgement<SyncRecord<'visit'>, SyncRecord<'testResult'>, SyncRecord<'circuit'>> {
  boards: Map<string, string>;
}

/** The records behind a minor works certificate, judged; see judgeMinorWorks for when it may be issued. */
export async function loadMinorWorks(em: EntityManager, file: JobFile, rules: RuleSet): Promise<MinorWorksContent> {
  const org = file.organisation.id;
  const visits = await jobVisits(em, file);
  const visitIds = visits.map((v) => v.id);
  const [tests, pointChanges, circuits, boards] = await inTurn(
    () => visitIds.length ? syncRepository(em, 'testResult').find({ where: { visitId: In(visitIds), ...live(org) } }) : [],
    () => visitIds.length ? syncRepository(em, 'pointChange').find({ where: { visitId: In(visitIds), ...live(org) } }) : [],
    () => syncRepository(em, 'circuit').find({ where: { siteId: file.site.id, ...live(org) } }),
    () => syncRepository(em, 'board').find({ where: { siteId: file.site.id, organisationId: org } }),
  );
  const judgement = judgeMinorWorks({ visits, tests, pointChanges, circuits, earthing: file.site.earthing ?? null }, rules);
  return { ...judgement, boards: new Map(boards.map((b) => [b.id, b.name])) };
}

export interface ScheduledCable {
  run: SyncRecord<'cableRun'>;
  assessment: CableRunAssessment;
}

/** The site's cable schedule, every run judged again from its recorded wiremap and length, by label. */
export async function loadCableSchedule(em: EntityManager, file: JobFile, rules: RuleSet): Promise<ScheduledCable[]> {
  const runs = await syncRepository(em, 'cableRun').find({ where: { siteId: file.site.id, ...live(file.organisation.id) } });
  return runs
    .sort((a, b) => a.label.localeCompare(b.label, 'en-GB', { numeric: true }))
    .map((run) => ({
      run,
      assessment: assessCableRun({ medium: run.medium, scheme: run.scheme, wiremap: run.wiremap, lengthM: run.lengthM, linkKind: run.linkKind }, rules),
    }));
}

/** A photo whose bytes are on the server. */
export type HeldPhoto = SyncRecord<'photo'> & { sha256: string };

export interface RecordedPhoto {
  photo: HeldPhoto;
  takenBy: string;
}

export interface PhotoRecordContent {
  photos: RecordedPhoto[];
  /** Photos whose bytes have not reached the server yet: they cannot be printed. */
  waiting: number;
  visits: number;
}

/** The job's photos that have reached the server, in the order they were taken. */
export async function loadPhotoRecord(em: EntityManager, file: JobFile): Promise<PhotoRecordContent> {
  const org = file.organisation.id;
  const visits = await jobVisits(em, file);
  const all = visits.length ? await syncRepository(em, 'photo').find({ where: { visitId: In(visits.map((v) => v.id)), ...live(org) } }) : [];
  const hashes = [...new Set(all.map((p) => p.sha256).filter((h): h is string => typeof h === 'string'))];
  const held = hashes.length ? await em.find(PhotoBlob, { where: { organisationId: org, sha256: In(hashes) }, select: { sha256: true } }) : [];
  const have = new Set(held.map((b) => b.sha256));
  const ready = all.filter((p): p is HeldPhoto => p.sha256 !== null && have.has(p.sha256));
  const people = await em.find(User, { where: { organisationId: org, id: In([...new Set(ready.map((p) => p.createdById).filter((id): id is string => !!id))]) }, select: { id: true, name: true } });
  const names = new Map(people.map((u) => [u.id, u.name]));
  const order = (p: SyncRecord<'photo'>) => String(p.takenAt ?? p.createdAt?.toISOString() ?? '');
  return {
    photos: ready.sort((a, b) => order(a).localeCompare(order(b)) || a.id.localeCompare(b.id)).map((photo) => ({ photo, takenBy: names.get(photo.createdById ?? '') ?? '' })),
    waiting: all.length - ready.length,
    visits: new Set(ready.map((p) => p.visitId)).size,
  };
}
