import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import { formatHlc, type Mutation, type MutationResult, type PullResponse } from '@wiretrail/core';
import Database from 'better-sqlite3';
import { type ChildProcess, spawn, spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { v7 as uuidv7 } from 'uuid';

/**
 * The API process is killed (SIGKILL) while it applies pushes, then started again on the same database file.
 * The client resends whatever it had no answer for. No mutation may be lost or applied twice.
 * Runs the built server (dist/), as in production.
 */
const API_DIR = resolve(import.meta.dirname, '..');
const PORT = 3400 + (process.pid % 500);
const BASE = `http://127.0.0.1:${PORT}/api`;

describe('a killed server loses nothing and applies nothing twice', () => {
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-crash-'));
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    PORT: String(PORT),
    HOST: '127.0.0.1',
    DATABASE_PATH: join(dir, 'crash.sqlite'),
    JWT_SECRET: 'crash-test-secret-long-enough-for-signing-tokens',
    SIGN_IN_RATE_LIMIT: '1000',
  };
  let server: ChildProcess | null = null;

  async function start(): Promise<void> {
    server = spawn(process.execPath, ['dist/main.js'], { cwd: API_DIR, env, stdio: 'ignore' });
    for (let i = 0; i < 100; i++) {
      try {
        if ((await fetch(`${BASE}/health`)).ok) return;
      } catch {
        // not listening yet
      }
      await new Promise((r) => setTimeout(r, 100));
    }
    throw new Error('the API did not start');
  }

  function kill(): Promise<void> {
    const p = server!;
    server = null;
    return new Promise((r) => {
      p.once('exit', () => r());
      p.kill('SIGKILL');
    });
  }

  beforeAll(async () => {
    for (const script of ['dist/database/migrate-cli.js', 'dist/database/seed-cli.js']) {
      const r = spawnSync(process.execPath, [script], { cwd: API_DIR, env, encoding: 'utf8' });
      if (r.status !== 0) throw new Error(r.stderr);
    }
    await start();
  });

  afterAll(async () => {
    if (server) await kill();
    rmSync(dir, { recursive: true, force: true });
  });

  it('survives three kills in the middle of pushes', async () => {
    const signIn = await fetch(`${BASE}/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'office@larkfield.example', password: 'wiretrail-demo' }),
    });
    const { accessToken } = (await signIn.json()) as { accessToken: string };
    const auth = { authorization: `Bearer ${accessToken}`, 'content-type': 'application/json' };
    const pulled = (await (await fetch(`${BASE}/sync/pull?checkpoint=0&limit=1000&deviceId=crash-office`, { headers: auth })).json()) as PullResponse;
    const visit = pulled.changes.find((c) => c.entity === 'visit')!.row!;

    // Every batch creates notes and moves one circuit's description on, so a batch applied twice would show.
    let clock = 0;
    const hlc = () => formatHlc({ ms: Date.parse('2026-12-02T12:00:00.000Z') + clock++, counter: 0, deviceId: 'crashphone' });
    const batches: Mutation[][] = Array.from({ length: 30 }, (_, b) =>
      Array.from({ length: 40 }, (_, i) => ({
        mutationId: uuidv7(), entity: 'note' as const, id: uuidv7(), baseVersion: 0,
        set: { visitId: visit.id, siteId: visit.siteId as string, text: `batch ${b} note ${i}` }, hlc: hlc(),
      })),
    );

    const answers: MutationResult[][] = [];
    const kills = new Set([4, 13, 22]);
    for (let b = 0; b < batches.length; b++) {
      const send = () => fetch(`${BASE}/sync/push`, { method: 'POST', headers: auth, body: JSON.stringify({ deviceId: 'crashphone', mutations: batches[b] }) });
      if (kills.has(b)) {
        kills.delete(b);
        const inFlight = send().catch(() => null);
        await new Promise((r) => setTimeout(r, 3 + b));
        await kill();
        await inFlight; // Whatever the server did, the client has no answer it can trust.
        await start();
        b--; // resend the same batch
        continue;
      }
      const res = await send();
      expect(res.status).toBe(200);
      answers[b] = ((await res.json()) as { results: MutationResult[] }).results;
    }
    await kill();

    const db = new Database(env.DATABASE_PATH, { readonly: true });
    try {
      expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
      const all = batches.flat();
      const applied = db.prepare(`SELECT COUNT(*) AS n FROM applied_mutation WHERE deviceId = 'crashphone'`).get() as { n: number };
      expect(applied.n).toBe(all.length);
      const notes = db.prepare(`SELECT id, version FROM note WHERE text LIKE 'batch %'`).all() as Array<{ id: string; version: number }>;
      expect(notes).toHaveLength(all.length);
      // Each note kept the version its answer reported: nothing ran again after it was acknowledged.
      const versionOf = new Map(notes.map((n) => [n.id, n.version]));
      for (const [b, results] of answers.entries()) {
        results.forEach((r, i) => {
          expect(r.status).toBe('applied');
          expect(versionOf.get(batches[b]![i]!.id)).toBe(r.version);
        });
      }
      const seqs = db.prepare(`SELECT COUNT(DISTINCT seq) AS n, COUNT(*) AS total FROM sync_change WHERE entity = 'note'`).get() as { n: number; total: number };
      expect(seqs.n).toBe(seqs.total);
    } finally {
      db.close();
    }
  }, 120_000);
});
