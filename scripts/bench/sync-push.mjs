// Sync push: 10,000 mutations from 20 devices in batches, through HTTP into SQLite,
// against the floor of writing the same rows and bookkeeping with raw better-sqlite3 in one transaction.
// Batches are as large as the phone sends them (MAX_PUSH_MUTATIONS); a second row pushes batches of 100, as a phone
// that syncs every hundred changes would, for reference: each batch is a transaction of its own.
import Database from 'better-sqlite3';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MAX_PUSH_MUTATIONS } from '@wiretrail/core';
import { v7 as uuidv7 } from 'uuid';
import { root } from '../lib.mjs';
import { median, SAMPLES, signIn, startApi, timed } from './harness.mjs';

const DEVICES = 20;
const TOTAL = 10_000;
const SMALL_BATCH = 100;

function hlc(ms, counter, device) {
  return `${new Date(ms).toISOString()}-${counter.toString(16).padStart(4, '0')}-${device}`;
}

// SAMPLES runs per batch size, taken in turn: single runs swing with the disk's syncs.
export async function benchSyncPush({ port = 3601 } = {}) {
  const runs = { app: [], small: [] };
  for (let i = 0; i < SAMPLES; i++) {
    runs.app.push(await pushAll({ port, batch: MAX_PUSH_MUTATIONS }));
    runs.small.push(await pushAll({ port, batch: SMALL_BATCH }));
  }
  const summary = (rs) => {
    const measuredMs = median(rs.map((r) => r.measuredMs));
    const floorMs = median(rs.map((r) => r.floorMs));
    return { measuredMs, floorMs, perSecond: TOTAL / (measuredMs / 1000), floorDisplay: `${floorMs.toFixed(0)} ms (median of ${rs.length})` };
  };
  const app = summary(runs.app);
  const small = summary(runs.small);
  return [
    { name: `sync push: 10,000 mutations, 20 devices, batches of ${MAX_PUSH_MUTATIONS} as the phone sends`, ...app, target: 3 },
    { name: `sync push: the same in batches of ${SMALL_BATCH}`, ...small },
  ];
}

async function pushAll({ port, batch: BATCH }) {
  const api = await startApi({ port });
  try {
    const office = await signIn(api.base, 'office@larkfield.example');
    const auth = { authorization: `Bearer ${office.accessToken}`, 'content-type': 'application/json' };
    const pulled = await (await fetch(`${api.base}/api/sync/pull?checkpoint=0&limit=1000&deviceId=bench-office`, { headers: auth })).json();
    const visits = pulled.changes.filter((c) => c.entity === 'visit').map((c) => c.row);
    const now = Date.now();
    const devices = Array.from({ length: DEVICES }, (_, d) =>
      Array.from({ length: TOTAL / DEVICES }, (_, i) => {
        const v = visits[(d + i) % visits.length];
        return { mutationId: uuidv7(), entity: 'note', id: uuidv7(), baseVersion: 0, set: { visitId: v.id, siteId: v.siteId, text: `Bench note ${d}-${i}` }, hlc: hlc(now, i, `bench${d}`) };
      }),
    );
    const { ms } = await timed(() =>
      Promise.all(
        devices.map(async (mutations, d) => {
          for (let i = 0; i < mutations.length; i += BATCH) {
            const res = await fetch(`${api.base}/api/sync/push`, { method: 'POST', headers: auth, body: JSON.stringify({ deviceId: `bench${d}`, mutations: mutations.slice(i, i + BATCH) }) });
            const body = await res.json();
            if (!res.ok || body.results.some((r) => r.status !== 'applied')) throw new Error(`push failed: ${res.status} ${JSON.stringify(body).slice(0, 300)}`);
          }
        }),
      ),
    );
    const floorMs = rawFloor(devices.flat(), office.user);
    return { measuredMs: ms, floorMs, perSecond: TOTAL / (ms / 1000) };
  } finally {
    await api.stop();
  }
}

/** The same notes, change-log entries and applied-mutation records written by raw better-sqlite3 in one transaction. */
function rawFloor(mutations, user) {
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-floor-'));
  const path = join(dir, 'floor.sqlite');
  const r = spawnSync(process.execPath, ['api/dist/database/migrate-cli.js'], { cwd: root, env: { ...process.env, DATABASE_PATH: path }, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(r.stderr);
  const db = new Database(path);
  db.pragma('journal_mode = WAL');
  const note = db.prepare('INSERT INTO note (id, organisationId, version, fieldMeta, createdById, updatedById, visitId, siteId, text) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?)');
  const change = db.prepare('INSERT INTO sync_change (entity, rowId, organisationId, seq, siteId, deleted) VALUES (?, ?, ?, ?, ?, 0)');
  const applied = db.prepare('INSERT INTO applied_mutation (mutationId, organisationId, userId, deviceId, result) VALUES (?, ?, ?, ?, ?)');
  const start = process.hrtime.bigint();
  db.transaction(() => {
    let seq = 0;
    for (const m of mutations) {
      seq++;
      const meta = JSON.stringify({ visitId: { v: seq, hlc: m.hlc, by: user.id, role: 'office' }, siteId: { v: seq, hlc: m.hlc, by: user.id, role: 'office' }, text: { v: seq, hlc: m.hlc, by: user.id, role: 'office' } });
      note.run(m.id, user.organisationId, seq, meta, user.id, user.id, m.set.visitId, m.set.siteId, m.set.text);
      change.run('note', m.id, user.organisationId, seq, m.set.siteId);
      applied.run(m.mutationId, user.organisationId, user.id, 'floor', JSON.stringify({ mutationId: m.mutationId, status: 'applied', version: seq }));
    }
  })();
  const ms = Number(process.hrtime.bigint() - start) / 1e6;
  db.close();
  rmSync(dir, { recursive: true, force: true });
  return ms;
}
