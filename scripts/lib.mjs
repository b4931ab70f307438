// Shared by start, dev and test: find the repository, install what is missing, prepare the database.
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');

export function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', ...opts, env: { ...process.env, ...opts.env } });
  if (r.status !== 0) {
    console.error(`\n✗ ${cmd} ${args.join(' ')} failed (exit ${r.status ?? r.signal}).`);
    process.exit(r.status ?? 1);
  }
}

/** A fresh clone has no node_modules: install exactly what the lockfile says. */
export function ensureDependencies() {
  const marker = join(root, 'node_modules', '.package-lock.json');
  if (existsSync(marker)) return;
  console.log('Installing dependencies (first run; compiling the SQLite driver takes a minute or two)…');
  run('npm', ['ci', '--no-audit', '--no-fund'], { env: { PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1' } });
}

export function build() {
  run('npm', ['run', 'build']);
}

/** A secret made once per installation and kept beside the database, never in the repository. */
function installationSecret(dataDir, file, prefix = '') {
  mkdirSync(dataDir, { recursive: true });
  const path = join(dataDir, file);
  if (!existsSync(path)) writeFileSync(path, prefix + randomBytes(48).toString('base64url'), { mode: 0o600 });
  return readFileSync(path, 'utf8').trim();
}

/** The API's token-signing secret. */
export function jwtSecret(dataDir) {
  return process.env.JWT_SECRET || installationSecret(dataDir, 'jwt-secret');
}

/**
 * Card payments: a real provider when PAYMENTS_API_KEY is set, otherwise the local fake on `fakePort`, with a
 * webhook secret made once per installation (always the fake with fakeOnly, for tests). Returns the API's settings
 * and, for the fake, how to start it.
 */
export function paymentsSettings({ dataDir, fakePort, fakeOnly = false }) {
  if (process.env.PAYMENTS_API_KEY && !fakeOnly) {
    return { env: Object.fromEntries(['PAYMENTS_API_KEY', 'PAYMENTS_WEBHOOK_SECRET', 'PAYMENTS_API_URL'].filter((k) => process.env[k]).map((k) => [k, process.env[k]])), fakeUrl: null };
  }
  const secret = installationSecret(dataDir, 'payments-webhook-secret', 'whsec_');
  const fakeUrl = `http://127.0.0.1:${fakePort}`;
  return {
    // The fake takes any well-formed test key; this one opens nothing anywhere else.
    env: { PAYMENTS_API_KEY: 'sk_test_wiretrail_local_fake', PAYMENTS_WEBHOOK_SECRET: secret, PAYMENTS_API_URL: fakeUrl },
    fakeUrl,
    startFake: (apiUrl) =>
      startChild('Payments fake', 'node', ['scripts/payments-fake.mjs'], {
        PAYMENTS_FAKE_PORT: String(fakePort),
        PAYMENTS_WEBHOOK_URL: `${apiUrl}/api/payments/webhook`,
        PAYMENTS_WEBHOOK_SECRET: secret,
      }),
  };
}

export function prepareDatabase(env) {
  run('node', ['api/dist/database/migrate-cli.js'], { env });
  run('node', ['api/dist/database/seed-cli.js'], { env });
}

const children = new Set();

export function startChild(name, cmd, args, env) {
  const child = spawn(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
  children.add(child);
  child.on('exit', (code, signal) => {
    children.delete(child);
    if (signal !== 'SIGTERM') {
      // One part stopping stops the rest, so no half-started product is left running on its ports.
      console.error(`${name} stopped (${signal ?? `exit ${code}`}).`);
      for (const other of children) other.kill('SIGTERM');
      process.exit(code || 1);
    }
  });
  return child;
}

export const DEMO_SIGN_INS = [
  ['admin', 'admin@larkfield.example'],
  ['office', 'office@larkfield.example'],
  ['technician', 'tech1@larkfield.example'],
  ['technician', 'tech2@larkfield.example'],
  ['admin (second organisation)', 'admin@oakmere.example'],
  ['technician for both (chooses at sign-in)', 'corin@valewiring.example'],
];
