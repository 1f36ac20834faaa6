import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { messagesTo, waitForMail } from '../support/inbox';
import { startTcpProxy, type TcpProxy } from '../support/tcp-proxy';
import { testConfig } from '../support/test-env';
import { startAppProcess, type AppProcess } from './support/app-process';
import { outboxRows } from './support/outbox';
import { createPrivateDatabase, type PrivateDatabase } from './support/private-database';

/**
 * The server dies (SIGKILL) after a sign-up has committed but before its e-mail could be sent, then a new server
 * starts: the e-mail goes out exactly once. The server runs as a child process on a private database, with its
 * SMTP connections through a proxy of this test's own that is cut until the second server starts.
 */
let database: PrivateDatabase;
let proxy: TcpProxy;
let dataSource: DataSource;
const processes: AppProcess[] = [];

beforeAll(async () => {
  database = await createPrivateDatabase('kill');
  dataSource = createDataSource(database.db);
  await dataSource.initialize();
  const { mail } = testConfig();
  proxy = await startTcpProxy(mail.port, mail.host);
}, 60_000);
afterAll(async () => {
  for (const p of processes) await p.kill();
  await dataSource?.destroy();
  await proxy?.close();
  await database?.drop();
});

async function startServer(): Promise<AppProcess> {
  const server = await startAppProcess({
    DB_NAME: database.db.database,
    SMTP_HOST: proxy.host,
    SMTP_PORT: String(proxy.port),
  });
  processes.push(server);
  return server;
}

const VERIFY = 'Confirm your e-mail address for Benchwright';

describe('a crash between commit and e-mail', () => {
  it('sends the queued e-mail exactly once from the next server process', async () => {
    const address = uniqueEmail('crash');
    await proxy.cut();
    const first = await startServer();

    const agent = request.agent(first.url);
    const { body } = await agent.get('/api/auth/session').expect(200);
    const signUp = await agent
      .post('/api/auth/sign-up')
      .set('X-CSRF-Token', (body as { csrfToken: string }).csrfToken)
      .send({ email: address, displayName: 'Ivor Cantilever', password: GOOD_PASSWORD });
    expect(signUp.status).toBe(202);
    await first.kill();

    expect(first.child.signalCode).toBe('SIGKILL');
    const [queued] = await outboxRows(dataSource, [address]);
    expect(queued).toMatchObject({ subject: VERIFY, state: 'pending', sentAt: null });
    expect(await messagesTo(address)).toEqual([]);

    await proxy.restore();
    await startServer();

    const message = await waitForMail(address, VERIFY, 20_000);
    expect(message.to).toEqual([address]);
    // Give the new server's dispatcher more runs (it polls every 2 s) to send a duplicate, if it ever would.
    await new Promise((resolve) => setTimeout(resolve, 4500));
    expect((await messagesTo(address)).filter((m) => m.subject === VERIFY)).toHaveLength(1);
    const rows = await outboxRows(dataSource, [address]);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ state: 'sent', lastError: null });
  }, 90_000);
});
