#!/usr/bin/env node
// Five years of a busy contractor, written straight into a migrated and seeded database (SQLite or PostgreSQL, as
// DB_TYPE and DATABASE_URL or DATABASE_PATH say) by bulk inserts in transactions. Deterministic: the same scale gives
// the same rows. Run by scale.mjs as its own process; SCALE (1 = the full five years) sizes everything.
import { formatHlc, SYNC_ENTITIES } from '@wiretrail/core';

const SCALE = Number(process.env.SCALE ?? 0.1);
const { default: dataSource } = await import('../../api/dist/database/data-source.js');
const { insertMany } = await import('../../api/dist/sync/bulk-write.js');
const { SYNC_SCHEMAS } = await import('../../api/dist/sync/entities/sync-schemas.js');
const { SyncChange, AppliedMutation } = await import('../../api/dist/sync/entities/sync-bookkeeping.entity.js');
const { Invoice } = await import('../../api/dist/invoices/entities/invoice.entity.js');
const { Payment } = await import('../../api/dist/invoices/entities/payment.entity.js');
const { User } = await import('../../api/dist/users/entities/user.entity.js');
const { Person } = await import('../../api/dist/users/entities/person.entity.js');

/** The issue's five years; each scaled by SCALE. */
export const FULL = {
  technicians: 20, customers: 5_000, sites: 8_000, jobs: 50_000, visits: 200_000, siteRecords: 400_000, photos: 100_000,
  changeLog: 2_000_000, invoices: 20_000,
};
const n = (k) => Math.max(1, Math.round(FULL[k] * (k === 'technicians' ? 1 : SCALE)));

// mulberry32: a small seeded generator, so every run writes the same rows.
let state = 0x5eed;
const random = () => {
  state = (state + 0x6d2b79f5) | 0;
  let t = Math.imul(state ^ (state >>> 15), 1 | state);
  t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
  return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
};
const pick = (list) => list[Math.floor(random() * list.length)];
let idCounter = 0;
/** A UUID (version 7 layout) from a counter: unique, ordered and the same on every run. */
const nextId = () => {
  const h = (++idCounter).toString(16).padStart(20, '0');
  return `01900000-${h.slice(0, 4)}-7${h.slice(4, 7)}-8${h.slice(7, 10)}-${h.slice(8, 20)}`;
};

const DAY = 86_400_000;
const END = Date.parse('2026-12-01T08:00:00.000Z');
const START = END - 5 * 365 * DAY;
const at = (fraction) => new Date(START + Math.floor(fraction * (END - START)));

await dataSource.initialize();
const em = dataSource.manager;
const [org] = await em.query(`SELECT "id" FROM "organisation" WHERE "name" LIKE 'Larkfield%'`);
const orgId = org.id;
const staff = await em.query(`SELECT "id", "email", "role" FROM "user" WHERE "organisationId" = '${orgId}'`);
const officeId = staff.find((u) => u.role === 'office' || u.role === 'admin').id;
const demoTechs = staff.filter((u) => u.role === 'technician').map((u) => u.id);

const [{ value: lastSeq }] = await em.query(`SELECT "value" FROM "sync_counter" WHERE "name" = 'global'`);
let seq = Number(lastSeq);
const pending = new Map();
const counts = {};
let changeEntries = 0;

function hlcFor(time, by) {
  return formatHlc({ ms: time.getTime(), counter: 0, deviceId: by === officeId ? 'office' : `p${by.slice(-6)}` });
}

/** A synced row as the engine would have left it: numbered, stamped per field, and logged for pulls. */
function add(entity, fields, { time, by = officeId, deleted = false } = {}) {
  const id = fields.id ?? nextId();
  const version = ++seq;
  const hlc = hlcFor(time, by);
  const fieldMeta = {};
  for (const f of Object.keys(fields)) if (f !== 'id') fieldMeta[f] = { v: version, hlc, by, role: by === officeId ? 'office' : 'technician' };
  const row = { ...fields, id, organisationId: orgId, version, fieldMeta, deletedAt: deleted ? time : null, createdById: by, updatedById: by, createdAt: time, updatedAt: time };
  queue(entity, row);
  const spec = SYNC_ENTITIES[entity];
  const siteId = spec.siteField === 'id' ? id : spec.siteField === 'siteId' ? fields.siteId : null;
  queue('$change', { entity, rowId: id, organisationId: orgId, seq: version, siteId, deleted, changedAt: time });
  changeEntries++;
  counts[entity] = (counts[entity] ?? 0) + 1;
  return id;
}

function queue(target, row) {
  if (!pending.has(target)) pending.set(target, []);
  const rows = pending.get(target);
  rows.push(row);
  if (rows.length >= 5_000) return flush(target);
}

const targets = { $change: SyncChange, $applied: AppliedMutation, $invoice: Invoice, $payment: Payment, $user: User, $person: Person };
const written = [];
function flush(target) {
  const rows = pending.get(target);
  pending.set(target, []);
  written.push([target, rows]);
}

/** Writes what is waiting, in transactions of a few thousand rows per table, 100 rows a statement. */
async function commit() {
  for (const t of pending.keys()) flush(t);
  const work = written.splice(0);
  await dataSource.transaction(async (tx) => {
    for (const [target, rows] of work) {
      const entity = targets[target] ?? SYNC_SCHEMAS[target];
      for (let i = 0; i < rows.length; i += 100) await insertMany(tx, entity, rows.slice(i, i + 100));
    }
  });
}

const started = Date.now();
const log = (what) => process.stdout.write(`  ${what} (${((Date.now() - started) / 1000).toFixed(1)} s)\n`);

// People: the demo's technicians and more, to twenty.
const techs = [...demoTechs];
while (techs.length < n('technicians')) {
  const id = nextId();
  const email = `scale-tech-${techs.length}@larkfield.example`;
  queue('$person', { id, email, passwordHash: '!' });
  queue('$user', { id, organisationId: orgId, personId: id, email, name: `Technician ${techs.length + 1}`, role: 'technician', active: true });
  techs.push(id);
}

const customers = [];
for (let i = 0; i < n('customers'); i++) {
  customers.push(add('customer', { name: `Customer ${i + 1} Ltd`, phone: `01632 ${String(100000 + i).slice(-6)}`, email: `accounts${i}@customer.example` }, { time: at(i / n('customers') * 0.9) }));
}
const sites = [];
const siteIndex = new Map();
const siteCustomer = new Map();
const siteCircuits = new Map();
for (let i = 0; i < n('sites'); i++) {
  const customerId = customers[i % customers.length];
  const time = at(i / n('sites') * 0.95);
  const siteId = add('site', { customerId, name: i % 3 ? null : `Unit ${i}`, address: `${i + 1} Quarry Row, Wendmouth`, postcode: `WD${i % 9} ${i % 10}QR`, earthing: pick(['TN-C-S', 'TN-S', 'TT']), zeOhm: 0.2 + random() / 2 }, { time });
  siteIndex.set(siteId, sites.length);
  sites.push(siteId);
  siteCustomer.set(siteId, customerId);
  const areaId = add('area', { siteId, name: 'Ground floor' }, { time });
  add('area', { siteId, name: 'First floor' }, { time });
  const boardId = add('board', { siteId, areaId, name: 'Consumer unit' }, { time });
  const circuits = [];
  for (let c = 1; c <= 6; c++) circuits.push(add('circuit', { siteId, boardId, number: String(c), description: `Circuit ${c}`, kind: c <= 2 ? 'ring' : 'radial', deviceType: 'B', deviceRatingA: c <= 2 ? 32 : 16, liveCsaMm2: 2.5, cpcCsaMm2: 1.5 }, { time }));
  siteCircuits.set(siteId, circuits);
}
await commit();
log(`${counts.customer} customers, ${counts.site} sites with areas, boards and circuits`);

const jobs = [];
const jobSite = new Map();
const STATUSES = ['enquiry', 'booked', 'on-site', 'paperwork', 'done', 'done', 'done', 'cancelled'];
for (let i = 0; i < n('jobs'); i++) {
  const siteId = pick(sites);
  const time = at(i / n('jobs'));
  const recent = i > n('jobs') * 0.97;
  const id = add('job', { siteId, customerId: siteCustomer.get(siteId), reference: `J-${String(i + 1).padStart(6, '0')}`, title: pick(['Kitchen sockets', 'Rewire', 'EV charger', 'Data points', 'Consumer unit change', 'Outside lights']), status: recent ? pick(STATUSES.slice(0, 4)) : pick(STATUSES.slice(4)) }, { time });
  jobs.push(id);
  jobSite.set(id, siteId);
  if (i % 5_000 === 4_999) await commit();
}
await commit();
log(`${counts.job} jobs`);

// One site, the big office block, carries 500 cable runs: the site page's figure.
const bigSite = sites[0];
const visits = [];
for (let i = 0; i < n('visits'); i++) {
  const jobId = jobs[Math.floor((i / n('visits')) * jobs.length)];
  const time = at(i / n('visits'));
  // Each technician works a patch: the sites of their visits are one in twenty.
  const tech = techs[siteIndex.get(jobSite.get(jobId)) % techs.length];
  const recent = time.getTime() > END - 30 * DAY;
  const id = add('visit', { jobId, siteId: jobSite.get(jobId), technicianIds: [tech], plannedStart: time.toISOString(), plannedEnd: new Date(time.getTime() + 4 * 3_600_000).toISOString(), status: recent ? 'planned' : 'finished' }, { time });
  visits.push([id, jobSite.get(jobId), tech, time]);
  if (i % 10_000 === 9_999) await commit();
}
await commit();
log(`${counts.visit} visits`);

const records = n('siteRecords');
for (let i = 0; i < records; i++) {
  const [visitId, visitSite, tech, time] = visits[Math.floor((i / records) * visits.length)];
  const siteId = i < 500 ? bigSite : visitSite;
  const kind = i < 500 ? 0 : i % 4;
  const by = tech;
  if (kind === 0 || kind === 1) add('cableRun', { siteId, label: `C-${String(i).padStart(5, '0')}`, medium: pick(['Cat6', 'Cat6A']), status: 'tested', scheme: 'T568B', lengthM: 5 + Math.floor(random() * 80), nvp: 0.69, verdict: 'pass' }, { time, by });
  else if (kind === 2) add('pointChange', { visitId, siteId: visitSite, circuitId: pick(siteCircuits.get(visitSite)), action: 'add', connection: 'radial', toDescription: 'Above the worktop', toHeightMm: 1100 }, { time, by });
  else add('testResult', { visitId, siteId: visitSite, circuitId: pick(siteCircuits.get(visitSite)), r1r2Ohm: 0.3 + random(), zsOhm: 0.5 + random(), irLiveEarthMOhm: 200, irTestVoltageV: 500, polarity: 'correct', instrument: 'MFT serial 0001' }, { time, by });
  if (i % 20_000 === 19_999) await commit();
}
await commit();
log(`${counts.cableRun} cable runs, ${counts.pointChange} point changes, ${counts.testResult} test results`);

for (let i = 0; i < n('photos'); i++) {
  const [visitId, siteId, tech, time] = visits[Math.floor((i / n('photos')) * visits.length)];
  const hash = (i + 1).toString(16).padStart(64, '0');
  add('photo', { visitId, siteId, caption: `Photo ${i + 1}`, tags: ['before'], sha256: hash, sizeBytes: 180_000, width: 1600, height: 1200, uploadState: 'ready', takenAt: time.toISOString() }, { time, by: tech });
  // Notes beside them; one in twenty deleted since, whose tombstones the change log keeps until compacted.
  add('note', { visitId, siteId, text: `Note ${i + 1}: cable route checked before boarding`, recordedAt: time.toISOString() }, { time, by: tech, deleted: i % 20 === 0 });
  if (i % 20_000 === 19_999) await commit();
}
await commit();
log(`${counts.photo} photo rows, ${counts.note} notes`);

// Conflicts: most settled long ago, the last few waiting in the inbox.
const conflicts = Math.max(20, Math.round(2_000 * SCALE));
for (let i = 0; i < conflicts; i++) {
  const [visitId, , tech, time] = visits[Math.floor((i / conflicts) * visits.length)];
  const open = i >= conflicts - 40;
  add('conflict', {
    entity: 'visit', rowId: visitId, field: 'workDescription', reason: 'concurrent-edit', baseVersion: 1,
    keptValue: 'Sockets added', keptById: officeId, keptHlc: hlcFor(time, officeId),
    discardedValue: 'Sockets added in the kitchen', discardedById: tech, discardedHlc: hlcFor(time, tech), discardedDeviceId: `p${tech.slice(-6)}`,
    resolvedAt: open ? null : time, resolvedById: open ? null : officeId, resolution: open ? null : 'kept',
  }, { time });
}
await commit();

// Invoices: issued over the years, nearly all paid; the last months' still owed.
for (let i = 0; i < n('invoices'); i++) {
  const jobId = jobs[Math.floor((i / n('invoices')) * jobs.length)];
  const issued = at(i / n('invoices'));
  const day = issued.toISOString().slice(0, 10);
  const due = new Date(issued.getTime() + 30 * DAY).toISOString().slice(0, 10);
  const gross = 12_000 + Math.floor(random() * 200_000);
  const id = nextId();
  queue('$invoice', {
    id, organisationId: orgId, jobId, kind: 'invoice', status: 'issued', number: `INV-${String(i + 1).padStart(6, '0')}`, termDays: 30,
    issueDate: day, dueDate: due, issuedAt: issued, issuedById: officeId, netMinor: Math.round(gross / 1.2), vatMinor: gross - Math.round(gross / 1.2), grossMinor: gross,
    createdById: officeId, createdAt: issued, updatedAt: issued,
  });
  if (issued.getTime() < END - 120 * DAY || random() < 0.3) {
    queue('$payment', { id: nextId(), organisationId: orgId, invoiceId: id, amountMinor: gross, method: 'bank-transfer', receivedOn: due, recordedById: officeId, refundMinor: 0, createdAt: issued, updatedAt: issued });
  }
  if (i % 5_000 === 4_999) await commit();
}
await commit();
log(`${n('invoices')} invoices`);

// The replay records of five years of pushes, up to the change log's total.
const replays = Math.max(0, n('changeLog') - changeEntries);
for (let i = 0; i < replays; i++) {
  const tech = techs[i % techs.length];
  const time = at(i / replays);
  queue('$applied', { mutationId: nextId(), organisationId: orgId, userId: tech, deviceId: `p${tech.slice(-6)}`, result: { mutationId: '', status: 'applied' }, appliedAt: time });
  if (i % 50_000 === 49_999) await commit();
}
await commit();
await em.query(`UPDATE "sync_counter" SET "value" = ${seq} WHERE "name" = 'global'`);
log(`${changeEntries} change-log entries and ${replays} replay records`);
// Fresh statistics, as a database that has grown over years would have: the planner chooses from them.
await em.query('ANALYZE');
await dataSource.destroy();
console.log(JSON.stringify({ bigSite, counts, changeEntries, replays, seconds: (Date.now() - started) / 1000 }));
