import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Listing } from '../../server/features/listings/listing.entity';
import { Order } from '../../server/features/orders/order.entity';
import { EVERY_WAY } from '../support/checkout-fixtures';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';
import { startAppProcess, type AppProcess } from './support/app-process';

const BUYERS = 12;

let arrange: AppInstance;
let server: AppProcess | undefined;

beforeAll(async () => {
  arrange = await startTestApp();
});
afterAll(async () => {
  await server?.kill();
  await arrange?.close();
});

/** A cookie-keeping client of the child process, signed in, holding its CSRF token as the browser app does. */
async function signedInClient(url: string, email: string): Promise<TestAgent> {
  const agent = request.agent(url).set('Origin', url);
  const session = await agent.get('/api/auth/session').expect(200);
  agent.set('X-CSRF-Token', (session.body as { csrfToken: string }).csrfToken);
  const signedIn = await agent.post('/api/auth/sign-in').send({ email, password: GOOD_PASSWORD }).expect(200);
  agent.set('X-CSRF-Token', (signedIn.body as { csrfToken: string }).csrfToken);
  return agent;
}

/** What a checkout request ended with: an HTTP status, or the network error's code when it never got one. */
async function outcome(agent: TestAgent, listing: Listing): Promise<number | string> {
  try {
    const res = await agent.post('/api/orders').send({ listingId: listing.id, handover: 'collection' });
    return res.status;
  } catch (error) {
    return (error as { code?: string }).code ?? String(error);
  }
}

describe('SIGTERM while checkouts are in flight', () => {
  it('turns health to 503, finishes every checkout in flight, leaves each order with its reservation, and exits 0', async () => {
    const ds = arrange.ctx.dataSource;
    const seller = await buildUser(ds, { displayName: 'Brindle Lane Model Railway Club' });
    const moderator = await buildUser(ds, { role: 'moderator' });
    const listings: Listing[] = [];
    const buyers = [];
    for (let i = 0; i < BUYERS; i += 1) {
      listings.push(
        await buildListedListing(arrange.ctx, seller, moderator, { ...EVERY_WAY, title: `Shutdown board ${i}` }),
      );
      buyers.push(await buildUser(ds));
    }
    // Every buyer signs in from 127.0.0.1: lift the per-address limit for this process only.
    server = await startAppProcess({ SIGN_IN_LIMIT_PER_ADDRESS: '1000', SHUTDOWN_DRAIN_MS: '3000' });
    const agents = await Promise.all(buyers.map((b) => signedInClient(server!.url, b.email)));
    const exited = new Promise<number | null>((resolve) => server!.child.once('exit', (code) => resolve(code)));

    const inFlight = agents.map((agent, i) => outcome(agent, listings[i]!));
    await new Promise((resolve) => setTimeout(resolve, 15));
    server.child.kill('SIGTERM');
    // While it drains, health says so, and the checkouts already sent are answered in full.
    await expect.poll(async () => (await fetch(`${server!.url}/api/health`)).status, { timeout: 2_500 }).toBe(503);
    const results = await Promise.all(inFlight);

    expect(await exited).toBe(0);
    expect(results).toEqual(Array(BUYERS).fill(201));

    // What the answers said is what the database holds: one order and one reservation per 201, nothing else.
    const orders = await ds.getRepository(Order).find({ where: listings.map((l) => ({ listingId: l.id })) });
    expect(orders).toHaveLength(results.filter((r) => r === 201).length);
    for (const [i, listing] of listings.entries()) {
      const reloaded = await ds.getRepository(Listing).findOneByOrFail({ id: listing.id });
      const ordered = orders.some((o) => o.listingId === listing.id);
      expect(reloaded.state, `listing ${i}`).toBe(ordered ? 'reserved' : 'listed');
    }
  }, 120_000);
});
