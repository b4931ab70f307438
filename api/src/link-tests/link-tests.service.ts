import { BadRequestException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import {
  type CsvCellProblem,
  fieldError,
  type JudgedLinkTest,
  judgeLinkTest,
  type LinkTestFacts,
  type LinkTestImport,
  linkTestCsvHeaderProblems,
  linkTestProblems,
  type Mutation,
  readLinkTestCsvRow,
  unvoided,
} from '@wiretrail/core';
import Papa from 'papaparse';
import { type EntityManager, In } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import type { AuthUser } from '../common/decorators/current-user.decorator.js';
import { WriteQueue } from '../common/write-queue.js';
import { jobVisits, live, loadJobFile } from '../paperwork/job-file.js';
import { officeActor, officeMutation } from '../records/records.service.js';
import { type SyncRecord, syncRepository } from '../sync/entities/sync-schemas.js';
import { SyncEngine } from '../sync/sync-engine.service.js';

/** Beyond this a file is not one job's links: refused before anything is read into the write queue. */
const MAX_ROWS = 2000;

/**
 * Links' performance results at the desk. Every row is written through the sync engine as the office's own change,
 * so phones pull them and issued documents lock them; an import is one transaction: every row, or none.
 */
@Injectable()
export class LinkTestsService {
  constructor(
    private readonly queue: WriteQueue,
    private readonly engine: SyncEngine,
  ) {}

  async list(user: AuthUser, jobId: string): Promise<JudgedLinkTest[]> {
    return this.queue.read(async (em) => {
      const file = await loadJobFile(em, user.organisationId, jobId);
      const tests = await syncRepository(em, 'linkTest').find({ where: { siteId: file.site.id, ...live(user.organisationId) } });
      return this.judged(em, user, unvoided(tests));
    });
  }

  /** One link's results typed at the desk, on the job's latest visit. */
  async record(user: AuthUser, jobId: string, cableRunId: string, fields: Record<string, unknown>): Promise<JudgedLinkTest> {
    for (const [field, value] of Object.entries(fields)) {
      if (['visitId', 'siteId', 'cableRunId', 'voidedAt', 'voidReason'].includes(field)) throw new BadRequestException(`linkTest.${field} is set by the server`);
      const wrong = fieldError('linkTest', field, value);
      if (wrong) throw new BadRequestException(wrong);
    }
    const problems = linkTestProblems(fields as LinkTestFacts);
    if (problems.length) throw new UnprocessableEntityException(problems.map((p) => p.message));
    const id = uuidv7();
    return this.queue.run(async (em) => {
      const { visitId, cables } = await this.jobCables(em, user, jobId);
      const cable = cables.find((c) => c.id === cableRunId);
      if (!cable) throw new NotFoundException('No such cable run on this job’s site.');
      await this.apply(em, user, [officeMutation('linkTest', id, 0, { ...fields, visitId, siteId: cable.siteId, cableRunId, recordedAt: new Date().toISOString() })]);
      const row = await syncRepository(em, 'linkTest').findOneByOrFail({ id });
      return (await this.judged(em, user, [row]))[0]!;
    });
  }

  /**
   * Reads a file in our template and records a link test per row. Every bad cell is named by line and column, and
   * a file with any is refused whole (422); a good file is written in one transaction.
   */
  async importCsv(user: AuthUser, jobId: string, csv: string): Promise<LinkTestImport> {
    const parsed = Papa.parse<Record<string, string>>(csv.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy', transformHeader: (h) => h.trim() });
    const problems: CsvCellProblem[] = linkTestCsvHeaderProblems(parsed.meta.fields ?? []);
    // Papa numbers data rows from 0; the header is line 1, so a row's line is its index + 2 (no quoted line breaks in the template).
    for (const e of parsed.errors) problems.push({ line: (e.row ?? 0) + 2, column: '', message: e.message });
    if (!parsed.data.length && !problems.length) problems.push({ line: 2, column: '', message: 'The file has no rows: one row per link under the header.' });
    if (parsed.data.length > MAX_ROWS) throw new UnprocessableEntityException([`The file has ${parsed.data.length} rows; import at most ${MAX_ROWS} at a time.`]);
    if (problems.length) throw new UnprocessableEntityException(problems.map(words));
    const rows = parsed.data.map((cells, i) => ({ line: i + 2, ...readLinkTestCsvRow(cells, i + 2) }));
    for (const r of rows) problems.push(...r.problems);
    return this.queue.run(async (em) => {
      const { visitId, cables } = await this.jobCables(em, user, jobId);
      const byLabel = new Map<string, SyncRecord<'cableRun'>[]>();
      for (const c of cables) byLabel.set(c.label.trim().toLowerCase(), [...(byLabel.get(c.label.trim().toLowerCase()) ?? []), c]);
      const mutations: Mutation[] = [];
      const labels: string[] = [];
      const now = new Date().toISOString();
      for (const r of rows) {
        // Every row's label is looked up, its other cells' problems or not, so that one pass names everything.
        const label = (parsed.data[r.line - 2]?.cable_label ?? '').trim();
        if (!label) continue;
        const found = byLabel.get(label.toLowerCase()) ?? [];
        if (found.length !== 1) {
          problems.push({
            line: r.line,
            column: 'cable_label',
            message: found.length ? `Two cables on this site are labelled "${label}": correct one of the labels first.` : `No cable labelled "${label}" on this job’s site.`,
          });
          continue;
        }
        if (!r.row) continue;
        const cable = found[0]!;
        mutations.push(officeMutation('linkTest', uuidv7(), 0, { ...r.row.fields, visitId, siteId: cable.siteId, cableRunId: cable.id, recordedAt: now }));
        labels.push(cable.label);
      }
      if (problems.length) throw new UnprocessableEntityException(problems.sort((a, b) => a.line - b.line || (a.column === 'cable_label' ? -1 : 0) - (b.column === 'cable_label' ? -1 : 0)).map(words));
      await this.apply(em, user, mutations);
      return { imported: mutations.length, cableLabels: labels, visitId };
    });
  }

  /** Applies the office's mutations; any refused undoes them all, since the caller's transaction then rolls back. */
  private async apply(em: EntityManager, user: AuthUser, mutations: Mutation[]): Promise<void> {
    const results = await this.engine.applyAll(em, officeActor(user), mutations);
    const refused = results.filter((r) => r.status !== 'applied');
    if (refused.length) throw new UnprocessableEntityException(refused.map((r) => r.error ?? (r.heldBy ? `Held by ${r.heldBy}, an issued document.` : 'A link test was not accepted.')));
  }

  /** The job's site's cables, and the visit new results are filed under: the job's latest. */
  private async jobCables(em: EntityManager, user: AuthUser, jobId: string): Promise<{ visitId: string; cables: SyncRecord<'cableRun'>[] }> {
    const file = await loadJobFile(em, user.organisationId, jobId);
    const visits = (await jobVisits(em, file)).filter((v) => v.status !== 'cancelled');
    const latest = visits.sort((a, b) => String(b.plannedStart ?? b.actualStart ?? '').localeCompare(String(a.plannedStart ?? a.actualStart ?? '')))[0];
    if (!latest) throw new UnprocessableEntityException(['This job has no visit to file the results under: plan one first.']);
    const cables = unvoided(await syncRepository(em, 'cableRun').find({ where: { siteId: file.site.id, ...live(user.organisationId) } }));
    return { visitId: latest.id, cables };
  }

  private async judged(em: EntityManager, user: AuthUser, tests: SyncRecord<'linkTest'>[]): Promise<JudgedLinkTest[]> {
    const ids = [...new Set(tests.map((t) => t.cableRunId))];
    const cables = ids.length ? await syncRepository(em, 'cableRun').find({ where: { id: In(ids), organisationId: user.organisationId }, withDeleted: true }) : [];
    const label = new Map(cables.map((c) => [c.id, c.label]));
    return tests
      .map(({ organisationId: _o, fieldMeta: _m, deletedAt: _d, createdAt: _c, updatedAt: _u, createdById: _cb, updatedById: _ub, ...row }) => ({
        ...row,
        cableLabel: label.get(row.cableRunId) ?? '',
        judgement: judgeLinkTest(row),
      }))
      .sort((a, b) => a.cableLabel.localeCompare(b.cableLabel, 'en-GB', { numeric: true }) || String(b.testedAt ?? '').localeCompare(String(a.testedAt ?? '')));
  }
}

const words = (p: CsvCellProblem) => (p.column ? `Line ${p.line}, column ${p.column}: ${p.message}` : `Line ${p.line}: ${p.message}`);
