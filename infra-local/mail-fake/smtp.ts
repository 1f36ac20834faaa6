// SMTP side of the mail fake: accepts everything, parses it and files it in the store.
import { randomUUID } from 'node:crypto';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { MailStore } from './store';

export const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

export function createSmtpServer(store: MailStore): SMTPServer {
  return new SMTPServer({
    authOptional: true,
    allowInsecureAuth: true, // the app may send credentials; accept any, without TLS
    disabledCommands: ['STARTTLS'],
    size: MAX_MESSAGE_BYTES,
    logger: false,
    disableReverseLookup: true, // a DNS lookup per connection only slows local tests down
    banner: 'Benchwright local mail fake',
    onAuth(auth, _session, callback) {
      callback(null, { user: auth.username ?? 'local' });
    },
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          if (stream.sizeExceeded) {
            callback(Object.assign(new Error('Message exceeds the 10 MB limit'), { responseCode: 552 }));
            return;
          }
          const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
          store.add({
            id: randomUUID(),
            from: parsed.from?.text || envelopeFrom,
            // The envelope lists every real recipient, Cc and Bcc included.
            to: session.envelope.rcptTo.map((recipient) => recipient.address),
            subject: parsed.subject ?? '',
            date: new Date().toISOString(),
            text: parsed.text ?? '',
            html: parsed.html || null,
          });
          callback();
        })
        .catch((error: unknown) => callback(error instanceof Error ? error : new Error(String(error))));
    },
  });
}
