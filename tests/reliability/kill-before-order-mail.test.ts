import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createPaymentsFake } from '../../infra-local/payments-fake/index';
import { createApp, type AppInstance } from '../../server/app';
import { Order } from '../../server/features/orders/order.entity';
import { EVERY_WAY } from '../support/checkout-fixtures';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { messagesTo, waitForMail } from '../support/inbox';
import { buildListedListing } from '../support/listing-factories';
import { closedPort, startTcpProxy, type TcpProxy } from '../support/tcp-proxy';
import { testConfig } from '../support/test-env';
import { startAppProcess, type AppProcess } from './support/app-process';
import { outboxRows } from './support/outbox';
import { createPrivateDatabase, type PrivateDatabase } from './support/private-database';

/**
 * The server dies (SIGKILL) after a verified payment event has committed an order as paid, but before the "paid"
 * e-mails to buyer and seller could be sent; the next server process sends each exactly once. The servers run as
 * child processes on a private database (so no other app's dispatcher sees the outbox), with SMTP through this
 * test's own proxy, cut until the second server starts, and a payments fake whose webhooks reach the first server.
 */
let database: PrivateDatabase;
let arrange: AppInstance;
let proxy: TcpProxy;
let fake: Awaited<ReturnType<ReturnType<typeof createPaymentsFake>['start']>>;
const processes: AppProcess[] = [];

beforeAll(async () => {
  database = await createPrivateDatabase('order_kill');
  // Only to arrange data in the private database: never started, so it dispatches no e-mail and runs no jobs.
  arrange = await createApp(testConfig({ db: database.db }));
  const { mail } = testConfig();
  proxy = await startTcpProxy(mail.port, mail.host);
}, 60_000);
afterAll(async () => {
  for (const p of processes) await p.kill();
  await fake?.close();
  await arrange?.close();
  await proxy?.close();
  await database?.drop();
});

describe('a crash between an order’s payment and its e-mails', () => {
  it('sends the buyer’s and the seller’s “paid” e-mails exactly once from the next server process', async () => {
    const ds = arrange.ctx.dataSource;
    const seller = await buildUser(ds, { displayName: 'Oxenhope Junction Group' });
    const moderator = await buildUser(ds, { role: 'moderator' });
    const buyer = await buildUser(ds, { displayName: 'Rhoda Fishbolt' });
    const title = 'N gauge branch terminus, two boards';
    const listing = await buildListedListing(arrange.ctx, seller, moderator, { ...EVERY_WAY, title });

    const port = await closedPort();
    const webhookSecret = `whsec_crash_${randomBytes(8).toString('hex')}`;
    fake = await createPaymentsFake({
      port: 0,
      webhookUrl: `http://127.0.0.1:${port}/api/payments/webhook`,
      webhookSecret,
    }).start();
    const env = {
      DB_NAME: database.db.database,
      SMTP_HOST: proxy.host,
      SMTP_PORT: String(proxy.port),
      STRIPE_API_HOST: '127.0.0.1',
      STRIPE_API_PORT: String(fake.port),
      STRIPE_API_PROTOCOL: 'http',
      STRIPE_WEBHOOK_SECRET: webhookSecret,
    };
    await proxy.cut();
    const first = await startAppProcess(env, 30_000, port);
    processes.push(first);

    const agent = request.agent(first.url);
    const session = await agent.get('/api/auth/session').expect(200);
    agent.set('X-CSRF-Token', (session.body as { csrfToken: string }).csrfToken);
    const signedIn = await agent.post('/api/auth/sign-in').send({ email: buyer.email, password: GOOD_PASSWORD });
    agent.set('X-CSRF-Token', (signedIn.body as { csrfToken: string }).csrfToken);
    const created = await agent.post('/api/orders').send({ listingId: listing.id, handover: 'collection' }).expect(201);
    const orderId = (created.body as { id: number }).id;
    await agent.post(`/api/orders/${orderId}/payments`).send({ paymentMethod: 'pm_card_visa' }).expect(200);

    // The verified event moves the order and queues both e-mails in one transaction; then the server dies.
    await expect
      .poll(async () => (await ds.getRepository(Order).findOneByOrFail({ id: orderId })).state, { timeout: 20_000 })
      .toBe('paid_held');
    await first.kill();
    const queued = await outboxRows(ds, [buyer.email, seller.email]);
    expect(queued.map((r) => [r.toAddress, r.state])).toEqual(
      expect.arrayContaining([
        [buyer.email, 'pending'],
        [seller.email, 'pending'],
      ]),
    );
    expect(await messagesTo(buyer.email)).toEqual([]);

    await proxy.restore();
    processes.push(await startAppProcess(env));

    await waitForMail(buyer.email, `Paid: ${title}`, 20_000);
    await waitForMail(seller.email, `Sold, and paid for: ${title}`, 20_000);
    // Give the new server's dispatcher more runs (it polls every 2 s) to send a duplicate, if it ever would.
    await new Promise((resolve) => setTimeout(resolve, 4500));
    expect((await messagesTo(buyer.email)).filter((m) => m.subject === `Paid: ${title}`)).toHaveLength(1);
    expect((await messagesTo(seller.email)).filter((m) => m.subject === `Sold, and paid for: ${title}`)).toHaveLength(
      1,
    );
  }, 120_000);
});
