#!/usr/bin/env node
// `npm run dev`: the API rebuilt on change and restarted, the web app on Vite's dev server with /api proxied.
import { join, resolve } from 'node:path';
import { ensureDependencies, jwtSecret, paymentsSettings, prepareDatabase, root, run, startChild } from './lib.mjs';

ensureDependencies();
run('npm', ['run', 'build', '-w', 'core']);
run('npm', ['run', 'build', '-w', 'api']);
const databasePath = resolve(root, process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite');
const payments = paymentsSettings({ dataDir: join(databasePath, '..'), fakePort: Number(process.env.PAYMENTS_FAKE_PORT ?? 12111) });
const env = { NODE_ENV: 'development', PORT: '3000', DATABASE_PATH: databasePath, JWT_SECRET: jwtSecret(join(databasePath, '..')), ...payments.env };
prepareDatabase(env);
const children = [
  startChild('Mail fake', 'node', ['scripts/mail-fake.mjs'], {}),
  ...(payments.startFake ? [payments.startFake('http://127.0.0.1:3000')] : []),
  startChild('API build', 'npm', ['run', 'dev', '-w', 'api'], {}),
  startChild('API', 'node', ['--watch-path=api/dist', 'api/dist/main.js'], env),
  startChild('Web', 'npm', ['run', 'dev', '-w', 'web'], {}),
];
const stop = () => children.forEach((c) => c.kill('SIGTERM'));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
