#!/usr/bin/env node
// A throwaway PostgreSQL server from Debian's package, for running the API on PostgreSQL in tests and benchmarks.
//   node scripts/postgres.mjs run -- <command…>   start one, run the command with DB_TYPE and DATABASE_URL set, stop it
import { spawn, spawnSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** Debian keeps each major version's server programs in /usr/lib/postgresql/<major>/bin; the newest wins. */
export function postgresBinaries() {
  if (process.env.PG_BIN) return existsSync(join(process.env.PG_BIN, 'pg_ctl')) ? process.env.PG_BIN : null;
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const majors = readdirSync(base).filter((v) => existsSync(join(base, v, 'bin', 'pg_ctl'))).sort((a, b) => Number(b) - Number(a));
  return majors.length ? join(base, majors[0], 'bin') : null;
}

// The server refuses to run as root; Debian's package makes the `postgres` account for it.
const asRoot = process.getuid?.() === 0;

function command(bin, program, args) {
  return asRoot ? ['runuser', ['-u', 'postgres', '--', join(bin, program), ...args]] : [join(bin, program), args];
}

function runQuietly(bin, program, args) {
  const [cmd, argv] = command(bin, program, args);
  const r = spawnSync(cmd, argv, { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`${program} failed (exit ${r.status ?? r.signal}): ${(r.stderr || r.stdout || '').trim()}`);
}

async function freePort() {
  const probe = createServer();
  const port = await new Promise((resolve) => probe.listen(0, '127.0.0.1', () => resolve(probe.address().port)));
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

/**
 * Starts a server in a new folder on a free port and returns its URL (user `wiretrail`, database `postgres`) and
 * how to stop it. Durability settings are off: the folder is thrown away, and what the tests kill is the API.
 */
export async function startPostgres({ port } = {}) {
  const bin = postgresBinaries();
  if (!bin) throw new Error("PostgreSQL's server programs were not found (install Debian's postgresql package, or set PG_BIN).");
  const dir = mkdtempSync(join(tmpdir(), 'wiretrail-pg-'));
  chmodSync(dir, 0o777);
  const data = join(dir, 'data');
  if (asRoot) spawnSync('chown', ['postgres', dir]);
  port ??= await freePort();
  runQuietly(bin, 'initdb', ['-D', data, '-U', 'wiretrail', '--auth=trust', '-E', 'UTF8', '--locale=C', '--no-sync']);
  const options = [`-p ${port}`, `-k ${dir}`, "-c listen_addresses='127.0.0.1'", '-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off', '-c max_connections=200'].join(' ');
  runQuietly(bin, 'pg_ctl', ['-D', data, '-l', join(dir, 'server.log'), '-o', options, '-w', '-t', '60', 'start']);
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    const [cmd, argv] = command(bin, 'pg_ctl', ['-D', data, '-m', 'immediate', '-w', 'stop']);
    spawnSync(cmd, argv, { stdio: 'ignore' });
    rmSync(dir, { recursive: true, force: true });
  };
  return { url: `postgres://wiretrail@127.0.0.1:${port}/postgres`, port, stop, log: join(dir, 'server.log') };
}

/** Whether a server can be started here: the programs exist, and as root the `postgres` account does too. */
export function canStartPostgres() {
  if (!postgresBinaries()) return false;
  if (!asRoot) return true;
  return spawnSync('id', ['postgres'], { stdio: 'ignore' }).status === 0 && spawnSync('sh', ['-c', 'command -v runuser'], { stdio: 'ignore' }).status === 0;
}

async function main() {
  const [verb, ...rest] = process.argv.slice(2);
  if (verb !== 'run' || rest[0] !== '--' || rest.length < 2) {
    console.error('usage: node scripts/postgres.mjs run -- <command…>');
    process.exit(2);
  }
  const server = await startPostgres();
  console.log(`PostgreSQL started for this run at ${server.url}`);
  const child = spawn(rest[1], rest.slice(2), { stdio: 'inherit', env: { ...process.env, DB_TYPE: 'postgres', DATABASE_URL: server.url } });
  const forward = (signal) => child.kill(signal);
  process.on('SIGINT', forward);
  process.on('SIGTERM', forward);
  child.on('exit', (code, signal) => {
    server.stop();
    process.exit(code ?? (signal ? 1 : 0));
  });
}

if (process.argv[1] === fileURLToPath(import.meta.url)) await main();
