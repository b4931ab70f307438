import { assessCableRun, type CableRunAssessment, judgeMinorWorks, type MinorWorksJudgement, type RuleSet } from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import { inTurn } from '../common/in-turn.js';
import { type JobFile, jobVisits, live, rows } from '../paperwork/job-file.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import type { RecordKey } from '../sync/record-locks.js';
import { User } from '../users/entities/user.entity.js';

export interface MinorWorksContent extends MinorWorksJudgement<SyncRecord, SyncRecord, SyncRecord> {
  boards: Map<string, string>;
  /** Every reading and point change recorded on the job's visits: the evidence behind the certificate, held with it. */
  recorded: RecordKey[];
}

/**
 * What a minor works certificate prints, which its lock holds: the site (earthing, Ze, PFC), the visits judged and
 * everything recorded on the job's visits, each certified circuit and its board.
 */
export function minorWorksPrints(file: JobFile, content: MinorWorksContent): RecordKey[] {
  return [
    { entity: 'site', id: file.site.id },
    ...content.visits.map((v) => ({ entity: 'visit' as const, id: v.id })),
    ...content.recorded,
    ...content.circuits.flatMap(({ circuit }) => [
      { entity: 'circuit' as const, id: circuit.id },
      ...(typeof circuit.boardId === 'string' ? [{ entity: 'board' as const, id: circuit.boardId }] : []),
    ]),
  ];
}

/** The records behind a minor works certificate, judged; see judgeMinorWorks for when it may be issued. */
export async function loadMinorWorks(em: EntityManager, file: JobFile, rules: RuleSet): Promise<MinorWorksContent> {
  const org = file.organisation.id;
  const visits = await jobVisits(em, file);
  const visitIds = visits.map((v) => v.id);
  const [tests, pointChanges, circuits, boards] = await inTurn(
    () => visitIds.length ? rows(em, 'testResult', { visitId: In(visitIds), ...live(org) }) : [],
    () => visitIds.length ? rows(em, 'pointChange', { visitId: In(visitIds), ...live(org) }) : [],
    () => rows(em, 'circuit', { siteId: file.site.id, ...live(org) }),
    () => rows(em, 'board', { siteId: file.site.id, organisationId: org }),
  );
  const earthing = typeof file.site.earthing === 'string' ? file.site.earthing : null;
  const judgement = judgeMinorWorks({ visits, tests, pointChanges, circuits, earthing }, rules);
  const recorded: RecordKey[] = [...tests.map((r) => ({ entity: 'testResult' as const, id: r.id })), ...pointChanges.map((r) => ({ entity: 'pointChange' as const, id: r.id }))];
  return { ...judgement, boards: new Map(boards.map((b) => [b.id, b.name as string])), recorded };
}

export interface ScheduledCable {
  run: SyncRecord;
  assessment: CableRunAssessment;
}

/**
 * The cables a report covers, every run judged again from its recorded wiremap and length, by label: those recorded
 * or tested on the job's visits, or the site's whole schedule when the office chose it (cables another job recorded,
 * or one made in error there, are otherwise not this customer's report).
 */
export async function loadCableSchedule(em: EntityManager, file: JobFile, rules: RuleSet, coverage: 'job' | 'site'): Promise<ScheduledCable[]> {
  const org = file.organisation.id;
  let runs: SyncRecord[];
  if (coverage === 'site') runs = await rows(em, 'cableRun', { siteId: file.site.id, ...live(org) });
  else {
    const visitIds = (await jobVisits(em, file)).map((v) => v.id);
    runs = visitIds.length ? await rows(em, 'cableRun', { siteId: file.site.id, lastVisitId: In(visitIds), ...live(org) }) : [];
  }
  return runs
    .sort((a, b) => String(a.label).localeCompare(String(b.label), 'en-GB', { numeric: true }))
    .map((run) => ({
      run,
      assessment: assessCableRun(
        { medium: run.medium as string, scheme: run.scheme as never, wiremap: run.wiremap as never, lengthM: run.lengthM as number, linkKind: run.linkKind as never },
        rules,
      ),
    }));
}

/** Each failing cable named, with what fails, for the office to see as the report is issued. */
export function cableNotices(cables: ScheduledCable[]): string[] {
  return cables
    .filter((c) => c.assessment.verdict === 'fail')
    .map((c) => {
      const a = c.assessment;
      const why = [...(a.wiremap?.faults ?? []).map((f) => f.note), ...(a.length && a.length.verdict === 'fail' ? [a.length.note] : []), ...a.problems];
      return `${String(c.run.label)} fails: ${why.length ? why.join(' ') : 'see the report.'}`;
    });
}

export interface RecordedPhoto {
  photo: SyncRecord;
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
  const all = visits.length ? await rows(em, 'photo', { visitId: In(visits.map((v) => v.id)), ...live(org) }) : [];
  const hashes = [...new Set(all.map((p) => p.sha256).filter((h): h is string => typeof h === 'string'))];
  const held = hashes.length ? await em.find(PhotoBlob, { where: { organisationId: org, sha256: In(hashes) }, select: { sha256: true } }) : [];
  const have = new Set(held.map((b) => b.sha256));
  const ready = all.filter((p) => have.has(p.sha256 as string));
  const people = await em.find(User, { where: { organisationId: org, id: In([...new Set(ready.map((p) => p.createdById).filter((id): id is string => !!id))]) }, select: { id: true, name: true } });
  const names = new Map(people.map((u) => [u.id, u.name]));
  const order = (p: SyncRecord) => String(p.takenAt ?? p.createdAt?.toISOString() ?? '');
  return {
    photos: ready.sort((a, b) => order(a).localeCompare(order(b)) || a.id.localeCompare(b.id)).map((photo) => ({ photo, takenBy: names.get(photo.createdById ?? '') ?? '' })),
    waiting: all.length - ready.length,
    visits: new Set(ready.map((p) => p.visitId)).size,
  };
}
