#!/usr/bin/env node
// Local stand-in for the outgoing mail service: accepts SMTP on 127.0.0.1 and keeps messages in memory,
// readable as JSON at http://127.0.0.1:<MAIL_FAKE_HTTP_PORT>/messages (and cleared with DELETE): sender, To, Cc,
// subject, the text and HTML parts, and the attachments.
import { createServer } from 'node:http';
import { startMailbox } from './mailbox.mjs';

const smtpPort = Number(process.env.SMTP_PORT ?? 1025);
const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 1080);
const host = '127.0.0.1';
const mailbox = await startMailbox({ port: smtpPort, host });

// Each message with its To and Cc, both parts, and its attachments listed by name, type and size (their bytes stay here).
const listed = () => mailbox.messages.map((m) => ({ ...m, attachments: m.attachments.map(({ content: _content, ...a }) => a) }));

const http = createServer((req, res) => {
  if (req.url === '/messages' && req.method === 'GET') {
    res.writeHead(200, { 'content-type': 'application/json' });
    res.end(JSON.stringify(listed()));
  } else if (req.url === '/messages' && req.method === 'DELETE') {
    mailbox.messages.length = 0;
    res.writeHead(204).end();
  } else {
    res.writeHead(404, { 'content-type': 'text/plain' }).end('Try GET /messages');
  }
});

http.listen(httpPort, host, () => {
  console.log(`Mail fake: SMTP on ${host}:${smtpPort}, messages at http://${host}:${httpPort}/messages`);
});

const stop = () => {
  void mailbox.close();
  http.close(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
