#!/usr/bin/env node
// `npm test`: every test, on a machine that may never have run the project.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { build, ensureDependencies, root, run } from './lib.mjs';
import { canStartPostgres } from './postgres.mjs';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

const hasCommand = (name) => spawnSync('sh', ['-c', `command -v ${name}`], { stdio: 'ignore' }).status === 0;

/** Debian's Chromium for the browser tests, and poppler-utils' pdftotext, which reads issued certificates back. */
function ensureChromium() {
  const missing = [...(existsSync(CHROMIUM) ? [] : ['chromium']), ...(hasCommand('pdftotext') ? [] : ['poppler-utils'])];
  if (missing.length === 0) return;
  const isRoot = process.getuid?.() === 0;
  if (isRoot && hasCommand('apt-get')) {
    console.log(`Installing from Debian for the browser tests: ${missing.join(', ')}…`);
    run('sh', ['-c', `apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq ${missing.join(' ')} >/dev/null`]);
    return;
  }
  console.error(`The browser tests need Debian's ${missing.join(' and ')}. Install with: sudo apt-get install ${missing.join(' ')}`);
  process.exit(1);
}

/** A step run beside the others, its lines marked with its name; resolves to its exit code. */
function alongside(name, cmd, args, env = {}) {
  const child = spawn(cmd, args, { cwd: root, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
  const mark = (stream, out) => {
    let rest = '';
    stream.on('data', (d) => {
      const lines = (rest + d.toString()).split('\n');
      rest = lines.pop();
      for (const line of lines) out.write(`[${name}] ${line}\n`);
    });
    stream.on('end', () => rest && out.write(`[${name}] ${rest}\n`));
  };
  // A step that fails stops `npm test` at once: this one stops with it rather than run on unseen.
  process.on('exit', () => child.exitCode === null && child.kill('SIGTERM'));
  mark(child.stdout, process.stdout);
  mark(child.stderr, process.stderr);
  return new Promise((resolve) => child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0))));
}

const started = Date.now();
ensureDependencies();
ensureChromium();
// The boundaries between packages and features first: a few seconds, and it needs no build.
console.log('\n▶ lint (import boundaries, typescript-eslint)');
if (!existsSync(join(root, 'node_modules/.bin/eslint'))) {
  console.error('ESLint is not installed here though package-lock.json lists it: run npm install (or npm ci) first.');
  process.exit(1);
}
run('npm', ['run', 'lint']);
build();

// The API's end-to-end suite runs a second time on PostgreSQL, beside the SQLite run and the web tests: most of
// its time is spent waiting on processes and timers, so the two cores are better used together.
const postgres = canStartPostgres();
const postgresRun = postgres
  ? alongside('postgres', 'npm', ['run', 'test:postgres', '-w', 'api'], { CI: process.env.CI ?? '' })
  : (console.log("\n(PostgreSQL's server is not installed here: the API's suite runs on SQLite only. Install Debian's postgresql to run both.)"), null);

const steps = [
  ['core unit tests', ['npm', 'test', '-w', 'core']],
  ['api unit and end-to-end tests (SQLite)', ['npm', 'test', '-w', 'api']],
  ['web unit tests', ['npm', 'test', '-w', 'web']],
  ['browser tests (Playwright in Chromium)', ['npm', 'test', '-w', 'e2e']],
];
for (const [name, [cmd, ...args]] of steps) {
  console.log(`\n▶ ${name}`);
  run(cmd, args, { env: { CI: process.env.CI ?? '' } });
}
if (postgresRun) {
  console.log('\n▶ api end-to-end tests on PostgreSQL (started beside the others; waiting for them to finish)');
  const code = await postgresRun;
  if (code !== 0) {
    console.error(`\n✗ the API's end-to-end tests on PostgreSQL failed (exit ${code}); their lines are marked [postgres] above.`);
    process.exit(code);
  }
}
console.log(`\n✓ All test suites passed${postgres ? ', the API on SQLite and on PostgreSQL,' : ''} in ${Math.round((Date.now() - started) / 1000)} s.`);
