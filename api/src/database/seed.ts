import { type FieldValue, formatHlc, localDate, type Mutation, type OfficePaymentMethod, type Role, type SyncEntityName, UK_VAT_RATES } from '@wiretrail/core';
import { readFile } from 'node:fs/promises';
import { resolve as resolvePath } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { DataSource, EntityManager } from 'typeorm';
import { v7 as uuidv7 } from 'uuid';
import { hashPassword } from '../auth/password.js';
import { paymentsConfig } from '../config/payments.config.js';
import { storageConfig } from '../config/storage.config.js';
import { DOCUMENT_LOCK } from '../documents/document-lock.js';
import { Payment } from '../invoices/entities/payment.entity.js';
import { issueDraft, saveDraft } from '../invoices/invoice-issue.js';
import type { LineDraft } from '../invoices/invoice-lines.js';
import { linesFromJob } from '../invoices/job-billing.js';
import { LabourRate } from '../pricing/entities/labour-rate.entity.js';
import { VatRate } from '../pricing/entities/vat-rate.entity.js';
import { loadRateBook } from '../pricing/rate-book.js';
import { Organisation } from '../organisations/entities/organisation.entity.js';
import { loadJobFile } from '../paperwork/job-file.js';
import type { FileStorage } from '../storage/file-storage.js';
import { createInvoiceStorage, createPhotoStorage } from '../storage/file-stores.js';
import type { SyncRecord } from '../sync/entities/sync-schemas.js';
import { ScopeService } from '../sync/scope.service.js';
import { SyncEngine } from '../sync/sync-engine.service.js';
import { Person } from '../users/entities/person.entity.js';
import { User } from '../users/entities/user.entity.js';
import { type DemoImage, renderDemoImages, storeDemoImage } from './demo-photos.js';

interface ScenarioRecord {
  entity: SyncEntityName;
  key: string;
  set: Record<string, FieldValue>;
  /** Who recorded it, when not the admin: a technician's photos are theirs. */
  by?: string;
}

/** A record whose key came earlier in the scenario changes that row, as a later edit by its author (a sign-off). */
const isUpdate = (records: ScenarioRecord[], i: number) => records.slice(0, i).some((r) => r.entity === records[i]!.entity && r.key === records[i]!.key);

interface Scenario {
  password: string;
  organisations: Array<{
    name: string;
    address?: string;
    phone?: string;
    email?: string;
    registrationNumber?: string;
    nation?: string;
    competentPersonScheme?: string;
    timeZone?: string;
    vatNumber?: string;
    paymentTermsDays?: number;
    quoteValidDays?: number;
    paymentTerms?: string;
    paymentInstructions?: string;
    labourRates?: Array<{ name: string; hourlyMinor: number; vatRateCode: string; isDefault?: boolean }>;
    users: Array<{ email: string; name: string; role: Role }>;
    records?: ScenarioRecord[];
    invoices?: ScenarioInvoice[];
  }>;
}

/** A quote or invoice issued on a past day: the job's labour and parts if fromJob, its own lines, and payments received since. */
interface ScenarioInvoice {
  job: string;
  kind: 'quote' | 'invoice';
  fromJob?: boolean;
  issuedAt: string;
  by: string;
  lines?: Array<Omit<LineDraft, 'unit'> & { unit?: string }>;
  notes?: string;
  payments?: Array<{ amountMinor: number; method: OfficePaymentMethod; receivedAt: string; reference?: string }>;
}

export const DEFAULT_SCENARIO = new URL('../../../seed/scenario.json', import.meta.url);

/**
 * Values in the scenario may point at other records (`@site:orchard`), at users (`@user:tech1@…`), at days
 * relative to today (`@day+1T08:30`, UTC), so the demo always has visits for today and the coming week, or at a
 * drawn scene (`@image:back-box`, the sha256 of seed/scenes/back-box.svg rendered to a JPEG).
 */
function resolve(value: FieldValue, ids: Map<string, string>, users: Map<string, string>, today: Date, images: Map<string, DemoImage>): FieldValue {
  if (Array.isArray(value)) return value.map((v) => resolve(v, ids, users, today, images));
  if (typeof value !== 'string' || !value.startsWith('@')) return value;
  if (value.startsWith('@image:')) return images.get(value.slice(7))!.sha256;
  const day = /^@day([+-]\d+)T(\d{2}):(\d{2})$/.exec(value);
  if (day) {
    const d = new Date(today);
    d.setUTCDate(d.getUTCDate() + Number(day[1]));
    d.setUTCHours(Number(day[2]), Number(day[3]), 0, 0);
    return d.toISOString();
  }
  if (value.startsWith('@user:')) {
    const id = users.get(value.slice(6));
    if (!id) throw new Error(`Scenario names an unknown user: ${value}`);
    return id;
  }
  const id = ids.get(value.slice(1));
  if (!id) throw new Error(`Scenario names an unknown record: ${value}`);
  return id;
}

const imageName = (value: unknown) => (typeof value === 'string' && value.startsWith('@image:') ? value.slice(7) : null);

interface Resolving {
  ids: Map<string, string>;
  users: Map<string, string>;
  names: Map<string, string>;
  today: Date;
  images: Map<string, DemoImage>;
  storage: FileStorage;
}

/** Issues a scenario invoice the way the office would have on its day: built from the job, priced, numbered, printed. */
async function seedInvoice(em: EntityManager, organisationId: string, inv: ScenarioInvoice, r: Resolving): Promise<void> {
  const at = (value: string) => {
    const resolved = resolve(value, r.ids, r.users, r.today, r.images);
    if (typeof resolved !== 'string') throw new Error(`Scenario invoice has a time that is not text: ${value}`);
    return new Date(resolved);
  };
  const jobId = r.ids.get(`job:${inv.job}`);
  const issuerId = r.users.get(inv.by);
  if (!jobId || !issuerId) throw new Error(`Scenario invoice names an unknown job or user: ${inv.job}, ${inv.by}`);
  const file = await loadJobFile(em, organisationId, jobId);
  const built = inv.fromJob ? await linesFromJob(em, file, await loadRateBook(em, organisationId)) : { lines: [], warnings: [] };
  if (built.warnings.length) throw new Error(`Scenario invoice for ${inv.job} cannot be priced: ${built.warnings.join(' ')}`);
  const invoice = await saveDraft(em, {
    organisationId,
    jobId,
    kind: inv.kind,
    createdById: issuerId,
    drafts: [...built.lines, ...(inv.lines ?? []).map((l) => ({ ...l, unit: l.unit ?? null }))],
    termDays: inv.kind === 'quote' ? file.organisation.quoteValidDays : file.organisation.paymentTermsDays,
  });
  invoice.notes = inv.notes ?? null;
  await issueDraft(em, { invoice, issuer: { id: issuerId, name: r.names.get(inv.by)! }, now: at(inv.issuedAt), storage: r.storage, cardPayments: !!paymentsConfig().apiKey });
  for (const p of inv.payments ?? []) {
    const receivedOn = localDate(at(p.receivedAt), file.organisation.timeZone);
    await em.save(em.create(Payment, { organisationId, invoiceId: invoice.id, amountMinor: p.amountMinor, method: p.method, receivedOn, reference: p.reference ?? null, note: null, recordedById: issuerId, checkoutSessionId: null }));
  }
}

/**
 * Loads the demo scenario into an empty database; returns false (and changes nothing) when data exists.
 * Demo photos go to the configured photo storage unless another is given.
 */
export async function seedDemoData(
  dataSource: DataSource,
  scenarioPath: string | URL = DEFAULT_SCENARIO,
  now = new Date(),
  photoStorage?: FileStorage,
  invoiceStorage?: FileStorage,
): Promise<boolean> {
  if ((await dataSource.getRepository(Organisation).count()) > 0) return false;
  // The scenario is our own file beside this code, and seeding it checks every record as a push would.
  const scenario = JSON.parse(await readFile(scenarioPath, 'utf8')) as Scenario;
  const passwordHash = await hashPassword(scenario.password);
  const imageNames = scenario.organisations.flatMap((o) => (o.records ?? []).map((r) => imageName(r.set.sha256))).filter((n): n is string => !!n);
  const images = imageNames.length ? await renderDemoImages(new URL('scenes/', typeof scenarioPath === 'string' ? pathToFileURL(resolvePath(scenarioPath)) : scenarioPath), imageNames) : new Map<string, DemoImage>();
  const storage = imageNames.length ? (photoStorage ?? (await createPhotoStorage(storageConfig()))) : null;
  const engine = new SyncEngine(new ScopeService());
  engine.lockRule('document', DOCUMENT_LOCK);
  const today = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
  let invoices = invoiceStorage;
  await dataSource.transaction(async (em) => {
    for (const o of scenario.organisations) {
      const org = await em.save(
        em.create(Organisation, {
          name: o.name, address: o.address ?? null, phone: o.phone ?? null, email: o.email ?? null,
          registrationNumber: o.registrationNumber ?? null, ...(o.timeZone ? { timeZone: o.timeZone } : {}),
          vatNumber: o.vatNumber ?? null, paymentTermsDays: o.paymentTermsDays ?? 30, quoteValidDays: o.quoteValidDays ?? 30,
          paymentTerms: o.paymentTerms ?? null, paymentInstructions: o.paymentInstructions ?? null,
          ...(o.nation ? { nation: o.nation } : {}), competentPersonScheme: o.competentPersonScheme ?? null,
        }),
      );
      // Every organisation starts with the UK's VAT rates as its own data.
      await em.save(UK_VAT_RATES.map((r) => em.create(VatRate, { organisationId: org.id, code: r.code, name: r.name, basisPoints: r.basisPoints, active: true })));
      for (const l of o.labourRates ?? []) await em.save(em.create(LabourRate, { organisationId: org.id, ...l, isDefault: l.isDefault ?? false, active: true }));
      const users = new Map<string, string>();
      for (const u of o.users) {
        // One person per address: a subcontractor listed under two contractors signs in once and chooses.
        const person = (await em.findOneBy(Person, { email: u.email })) ?? (await em.save(em.create(Person, { email: u.email, passwordHash })));
        const user = await em.save(em.create(User, { organisationId: org.id, personId: person.id, email: u.email, name: u.name, role: u.role, active: true, lastSignInAt: null }));
        users.set(u.email, user.id);
      }
      const admin = o.users.find((u) => u.role === 'admin');
      if (!o.records?.length || !admin) continue;
      const used = new Set(o.records.map((r) => imageName(r.set.sha256)).filter((n): n is string => !!n));
      for (const name of used) await storeDemoImage(em, storage!, org.id, images.get(name)!);
      // The demo records go through the same engine as every later change, so they sync like any other row.
      const ids = new Map(o.records.map((r) => [`${r.entity}:${r.key}`, uuidv7()]));
      const mutations = o.records.map((r, i): { by: string; update: boolean; mutation: Mutation } => {
        const set = Object.fromEntries(Object.entries(r.set).map(([k, v]) => [k, resolve(v, ids, users, today, images)]));
        const image = images.get(imageName(r.set.sha256) ?? '');
        // A demo photo's size is the drawing's, as the phone would have recorded it.
        if (image) Object.assign(set, { sizeBytes: image.original.length, width: image.width, height: image.height, ...set });
        return {
          by: r.by ?? admin.email,
          update: isUpdate(o.records!, i),
          mutation: { mutationId: uuidv7(), entity: r.entity, id: ids.get(`${r.entity}:${r.key}`)!, baseVersion: 0, set, hlc: formatHlc({ ms: now.getTime(), counter: i, deviceId: 'seed' }) },
        };
      });
      // The admin's records first, then each other user's, in scenario order: a technician's photos need their visit.
      const authors = [admin.email, ...new Set(mutations.map((m) => m.by).filter((by) => by !== admin.email))];
      for (const email of authors) {
        const author = o.users.find((u) => u.email === email);
        if (!author) throw new Error(`Scenario names an unknown author: ${email}`);
        const actor = { userId: users.get(email)!, organisationId: org.id, role: author.role, deviceId: 'seed' };
        const own = mutations.filter((m) => m.by === email);
        // An edit is based on the row as an earlier author left it, so it applies without a conflict.
        for (const m of own.filter((x) => x.update)) {
          const row = await em.getRepository<SyncRecord>(m.mutation.entity).findOneBy({ id: m.mutation.id });
          if (!row) throw new Error(`Scenario edits ${m.mutation.entity} ${m.mutation.id} before an earlier author made it`);
          m.mutation.baseVersion = row.version;
        }
        const results = await engine.applyAll(em, actor, own.map((m) => m.mutation));
        const refused = results.filter((r) => r.status === 'rejected');
        if (refused.length) throw new Error(`Demo data refused: ${refused.map((r) => r.error).join('; ')}`);
      }
      for (const inv of o.invoices ?? []) {
        await seedInvoice(em, org.id, inv, { ids, users, names: new Map(o.users.map((u) => [u.email, u.name])), today, images, storage: invoices ??= await createInvoiceStorage(storageConfig()) });
      }
    }
  });
  return true;
}
