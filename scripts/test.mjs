#!/usr/bin/env node
// `npm test`: every test, on a machine that may never have run the project.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { build, ensureDependencies, run } from './lib.mjs';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  const isRoot = process.getuid?.() === 0;
  const hasApt = spawnSync('sh', ['-c', 'command -v apt-get'], { stdio: 'ignore' }).status === 0;
  if (isRoot && hasApt) {
    console.log("Installing Debian's Chromium for the browser tests…");
    run('sh', ['-c', 'apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null']);
    return;
  }
  console.error(`The browser tests need Chromium at ${CHROMIUM}. Install it with: sudo apt-get install chromium`);
  process.exit(1);
}

const started = Date.now();
ensureDependencies();
ensureChromium();
build();
const steps = [
  ['core unit tests', ['npm', 'test', '-w', 'core']],
  ['api unit and end-to-end tests', ['npm', 'test', '-w', 'api']],
  ['web unit tests', ['npm', 'test', '-w', 'web']],
  ['browser tests (Playwright in Chromium)', ['npm', 'test', '-w', 'e2e']],
];
for (const [name, [cmd, ...args]] of steps) {
  console.log(`\n▶ ${name}`);
  run(cmd, args, { env: { CI: process.env.CI ?? '' } });
}
console.log(`\n✓ All test suites passed in ${Math.round((Date.now() - started) / 1000)} s.`);
