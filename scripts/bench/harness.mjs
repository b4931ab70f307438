// Shared by the benchmarks: a real API process on a throwaway database, timing, and the results table.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, openSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { root } from '../lib.mjs';

export const PASSWORD = 'wiretrail-demo';

export function ensureBuilt() {
  if (!existsSync(join(root, 'api/dist/main.js')) || !existsSync(join(root, 'web/dist/index.html'))) {
    const r = spawnSync('npm', ['run', 'build'], { cwd: root, stdio: 'inherit' });
    if (r.status !== 0) process.exit(1);
  }
}

/**
 * Starts the built API (serving the built web app) on a fresh SQLite file with the demo data; `database` points it
 * at another (DB_TYPE and DATABASE_URL), and `prepare` runs on the migrated, seeded database before it starts.
 */
export async function startApi({ port, database = {}, prepare }) {
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-bench-'));
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    PORT: String(port),
    HOST: '127.0.0.1',
    DATABASE_PATH: join(dir, 'bench.sqlite'),
    JWT_SECRET: 'bench-secret-long-enough-for-signing-tokens-here',
    SIGN_IN_RATE_LIMIT: '100000',
    WEB_DIST: join(root, 'web/dist'),
    ...database,
  };
  for (const script of ['api/dist/database/migrate-cli.js', 'api/dist/database/seed-cli.js']) {
    const r = spawnSync(process.execPath, [script], { cwd: root, env, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(r.stderr);
  }
  const prepared = prepare ? await prepare(env) : undefined;
  // BENCH_API_NODE_ARGS='--cpu-prof --cpu-prof-dir=data/prof' profiles the API while a benchmark runs.
  const nodeArgs = (process.env.BENCH_API_NODE_ARGS ?? '').split(' ').filter(Boolean);
  // BENCH_API_LOG=<file> keeps what the API prints, to see why a benchmark's requests failed.
  const output = process.env.BENCH_API_LOG ? openSync(process.env.BENCH_API_LOG, 'a') : 'ignore';
  const child = spawn(process.execPath, [...nodeArgs, 'api/dist/main.js'], { cwd: root, env, stdio: ['ignore', output, output] });
  let stopping = false;
  child.once('exit', (code, signal) => {
    if (!stopping) console.error(`The API process ended during the benchmark (exit ${code ?? signal}).`);
  });
  const base = `http://127.0.0.1:${port}`;
  for (let i = 0; i < 200; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      // not yet listening
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return {
    base,
    env,
    prepared,
    pid: child.pid,
    databasePath: env.DATABASE_PATH,
    /** Peak resident memory of the API process so far (VmHWM), in MB. */
    peakMemoryMb() {
      const status = readFileSync(`/proc/${child.pid}/status`, 'utf8');
      const kb = Number(/VmHWM:\s+(\d+)/.exec(status)?.[1] ?? 0);
      return kb / 1024;
    },
    async stop() {
      stopping = true;
      if (child.exitCode !== null || child.signalCode !== null) return rmSync(dir, { recursive: true, force: true });
      child.kill('SIGTERM');
      await new Promise((r) => child.once('exit', r));
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

export async function signIn(base, email) {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status}`);
  return res.json();
}

/** The middle of several samples: benchmarks on a shared machine compare medians, as single runs swing. */
export const median = (values) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

/** How many samples a benchmark that takes medians takes (BENCH_SAMPLES to change it). */
export const SAMPLES = Number(process.env.BENCH_SAMPLES ?? 5);

export async function timed(fn) {
  const start = process.hrtime.bigint();
  const value = await fn();
  return { ms: Number(process.hrtime.bigint() - start) / 1e6, value };
}

export function printTable(rows) {
  const head = ['benchmark', 'measured', 'floor', 'ratio', 'target', 'ok'];
  const body = rows.map((r) => [r.name, r.measured, r.floor ?? '—', r.ratio != null ? `${r.ratio.toFixed(2)}×` : '—', r.target ?? '—', r.ok == null ? '—' : r.ok ? 'yes' : 'NO']);
  const widths = head.map((h, i) => Math.max(h.length, ...body.map((b) => String(b[i]).length)));
  const line = (cells) => cells.map((c, i) => String(c).padEnd(widths[i])).join('  ');
  console.log(`\n${line(head)}\n${widths.map((w) => '-'.repeat(w)).join('  ')}\n${body.map(line).join('\n')}\n`);
}
