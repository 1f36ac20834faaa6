// Local mail fake: SMTP in, inbox page and JSON API out, both on 127.0.0.1 only.
// Usage: tsx infra-local/mail-fake/main.ts --smtp-port 1025 --web-port 1080 --store FILE
import { once } from 'node:events';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { createSmtpServer } from './smtp';
import { MailStore } from './store';
import { createWebServer } from './web';

const HOST = '127.0.0.1';

function port(value: string | undefined, flag: string): number {
  const number = Number(value);
  if (!Number.isInteger(number) || number < 1 || number > 65535) {
    throw new Error(`${flag} must be a port number (got ${value ?? 'nothing'})`);
  }
  return number;
}

const { values } = parseArgs({
  options: {
    'smtp-port': { type: 'string' },
    'web-port': { type: 'string' },
    store: { type: 'string' },
  },
});
const smtpPort = port(values['smtp-port'], '--smtp-port');
const webPort = port(values['web-port'], '--web-port');
if (!values.store) throw new Error('--store FILE is required');

const store = new MailStore(path.resolve(values.store));
const smtp = createSmtpServer(store);
const web = createWebServer(store, smtpPort);

smtp.on('error', (error) => console.error('smtp error:', error));
smtp.listen(smtpPort, HOST);
web.listen(webPort, HOST);
await Promise.all([once(smtp.server, 'listening'), once(web, 'listening')]);
console.log(`mail fake: SMTP on ${HOST}:${smtpPort}, inbox on http://${HOST}:${webPort}`);

function shutdown() {
  web.closeAllConnections();
  web.close();
  smtp.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 2000).unref();
}
process.once('SIGTERM', shutdown);
process.once('SIGINT', shutdown);
