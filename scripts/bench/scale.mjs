// Scale: five years of a busy contractor (scale-data.mjs) on SQLite and on PostgreSQL, and the figures an office and
// its technicians feel on it, each against a floor measured in the same run: the same rows read by the database
// driver alone, in the bench process, with no HTTP, no Nest and no checks. BENCH_SCALE sizes the data (1 is the full
// five years; 0.1 by default, which generates in well under a minute on 2 cores).
import { spawnSync } from 'node:child_process';
import { createHash, randomUUID } from 'node:crypto';
import sharp from 'sharp';
import autocannon from 'autocannon';
import { root } from '../lib.mjs';
import { canStartPostgres, startPostgres } from '../postgres.mjs';
import { median, SAMPLES, signIn, startApi, timed } from './harness.mjs';
import { numbered, uploadOne } from './photos.mjs';

const SCALE = Number(process.env.BENCH_SCALE ?? 0.1);
const p95 = (values) => [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.ceil(values.length * 0.95) - 1)];

/** A photo-like JPEG (blurred noise, as the photos benchmark makes): a phone's picture after its shrink. */
async function photoLike(width, height) {
  const raw = Buffer.alloc(width * height * 3);
  let x = 7;
  for (let i = 0; i < raw.length; i++) {
    x = (x * 1103515245 + 12345) >>> 0;
    raw[i] = (x >>> 24) & 0x7f;
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).blur(1.2).jpeg({ quality: 88 }).toBuffer();
}

/** The database read directly, for the floors and the query plans: `?` marks on both. */
async function rawClient(env) {
  if (env.DB_TYPE === 'postgres') {
    const { default: pg } = await import('pg');
    const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 2 });
    const query = async (sql, params = []) => {
      let i = 0;
      return (await pool.query(sql.replace(/\?/g, () => `$${++i}`), params)).rows;
    };
    return {
      query,
      plan: async (sql, params) => (await query(`EXPLAIN ${sql}`, params)).map((r) => r['QUERY PLAN']),
      close: () => pool.end(),
    };
  }
  const { default: Database } = await import('better-sqlite3');
  const db = new Database(env.DATABASE_PATH, { readonly: true });
  return {
    query: async (sql, params = []) => db.prepare(sql).all(...params),
    plan: async (sql, params = []) => db.prepare(`EXPLAIN QUERY PLAN ${sql}`).all(...params).map((r) => r.detail),
    close: () => db.close(),
  };
}

/** Rows by id, as the floor of a pull: the same tables, in lists of a few hundred, serialised as the API sends them. */
async function rowsById(raw, table, ids) {
  const out = [];
  for (let i = 0; i < ids.length; i += 500) {
    const part = ids.slice(i, i + 500);
    out.push(...(await raw.query(`SELECT * FROM "${table}" WHERE "id" IN (${part.map(() => '?').join(', ')})`, part)));
  }
  return out;
}

const TABLES = { customer: 'customer', site: 'site', area: 'area', board: 'board', circuit: 'circuit', job: 'job', visit: 'visit', photo: 'photo', note: 'note', cableRun: 'cable_run', pointChange: 'point_change', testResult: 'test_result', document: 'document', priceItem: 'price_item', materialLine: 'material_line', conflict: 'conflict' };

async function pullAll(base, token, deviceId, checkpoint = 0) {
  const changes = [];
  for (;;) {
    const res = await fetch(`${base}/api/sync/pull?checkpoint=${checkpoint}&limit=1000&deviceId=${deviceId}`, { headers: { authorization: `Bearer ${token}` } });
    if (!res.ok) throw new Error(`pull answered ${res.status}`);
    const page = await res.json();
    if (page.reset) throw new Error('pull was reset');
    changes.push(...page.changes);
    checkpoint = page.checkpoint;
    if (!page.hasMore) return { changes, checkpoint };
  }
}

async function getJson(base, token, path) {
  const res = await fetch(`${base}/api${path}`, { headers: { authorization: `Bearer ${token}` } });
  if (!res.ok) throw new Error(`${path} answered ${res.status}`);
  return res.json();
}

function generate(env) {
  const r = spawnSync(process.execPath, ['scripts/bench/scale-data.mjs'], { cwd: root, env: { ...env, SCALE: String(SCALE) }, encoding: 'utf8', maxBuffer: 1 << 24 });
  if (r.status !== 0) throw new Error(`generating the data failed: ${r.stderr}`);
  process.stdout.write(r.stdout.split('\n').filter((l) => l.startsWith('  ')).join('\n') + '\n');
  return JSON.parse(r.stdout.trim().split('\n').at(-1));
}

async function onDatabase(label, database, port) {
  const api = await startApi({ port, database, prepare: (env) => generate(env) });
  const raw = await rawClient(api.env);
  const out = [];
  const plans = {};
  const row = (name, measured, floor, extra = {}) => out.push({
    name: `scale (${label}): ${name}`,
    measuredMs: measured,
    floorMs: floor ?? undefined,
    ...extra,
  });
  try {
    const data = api.prepared;
    const office = await signIn(api.base, 'office@larkfield.example');
    const tech = await signIn(api.base, 'tech1@larkfield.example');
    const org = office.user.organisationId;

    // A technician's first pull of their scope, on as many new devices as samples; the floor reads the same rows.
    const first = [];
    const devices = [];
    let scopeRows = [];
    for (let i = 0; i < SAMPLES; i++) {
      const deviceId = `scale-${label.toLowerCase()}-${i}`;
      const { ms, value } = await timed(() => pullAll(api.base, tech.accessToken, deviceId));
      first.push(ms);
      devices.push({ deviceId, checkpoint: value.checkpoint });
      scopeRows = value.changes;
    }
    const byEntity = new Map();
    for (const c of scopeRows) if (!c.deleted) (byEntity.get(c.entity) ?? byEntity.set(c.entity, []).get(c.entity)).push(c.id);
    const firstFloor = [];
    for (let i = 0; i < SAMPLES; i++) {
      firstFloor.push((await timed(async () => {
        const log = await raw.query(`SELECT * FROM "sync_change" WHERE "organisationId" = ? ORDER BY "seq"`, [org]);
        let bytes = log.length;
        for (const [entity, ids] of byEntity) bytes += JSON.stringify(await rowsById(raw, TABLES[entity], ids)).length;
        return bytes;
      })).ms);
    }
    row(`technician's first pull of their scope (${scopeRows.length.toLocaleString('en-GB')} rows), median of ${SAMPLES}`, median(first), median(firstFloor), {
      floorDisplay: `${median(firstFloor).toFixed(0)} ms (the organisation's change log and the same rows by the driver)`,
    });

    // A day's changes: twenty technicians' worth of edits across the organisation, a twentieth of them in tech1's patch.
    const mine = new Set(scopeRows.filter((c) => c.entity === 'circuit').map((c) => c.id));
    const circuits = await raw.query(`SELECT "id", "version" FROM "circuit" WHERE "organisationId" = ? ORDER BY "id" LIMIT 4000`, [org]);
    const dayEdits = circuits.filter((c, i) => (mine.has(c.id) ? i % 2 === 0 : i % 4 === 0)).slice(0, 1000);
    // Through the office's REST edits, as the desk makes them, four at a time.
    for (let i = 0; i < dayEdits.length; i += 4) {
      await Promise.all(dayEdits.slice(i, i + 4).map(async (c, j) => {
        const res = await fetch(`${api.base}/api/circuits/${c.id}`, {
          method: 'PATCH', headers: { authorization: `Bearer ${office.accessToken}`, 'content-type': 'application/json' }, body: JSON.stringify({ description: `Checked on the day, ${i + j}` }),
        });
        if (!res.ok) throw new Error(`the day's changes were refused: ${res.status} ${await res.text()}`);
      }));
    }
    const incremental = [];
    let dayRows = 0;
    for (const d of devices) {
      // Pulled from the same checkpoint each time (the device's last but one is accepted again).
      for (let k = 0; k < 4; k++) {
        const { ms, value } = await timed(() => pullAll(api.base, tech.accessToken, d.deviceId, d.checkpoint));
        incremental.push(ms);
        dayRows = value.changes.length;
      }
    }
    const sites = [...new Set(scopeRows.filter((c) => c.entity === 'site').map((c) => c.id))];
    const pageSql = `SELECT * FROM "sync_change" WHERE "organisationId" = ? AND "seq" > ? AND "siteId" IN (${sites.map(() => '?').join(', ')}) ORDER BY "seq" LIMIT 1000`;
    const incFloor = [];
    for (let i = 0; i < incremental.length; i++) {
      incFloor.push((await timed(async () => {
        const log = await raw.query(pageSql, [org, devices[0].checkpoint, ...sites]);
        const ids = new Map();
        for (const c of log) (ids.get(c.entity) ?? ids.set(c.entity, []).get(c.entity)).push(c.rowId);
        let bytes = 0;
        for (const [entity, list] of ids) bytes += JSON.stringify(await rowsById(raw, TABLES[entity], list)).length;
        return bytes;
      })).ms);
    }
    plans['incremental pull: the change log page'] = await raw.plan(pageSql, [org, devices[0].checkpoint, ...sites]);
    row(`technician's incremental pull after a day's changes (${dayRows} rows), p95 of ${incremental.length}`, p95(incremental), median(incFloor), {
      display: `${p95(incremental).toFixed(0)} ms (median ${median(incremental).toFixed(0)})`,
      floorDisplay: `${median(incFloor).toFixed(0)} ms (the change log page and its rows by the driver)`,
      targetDisplay: 'p95 ≤ 50 ms', ok: p95(incremental) <= 50,
    });

    // The office's jobs table, sorted and filtered, first, middle and last pages.
    const [{ total: doneJobs }] = await raw.query(`SELECT COUNT(*) AS "total" FROM "job" WHERE "organisationId" = ? AND "status" = 'done' AND "deletedAt" IS NULL`, [org]);
    const lastPage = Math.max(1, Math.ceil(Number(doneJobs) / 50));
    const jobTimes = [];
    const jobFloor = [];
    const orderOf = { created: `"createdAt" DESC`, customer: `(SELECT "c"."name" FROM "customer" "c" WHERE "c"."id" = "r"."customerId") ASC`, reference: `"reference" ASC` };
    for (let s = 0; s < SAMPLES; s++) {
      for (const sort of Object.keys(orderOf)) {
        for (const page of [1, Math.ceil(lastPage / 2), lastPage]) {
          jobTimes.push((await timed(() => getJson(api.base, office.accessToken, `/jobs?status=done&sort=${sort}&page=${page}&pageSize=50`))).ms);
          const sql = `SELECT * FROM "job" "r" WHERE "r"."organisationId" = ? AND "r"."status" = 'done' AND "r"."deletedAt" IS NULL ORDER BY ${orderOf[sort]}, "r"."id" LIMIT 50 OFFSET ${(page - 1) * 50}`;
          jobFloor.push((await timed(async () => {
            await raw.query(`SELECT COUNT(*) AS "n" FROM "job" "r" WHERE "r"."organisationId" = ? AND "r"."status" = 'done' AND "r"."deletedAt" IS NULL`, [org]);
            return raw.query(sql, [org]);
          })).ms);
          if (s === 0 && page === lastPage) plans[`jobs table: sorted by ${sort}, last page`] = await raw.plan(sql, [org]);
        }
      }
    }
    row(`office jobs table, done jobs sorted by created, customer and reference, first, middle and last of ${lastPage} pages, p95 of ${jobTimes.length}`, p95(jobTimes), median(jobFloor), {
      display: `${p95(jobTimes).toFixed(0)} ms (median ${median(jobTimes).toFixed(0)})`, targetDisplay: 'p95 ≤ 100 ms', ok: p95(jobTimes) <= 100,
    });

    // The conflicts inbox, the aged debt, and the site page of the site with 500 cable runs.
    const simple = async (name, request, floor, plansOf = {}) => {
      const measured = [];
      const floors = [];
      for (let s = 0; s < SAMPLES; s++) {
        measured.push((await timed(request)).ms);
        floors.push((await timed(floor)).ms);
      }
      for (const [k, [sql, params]] of Object.entries(plansOf)) plans[k] = await raw.plan(sql, params);
      row(`${name}, median of ${SAMPLES}`, median(measured), median(floors));
    };
    const openConflicts = `SELECT * FROM "conflict" WHERE "organisationId" = ? AND "resolvedAt" IS NULL AND "deletedAt" IS NULL ORDER BY "version" DESC LIMIT 50`;
    await simple('conflicts inbox, first page', () => getJson(api.base, office.accessToken, '/conflicts?page=1&pageSize=50'), () => raw.query(openConflicts, [org]), { 'conflicts inbox': [openConflicts, [org]] });
    const owed = `SELECT * FROM "invoice" WHERE "organisationId" = ? AND "kind" = 'invoice' AND "status" = 'issued'`;
    await simple(`aged debt over ${Math.round(20_000 * SCALE).toLocaleString('en-GB')} invoices`, () => getJson(api.base, office.accessToken, '/invoices/aged-debt'), async () => {
      const invoices = await raw.query(owed, [org]);
      await raw.query(`SELECT * FROM "payment" WHERE "organisationId" = ?`, [org]);
      return invoices;
    }, { 'aged debt: issued invoices': [owed, [org]] });
    const site = data.bigSite;
    const siteRuns = `SELECT * FROM "cable_run" WHERE "siteId" = ? AND "organisationId" = ? AND "deletedAt" IS NULL ORDER BY "label"`;
    await simple('site page of the site with 500 cable runs (site, areas, boards, circuits, the whole cable schedule)', () => Promise.all([
      getJson(api.base, office.accessToken, `/sites/${site}`),
      getJson(api.base, office.accessToken, `/areas?pageSize=200&siteId=${site}`),
      getJson(api.base, office.accessToken, `/boards?pageSize=200&siteId=${site}`),
      getJson(api.base, office.accessToken, `/circuits?pageSize=200&siteId=${site}`),
      (async () => {
        for (let page = 1, got = 0; ; page++) {
          const p = await getJson(api.base, office.accessToken, `/cable-runs?siteId=${site}&page=${page}&pageSize=200`);
          got += p.items.length;
          if (got >= p.total || !p.items.length) return;
        }
      })(),
    ]), async () => {
      await raw.query(`SELECT * FROM "site" WHERE "id" = ?`, [site]);
      for (const t of ['area', 'board', 'circuit']) await raw.query(`SELECT * FROM "${t}" WHERE "siteId" = ? AND "deletedAt" IS NULL`, [site]);
      return raw.query(siteRuns, [site, org]);
    }, { 'site page: the cable schedule': [siteRuns, [site, org]] });

    // A photo record of 50 photos on one of tech1's jobs: small real images sent over tus as the phone sends them,
    // their rows pushed by the phone, then issued by the office. Once: a job's photo record is issued once.
    const visit = scopeRows.find((c) => c.entity === 'visit' && c.row?.status === 'planned')?.row;
    const photoDevice = `scalephotos${label.toLowerCase()}`;
    const base = await photoLike(1600, 1200);
    const mutations = [];
    for (let i = 0; i < 50; i++) {
      const bytes = numbered(base, i);
      await uploadOne(api.base, tech.accessToken, bytes);
      mutations.push({
        mutationId: randomUUID(), entity: 'photo', id: randomUUID(), baseVersion: 0,
        set: { visitId: visit.id, siteId: visit.siteId, caption: `Containment run ${i + 1}`, sha256: createHash('sha256').update(bytes).digest('hex'), sizeBytes: bytes.length, width: 1600, height: 1200, takenAt: new Date().toISOString() },
        hlc: `${new Date().toISOString()}-${i.toString(16).padStart(4, '0')}-${photoDevice}`,
      });
    }
    const pushed = await fetch(`${api.base}/api/sync/push`, { method: 'POST', headers: { authorization: `Bearer ${tech.accessToken}`, 'content-type': 'application/json' }, body: JSON.stringify({ deviceId: photoDevice, mutations }) });
    if (!pushed.ok) throw new Error(`the photo rows were refused: ${pushed.status}`);
    const issue = await timed(async () => {
      const res = await fetch(`${api.base}/api/jobs/${visit.jobId}/documents`, { method: 'POST', headers: { authorization: `Bearer ${office.accessToken}`, 'content-type': 'application/json' }, body: JSON.stringify({ kind: 'photo-record' }) });
      if (!res.ok) throw new Error(`issuing the photo record answered ${res.status}: ${await res.text()}`);
    });
    out.push({ name: `scale (${label}): issuing a photo record of 50 photos (1600 × 1200), once`, measuredMs: issue.ms, display: `${issue.ms.toFixed(0)} ms`, targetDisplay: '< 3 s', ok: issue.ms < 3000 });

    // Memory under 100 connections on this data: the jobs table, the conflicts inbox and a technician's pull, mixed.
    const d = devices[0];
    const load = await new Promise((resolve, reject) => autocannon({
      url: api.base, connections: 100, duration: 10,
      requests: [
        { method: 'GET', path: `/api/jobs?status=done&sort=customer&page=${Math.ceil(lastPage / 2)}&pageSize=50`, headers: { authorization: `Bearer ${office.accessToken}` } },
        { method: 'GET', path: '/api/conflicts?page=1&pageSize=50', headers: { authorization: `Bearer ${office.accessToken}` } },
        { method: 'GET', path: `/api/sync/pull?checkpoint=${d.checkpoint}&limit=500&deviceId=${d.deviceId}`, headers: { authorization: `Bearer ${tech.accessToken}` } },
      ],
    }, (err, res) => (err ? reject(err) : resolve(res))));
    const peak = api.peakMemoryMb();
    out.push({
      name: `scale (${label}): API peak memory under 100 connections (jobs, conflicts, pulls; ${Math.round(load.requests.average)} req/s, errors ${load.errors}, non-2xx ${load.non2xx})`,
      measuredMs: peak, display: `${peak.toFixed(0)} MB`, targetDisplay: '≤ 250 MB', ok: peak <= 250,
    });
    out.push({ name: `scale (${label}): data`, measuredMs: data.seconds * 1000, display: `${JSON.stringify(data.counts)}, ${data.changeEntries} change-log entries and ${data.replays} replay records, generated in ${data.seconds.toFixed(0)} s`, plans });
    for (const [k, lines] of Object.entries(plans)) console.log(`  plan (${label}) ${k}:\n${lines.map((l) => `    ${l}`).join('\n')}`);
    return out;
  } finally {
    await raw.close();
    await api.stop();
  }
}

export async function benchScale({ port = Number(process.env.BENCH_SCALE_PORT ?? 3606) } = {}) {
  process.stdout.write(`  scale ${SCALE} of the full five years (BENCH_SCALE)\n`);
  const results = await onDatabase('SQLite', {}, port);
  if (!canStartPostgres()) return [...results, { name: 'scale (PostgreSQL)', measuredMs: 0, display: 'not run: no PostgreSQL server programs here' }];
  const pg = await startPostgres();
  try {
    return [...results, ...(await onDatabase('PostgreSQL', { DB_TYPE: 'postgres', DATABASE_URL: pg.url }, port + 1))];
  } finally {
    pg.stop();
  }
}
