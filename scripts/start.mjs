#!/usr/bin/env node
// `npm start`: install if needed, build, migrate, load the demo data into an empty database,
// start the mail and payments fakes and serve the product on one port.
import { join, resolve } from 'node:path';
import { build, DEMO_SIGN_INS, ensureDependencies, jwtSecret, paymentsSettings, prepareDatabase, root, startChild } from './lib.mjs';

const args = new Set(process.argv.slice(2));
const port = Number(process.env.PORT ?? 3000);
const databasePath = resolve(root, process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite');
const smtpPort = process.env.SMTP_PORT ?? '1025';
const mailHttpPort = process.env.MAIL_FAKE_HTTP_PORT ?? '1080';
const paymentsPort = Number(process.env.PAYMENTS_FAKE_PORT ?? 12111);

ensureDependencies();
if (!args.has('--no-build')) build();

const env = {
  NODE_ENV: 'production',
  PORT: String(port),
  HOST: process.env.HOST ?? '127.0.0.1',
  DATABASE_PATH: databasePath,
  JWT_SECRET: jwtSecret(join(databasePath, '..')),
  WEB_DIST: join(root, 'web', 'dist'),
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: smtpPort,
};
const url = `http://localhost:${port}`;
// With DB_TYPE=postgres the records live in DATABASE_URL's database (named here without its password).
const where = process.env.DB_TYPE === 'postgres' ? `PostgreSQL ${String(process.env.DATABASE_URL).replace(/\/\/([^:/@]+):[^@]*@/, '//$1:…@')}; files in ${join(databasePath, '..')}` : databasePath;
const payments = paymentsSettings({ dataDir: join(databasePath, '..'), fakePort: paymentsPort });
Object.assign(env, payments.env);
prepareDatabase(env);

const children = [
  startChild('Mail fake', 'node', ['scripts/mail-fake.mjs'], { SMTP_PORT: smtpPort, MAIL_FAKE_HTTP_PORT: mailHttpPort }),
  ...(payments.startFake ? [payments.startFake(`http://127.0.0.1:${port}`)] : []),
  startChild('API', 'node', ['api/dist/main.js'], env),
];

console.log(`
Wiretrail is starting at ${url}   (API docs: ${url}/api/docs)
Outgoing mail is caught at http://127.0.0.1:${mailHttpPort}/messages
${payments.fakeUrl ? `Card payments go to a local stand-in for the provider at ${payments.fakeUrl} (any card pays; 4000 0000 0000 0002 is declined)` : 'Card payments go to the provider set by PAYMENTS_API_KEY'}
Demo sign-ins, all with the password wiretrail-demo:
${DEMO_SIGN_INS.map(([role, email]) => `  ${email.padEnd(28)} ${role}`).join('\n')}
Data: ${where}   Stop with Ctrl+C.
`);

const stop = () => {
  for (const c of children) c.kill('SIGTERM');
  setTimeout(() => process.exit(0), 500);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
