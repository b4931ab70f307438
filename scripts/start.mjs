#!/usr/bin/env node
// `npm start`: install if needed, build, migrate, load the demo data into an empty database,
// start the mail fake and serve the product on one port.
import { join, resolve } from 'node:path';
import { build, DEMO_SIGN_INS, ensureDependencies, jwtSecret, prepareDatabase, root, startChild } from './lib.mjs';

const args = new Set(process.argv.slice(2));
const port = Number(process.env.PORT ?? 3000);
const databasePath = resolve(root, process.env.DATABASE_PATH ?? 'data/wiretrail.sqlite');
const smtpPort = process.env.SMTP_PORT ?? '1025';
const mailHttpPort = process.env.MAIL_FAKE_HTTP_PORT ?? '1080';

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
prepareDatabase(env);

const children = [
  startChild('Mail fake', 'node', ['scripts/mail-fake.mjs'], { SMTP_PORT: smtpPort, MAIL_FAKE_HTTP_PORT: mailHttpPort }),
  startChild('API', 'node', ['api/dist/main.js'], env),
];

const url = `http://localhost:${port}`;
console.log(`
Wiretrail is starting at ${url}   (API docs: ${url}/api/docs)
Outgoing mail is caught at http://127.0.0.1:${mailHttpPort}/messages
Demo sign-ins, all with the password wiretrail-demo:
${DEMO_SIGN_INS.map(([role, email]) => `  ${email.padEnd(28)} ${role}`).join('\n')}
Data: ${databasePath}   Stop with Ctrl+C.
`);

const stop = () => {
  for (const c of children) c.kill('SIGTERM');
  setTimeout(() => process.exit(0), 500);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
