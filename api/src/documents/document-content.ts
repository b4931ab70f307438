import {
  assessCableRun,
  type CableRunAssessment,
  type InstallationJudgement,
  type InstallationParticulars,
  judgeInstallationCertificate,
  judgeLinkTest,
  judgeMinorWorks,
  type LinkTestJudgement,
  type MinorWorksJudgement,
  type RuleSet,
  unvoided,
} from '@wiretrail/core';
import { type EntityManager, In } from 'typeorm';
import { inTurn } from '../common/in-turn.js';
import { type JobFile, jobVisits, live } from '../paperwork/job-file.js';
import { PhotoBlob } from '../photos/entities/photo-blob.entity.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import type { RecordKey } from '../sync/record-locks.js';
import { User } from '../users/entities/user.entity.js';

export interface MinorWorksContent extends MinorWorksJudgement<SyncRecord<'visit'>, SyncRecord<'testResult'>, SyncRecord<'circuit'>> {
  /** The site's boards by id: their names, and Zdb where it was measured. */
  boards: Map<string, SyncRecord<'board'>>;
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
      ...(circuit.boardId ? [{ entity: 'board' as const, id: circuit.boardId }] : []),
    ]),
  ];
}

/** The records behind a certificate: the job's visits, what they recorded (voided records left out), the site's circuits and boards. */
async function loadCircuitWork(em: EntityManager, file: JobFile) {
  const org = file.organisation.id;
  const visits = await jobVisits(em, file);
  const visitIds = visits.map((v) => v.id);
  const [allTests, allPointChanges, circuits, boards] = await inTurn(
    () => visitIds.length ? syncRepository(em, 'testResult').find({ where: { visitId: In(visitIds), ...live(org) } }) : [],
    () => visitIds.length ? syncRepository(em, 'pointChange').find({ where: { visitId: In(visitIds), ...live(org) } }) : [],
    () => syncRepository(em, 'circuit').find({ where: { siteId: file.site.id, ...live(org) } }),
    () => syncRepository(em, 'board').find({ where: { siteId: file.site.id, organisationId: org } }),
  );
  // Records voided on site are neither judged nor printed, so the certificate does not hold them either.
  const [tests, pointChanges] = [unvoided(allTests), unvoided(allPointChanges)];
  const recorded: RecordKey[] = [...tests.map((r) => ({ entity: 'testResult' as const, id: r.id })), ...pointChanges.map((r) => ({ entity: 'pointChange' as const, id: r.id }))];
  return { records: { visits, tests, pointChanges, circuits, earthing: file.site.earthing ?? null, boards }, recorded };
}

/**
 * The records behind a minor works certificate, judged against the rule set in force on the day the work was
 * completed; see judgeMinorWorks for when it may be issued.
 */
export async function loadMinorWorks(em: EntityManager, file: JobFile): Promise<MinorWorksContent> {
  const { records, recorded } = await loadCircuitWork(em, file);
  const judgement = judgeMinorWorks(records);
  return { ...judgement, boards: new Map(records.boards.map((b) => [b.id, b])), recorded };
}

export interface InstallationCertificateContent extends InstallationJudgement<SyncRecord<'visit'>, SyncRecord<'testResult'>, SyncRecord<'circuit'>> {
  /** Every reading and point change recorded on the job's visits, held with the certificate. */
  recorded: RecordKey[];
}

/**
 * The records behind an electrical installation certificate, judged with the office's particulars (null to see what
 * the records alone still lack); see judgeInstallationCertificate.
 */
export async function loadInstallationCertificate(em: EntityManager, file: JobFile, particulars: InstallationParticulars | null): Promise<InstallationCertificateContent> {
  const { records, recorded } = await loadCircuitWork(em, file);
  // A board deleted since is not scheduled.
  return { ...judgeInstallationCertificate({ ...records, boards: records.boards.filter((b) => !b.deletedAt) }, particulars), recorded };
}

/**
 * What an installation certificate prints, which its lock holds: the visits, what they recorded, every scheduled
 * circuit and its board. The supply and the origin are the office's particulars, kept on the document itself, so the
 * site's own record stays free to change.
 */
export function installationCertificatePrints(content: InstallationCertificateContent): RecordKey[] {
  return [
    ...content.visits.map((v) => ({ entity: 'visit' as const, id: v.id })),
    ...content.recorded,
    ...content.boards.map((b) => ({ entity: 'board' as const, id: b.id })),
    ...content.schedule.map(({ circuit }) => ({ entity: 'circuit' as const, id: circuit.id })),
  ];
}

export interface ScheduledCable {
  run: SyncRecord<'cableRun'>;
  assessment: CableRunAssessment;
  /** The link's latest performance test and core's verdict on it; null where none was recorded. */
  linkTest: SyncRecord<'linkTest'> | null;
  performance: LinkTestJudgement | null;
}

/** A cabling report is a certification only when every link has passing results to a named limit set (or a fibre budget). */
export function certifiesEveryLink(cables: readonly ScheduledCable[]): boolean {
  return cables.length > 0 && cables.every((c) => c.performance?.certifiable === true && c.performance.verdict === 'pass');
}

/**
 * The cables a report covers, every run judged again from its recorded wiremap and length, by label: those recorded
 * or tested on the job's visits, or the site's whole schedule when the office chose it (cables another job recorded,
 * or one made in error there, are otherwise not this customer's report).
 */
export async function loadCableSchedule(em: EntityManager, file: JobFile, rules: RuleSet, coverage: 'job' | 'site'): Promise<ScheduledCable[]> {
  const where = { siteId: file.site.id, ...live(file.organisation.id) };
  let runs: SyncRecord<'cableRun'>[];
  if (coverage === 'site') runs = await syncRepository(em, 'cableRun').find({ where });
  else {
    const visitIds = (await jobVisits(em, file)).map((v) => v.id);
    runs = visitIds.length ? await syncRepository(em, 'cableRun').find({ where: { ...where, lastVisitId: In(visitIds) } }) : [];
  }
  const kept = unvoided(runs);
  const tests = kept.length ? unvoided(await syncRepository(em, 'linkTest').find({ where: { cableRunId: In(kept.map((r) => r.id)), ...live(file.organisation.id) } })) : [];
  // The latest test of each link stands: a link tested again after a repair is judged on the new results.
  const latest = new Map<string, SyncRecord<'linkTest'>>();
  const when = (t: SyncRecord<'linkTest'>) => `${t.testedAt ?? t.recordedAt ?? ''}|${t.createdAt.toISOString()}`;
  for (const t of tests) if (!latest.has(t.cableRunId) || when(t) > when(latest.get(t.cableRunId)!)) latest.set(t.cableRunId, t);
  // A cable voided on site (a typo'd label) is kept for the office, never printed.
  return kept
    .sort((a, b) => a.label.localeCompare(b.label, 'en-GB', { numeric: true }))
    .map((run) => {
      const linkTest = latest.get(run.id) ?? null;
      return {
        run,
        assessment: assessCableRun({ medium: run.medium, scheme: run.scheme, wiremap: run.wiremap, lengthM: run.lengthM, linkKind: run.linkKind }, rules),
        linkTest,
        performance: linkTest ? judgeLinkTest(linkTest) : null,
      };
    });
}

/** Each failing cable named, with what fails, for the office to see as the report is issued. */
export function cableNotices(cables: ScheduledCable[]): string[] {
  const performance = cables
    .filter((c) => c.performance?.verdict === 'fail')
    .map((c) => `${c.run.label} fails its performance test: ${c.performance!.checks.filter((k) => k.verdict === 'fail').map((k) => k.note).concat(c.performance!.inspections.filter((k) => k.verdict === 'fail').map((k) => k.note)).join(' ')}`);
  const untested = cables.filter((c) => !c.performance?.certifiable).map((c) => String(c.run.label));
  const certification = certifiesEveryLink(cables)
    ? []
    : untested.length && untested.length < cables.length
      ? [`Issued as a wiremap and length record: ${untested.join(', ')} ${untested.length === 1 ? 'has' : 'have'} no performance results to a named limit set.`]
      : [];
  return [...certification, ...performance, ...cables
    .filter((c) => c.assessment.verdict === 'fail')
    .map((c) => {
      const a = c.assessment;
      const why = [...(a.wiremap?.faults ?? []).map((f) => f.note), ...(a.length && a.length.verdict === 'fail' ? [a.length.note] : []), ...a.problems];
      return `${c.run.label} fails: ${why.length ? why.join(' ') : 'see the report.'}`;
    })];
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
  const all = unvoided(visits.length ? await syncRepository(em, 'photo').find({ where: { visitId: In(visits.map((v) => v.id)), ...live(org) } }) : []);
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
