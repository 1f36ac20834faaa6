import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { messagesTo, waitForMail } from '../support/inbox';
import { startTcpProxy, type TcpProxy } from '../support/tcp-proxy';
import { browserLikeAgent, startTestApp } from '../support/test-app';
import { testConfig } from '../support/test-env';
import { health, untilHealthy } from './support/outage-checks';
import { outboxRows, untilAttempted } from './support/outbox';
import { createPrivateDatabase, type PrivateDatabase } from './support/private-database';

/**
 * The mail server goes away while people sign up and ask for password resets, then comes back. The app's SMTP
 * connections go through a proxy of this test's own; its database is private, so no other test's dispatcher can
 * send (or hold back) these messages.
 */
let database: PrivateDatabase;
let proxy: TcpProxy;
let app: AppInstance;

beforeAll(async () => {
  database = await createPrivateDatabase('smtp');
  const { mail } = testConfig();
  proxy = await startTcpProxy(mail.port, mail.host);
  app = await startTestApp({ db: database.db, mail: { ...mail, host: proxy.host, port: proxy.port } });
}, 60_000);
afterAll(async () => {
  await app?.close();
  await proxy?.close();
  await database?.drop();
});

const VERIFY = 'Confirm your e-mail address for Benchwright';
const RESET = 'Reset your Benchwright password';

describe('an SMTP outage', () => {
  it('accepts the request, keeps the e-mail queued while SMTP is down, and sends it exactly once when it returns', async () => {
    const joiner = uniqueEmail('joiner');
    const forgetful = await buildUser(app.ctx.dataSource, { displayName: 'Rhys Cleat' });
    await proxy.cut();

    const agent = await browserLikeAgent(app);
    const signUp = await agent
      .post('/api/auth/sign-up')
      .send({ email: joiner, displayName: 'Nell Fishplate', password: GOOD_PASSWORD });
    const reset = await agent.post('/api/auth/password-reset/request').send({ email: forgetful.email });

    // The person is told what happens next; the outage is the app's problem, not theirs.
    expect(signUp.status).toBe(202);
    expect(signUp.body.message).toEqual(expect.any(String));
    expect(reset.status).toBe(202);
    const queued = await untilAttempted(app, [joiner, forgetful.email], 10_000);
    for (const row of queued) {
      expect(row).toMatchObject({ state: 'pending', sentAt: null });
      expect(row.attempts).toBeGreaterThanOrEqual(1);
      expect(row.lastError).toMatch(/ECONNREFUSED|connect/i);
    }
    const down = await health(app);
    expect(down.status).toBe(503);
    expect(down.body.down).toEqual(['mail']);
    expect(await messagesTo(joiner)).toEqual([]);
    expect(await messagesTo(forgetful.email)).toEqual([]);
    // The account exists and can be confirmed later: nothing half-made.
    const [{ n }] = await app.ctx.dataSource.query('SELECT COUNT(*) AS n FROM users WHERE email = ?', [joiner]);
    expect(Number(n)).toBe(1);

    await proxy.restore();
    await untilHealthy(app, 15_000);
    await waitForMail(joiner, VERIFY, 20_000);
    await waitForMail(forgetful.email, RESET, 20_000);
    // Another dispatcher run after delivery must not send again.
    await new Promise((resolve) => setTimeout(resolve, 2500));
    await app.ctx.mailDispatcher.sendDue();

    expect((await messagesTo(joiner)).filter((m) => m.subject === VERIFY)).toHaveLength(1);
    expect((await messagesTo(forgetful.email)).filter((m) => m.subject === RESET)).toHaveLength(1);
    for (const row of await outboxRows(app.ctx.dataSource, [joiner, forgetful.email])) {
      expect(row.state).toBe('sent');
      expect(row.sentAt).not.toBeNull();
    }
  }, 60_000);
});
