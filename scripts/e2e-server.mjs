#!/usr/bin/env node
// The server Playwright tests run against: the built product on a throwaway database with the demo data.
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build, paymentsSettings, prepareDatabase, root, startChild } from './lib.mjs';

const port = process.env.E2E_PORT ?? '3100';
// Mail and payment ports follow the web port, so two test runs on one machine do not collide.
const smtpPort = String(Number(port) + 1000);
const mailHttpPort = String(Number(port) + 1001);
const paymentsPort = Number(port) + 1002;
if (!existsSync(join(root, 'api/dist/main.js')) || !existsSync(join(root, 'web/dist/index.html'))) build();

const dir = mkdtempSync(join(tmpdir(), 'wiretrail-e2e-'));
const env = {
  NODE_ENV: 'production',
  PORT: port,
  HOST: '127.0.0.1',
  DATABASE_PATH: join(dir, 'e2e.sqlite'),
  JWT_SECRET: 'e2e-secret-long-enough-for-signing-tokens-here',
  WEB_DIST: join(root, 'web/dist'),
  SIGN_IN_RATE_LIMIT: '500',
  // Tests side by side share each role's saved session: an access token that outlived the run's first quarter
  // hour would be refreshed by one of them, and the others' copies of the rotated refresh token then read as reuse.
  ACCESS_TOKEN_TTL_SECONDS: '7200',
  SMTP_PORT: smtpPort,
  PUBLIC_URL: `http://127.0.0.1:${port}`,
};
const payments = paymentsSettings({ dataDir: dir, fakePort: paymentsPort, fakeOnly: true });
Object.assign(env, payments.env);
prepareDatabase(env);
const children = [
  startChild('Mail fake', 'node', ['scripts/mail-fake.mjs'], { SMTP_PORT: smtpPort, MAIL_FAKE_HTTP_PORT: mailHttpPort }),
  ...(payments.startFake ? [payments.startFake(`http://127.0.0.1:${port}`)] : []),
  startChild('API', 'node', ['api/dist/main.js'], env),
];
const stop = () => {
  for (const c of children) c.kill('SIGTERM');
  rmSync(dir, { recursive: true, force: true });
  setTimeout(() => process.exit(0), 300);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
