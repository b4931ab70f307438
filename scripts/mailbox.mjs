// An SMTP server that keeps what it receives in memory, standing in for a mail provider: the local mail fake
// (scripts/mail-fake.mjs) and the API's tests both use it. It can be told to turn mail away, as a provider that
// is down or full would, to show how the sender copes.
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

export async function startMailbox({ port = 0, host = '127.0.0.1', keep = 500 } = {}) {
  const messages = [];
  let refusal = null;
  const offeredAt = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      offeredAt.push(Date.now());
      if (refusal) {
        // Read the message to its end first, as a real server does before it answers.
        const { code, message } = refusal;
        stream.on('end', () => callback(Object.assign(new Error(message), { responseCode: code })));
        stream.resume();
        return;
      }
      simpleParser(stream)
        .then((mail) => {
          messages.push({
            id: messages.length + 1,
            receivedAt: new Date().toISOString(),
            from: mail.from?.text ?? '',
            replyTo: mail.replyTo?.text ?? '',
            to: session.envelope.rcptTo.map((r) => r.address),
            // The headers' To and Cc, as the people it reached see them (the envelope above has everyone).
            toHeader: mail.to ? [mail.to].flat().map((a) => a.text).join(', ') : '',
            cc: mail.cc ? [mail.cc].flat().map((a) => a.text).join(', ') : '',
            subject: mail.subject ?? '',
            text: mail.text ?? '',
            html: typeof mail.html === 'string' ? mail.html : '',
            attachments: (mail.attachments ?? []).map((a) => ({ filename: a.filename ?? '', contentType: a.contentType, size: a.size, content: a.content })),
          });
          if (messages.length > keep) messages.shift();
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => resolve());
  });
  return {
    port: server.server.address().port,
    messages,
    /** When each message was offered, delivered or turned away (ms since the epoch). */
    offeredAt,
    refuse(code, message) {
      refusal = { code, message };
    },
    accept() {
      refusal = null;
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
