#!/usr/bin/env node
// Local stand-in for the outgoing mail service: accepts SMTP on 127.0.0.1 and keeps messages in memory,
// readable as JSON at http://127.0.0.1:<MAIL_FAKE_HTTP_PORT>/messages (and cleared with DELETE).
import { createServer } from 'node:http';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

const smtpPort = Number(process.env.SMTP_PORT ?? 1025);
const httpPort = Number(process.env.MAIL_FAKE_HTTP_PORT ?? 1080);
const host = '127.0.0.1';
const messages = [];

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        messages.push({
          id: messages.length + 1,
          receivedAt: new Date().toISOString(),
          from: mail.from?.text ?? '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : '',
          attachments: (mail.attachments ?? []).map((a) => ({ filename: a.filename, contentType: a.contentType, size: a.size })),
        });
        if (messages.length > 500) messages.shift();
        callback();
      })
      .catch(callback);
  },
});

const http = createServer((req, res) => {
  if (req.url === '/messages' && req.method === 'GET') {
    res.writeHead(200, { 'content-type': 'application/json' });
    res.end(JSON.stringify(messages));
  } else if (req.url === '/messages' && req.method === 'DELETE') {
    messages.length = 0;
    res.writeHead(204).end();
  } else {
    res.writeHead(404, { 'content-type': 'text/plain' }).end('Try GET /messages');
  }
});

smtp.listen(smtpPort, host, () => {
  http.listen(httpPort, host, () => {
    console.log(`Mail fake: SMTP on ${host}:${smtpPort}, messages at http://${host}:${httpPort}/messages`);
  });
});

const stop = () => {
  smtp.close(() => undefined);
  http.close(() => process.exit(0));
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
