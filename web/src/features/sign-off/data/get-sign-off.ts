import {
  assessCableRun,
  type CableRunAssessment,
  type CertificateChoice,
  certificateThatApplies,
  judgeCircuitWork,
  judgeInstallationCertificate,
  type MinorWorksFindingKind,
  type MinorWorksJudgement,
  unvoided,
} from '@wiretrail/core';
import { useLiveQuery } from 'dexie-react-hooks';
import { type BoardRow, type CableRunRow, type CircuitRow, db, type PointChangeRow, type SiteRow, type TestResultRow, type VisitRow } from '@/lib/db';

/** One thing the office (or the certificate) will ask about. */
export interface Problem {
  kind: Exclude<MinorWorksFindingKind, 'not-signed' | 'nothing-tested'>;
  what: string;
  detail: string;
}

export interface SignOffSummary {
  counts: { photos: number; notes: number; cables: number; points: number; circuits: number };
  /** Which certificate the visit's work needs (an installation certificate for a new circuit or a replaced board), and why. */
  choice: CertificateChoice;
  /** The visit's circuit work judged as the server will judge it before it issues that certificate. */
  certificate: MinorWorksJudgement<VisitRow, TestResultRow, CircuitRow>;
  cables: { cable: CableRunRow; assessment: CableRunAssessment }[];
  points: PointChangeRow[];
  problems: Problem[];
  /** The site, whose earthing and bonding the certificate states. */
  site: SiteRow | undefined;
  /** The boards the circuits tested on this visit hang off, or every board of the site when none was tested, for Zdb. */
  boards: BoardRow[];
  /** The position the signer gave when they last signed a visit on this phone, offered again. */
  lastPosition: string;
}

/** Everything recorded on the visit, judged again, with every fail and every missing reading in words. */
export async function getSignOff(visit: VisitRow, signerName = ''): Promise<SignOffSummary> {
  const [allPhotos, allNotes, allPoints, results, allCables, circuits, site, siteBoards, signed] = await Promise.all([
    db.photo.where('visitId').equals(visit.id).toArray(),
    db.note.where('visitId').equals(visit.id).toArray(),
    db.pointChange.where('visitId').equals(visit.id).toArray(),
    db.testResult.where('visitId').equals(visit.id).toArray(),
    db.cableRun.where('siteId').equals(visit.siteId).toArray(),
    db.circuit.where('siteId').equals(visit.siteId).toArray(),
    db.site.get(visit.siteId),
    db.board.where('siteId').equals(visit.siteId).toArray(),
    db.visit.filter((v) => !!v.signedByPosition && v.signedByName === signerName).toArray(),
  ]);
  // What was voided on site is not counted, judged or asked about; the judgment leaves out voided results itself.
  const [photos, notes, points, cables] = [unvoided(allPhotos).length, unvoided(allNotes).length, unvoided(allPoints), unvoided(allCables)];
  const choice = certificateThatApplies({ visitIds: [visit.id], circuits, boards: siteBoards });
  const records = { visits: [visit], tests: results, pointChanges: points, circuits, earthing: site?.earthing, boards: siteBoards };
  // The same judgment the server makes before issuing the certificate that applies, made before signing.
  const certificate = choice.kind === 'installation-certificate' ? judgeInstallationCertificate(records, null, undefined, { beforeSigning: true }) : judgeCircuitWork(records);
  // A visit of data cabling alone has no circuit to certify: whether the job has one is the office's question.
  const problems: Problem[] = certificate.findings.flatMap((f) =>
    f.kind === 'not-signed' || f.kind === 'nothing-tested' ? [] : [{ kind: f.kind, what: f.what, detail: f.detail }],
  );
  const mine = cables
    .filter((c) => c.lastVisitId === visit.id)
    .map((cable) => ({ cable, assessment: assessCableRun({ medium: cable.medium, scheme: cable.scheme, wiremap: cable.wiremap, lengthM: cable.lengthM, linkKind: cable.linkKind }) }))
    .sort((a, b) => a.cable.label.localeCompare(b.cable.label, 'en-GB', { numeric: true }));
  for (const { cable, assessment } of mine) {
    if (assessment.verdict === 'fail') {
      const faults = assessment.wiremap?.faults.map((f) => `${f.kind} on pins ${f.pins.join(', ')}`).join('; ');
      problems.push({ kind: 'fail', what: `Cable ${cable.label}`, detail: faults || assessment.length?.note || 'Its test fails.' });
    }
    if (assessment.missing.length > 0) problems.push({ kind: 'missing', what: `Cable ${cable.label}`, detail: `Still to record: ${assessment.missing.join(', ')}.` });
  }
  const tested = new Set(certificate.circuits.map((c) => c.circuit.boardId));
  const boards = (tested.size ? siteBoards.filter((b) => tested.has(b.id)) : siteBoards).sort((a, b) => a.name.localeCompare(b.name, 'en-GB', { numeric: true }));
  const lastSigned = signed.sort((a, b) => (b.signedAt ?? '').localeCompare(a.signedAt ?? ''))[0];
  return {
    counts: { photos, notes, cables: mine.length, points: points.length, circuits: certificate.circuits.length },
    choice,
    certificate,
    cables: mine,
    points,
    problems,
    site,
    boards,
    lastPosition: lastSigned?.signedByPosition ?? '',
  };
}

export function useSignOff(visit: VisitRow, signerName = ''): SignOffSummary | undefined {
  return useLiveQuery(() => getSignOff(visit, signerName), [visit, signerName]);
}
