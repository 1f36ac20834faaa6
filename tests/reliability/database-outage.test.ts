import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { tenByThirteenTwoLevel } from '../../shared/planner';
import { buildUser } from '../support/factories';
import { signedInAs } from '../support/sessions';
import { startTcpProxy, type TcpProxy } from '../support/tcp-proxy';
import { startTestApp } from '../support/test-app';
import { testConfig } from '../support/test-env';
import { untilHealthy, type Answer } from './support/outage-checks';

/**
 * The database goes away while the app is serving, then comes back. Every connection the app has to MariaDB —
 * TypeORM's pool and the session store's pool — goes through a proxy of this test's own, which is cut (new
 * connections refused, open ones destroyed) and then restored; the shared test database is never stopped.
 */
let proxy: TcpProxy;
let app: AppInstance;
let member: TestAgent;
let planId: number;

beforeAll(async () => {
  const db = testConfig().db;
  proxy = await startTcpProxy(db.port, db.host);
  app = await startTestApp({ db: { ...db, host: proxy.host, port: proxy.port } });
  member = await signedInAs(app, await buildUser(app.ctx.dataSource, { displayName: 'Olwen Trestle' }));
  const saved = await member.post('/api/plans').send({ name: 'Loft before the outage', input: tenByThirteenTwoLevel });
  expect(saved.status).toBe(201);
  planId = saved.body.plan.id as number;
});
afterAll(async () => {
  await proxy?.restore();
  await app?.close();
  await proxy?.close();
});

/** One request with a deadline: an outage must be answered, not left hanging. */
async function timed(send: () => PromiseLike<request.Response>): Promise<Answer> {
  const started = Date.now();
  const res = await send();
  return { status: res.status, body: res.body, text: res.text, ms: Date.now() - started };
}

describe('a database outage while requests are flowing', () => {
  it('answers 503 with a clear message during the outage and recovers without a restart', async () => {
    // Traffic before the cut: public search and a signed-in read both work.
    const flowing = [
      timed(() => request(app.app).get('/api/listings')),
      timed(() => member.get(`/api/plans/${planId}`)),
    ];
    expect((await Promise.all(flowing)).map((a) => a.status)).toEqual([200, 200]);
    expect(proxy.accepted).toBeGreaterThan(0);

    // The cut lands while requests are in flight.
    const inFlight = Array.from({ length: 6 }, (_, i) =>
      timed(() => (i % 2 ? member.get(`/api/plans/${planId}`) : request(app.app).get('/api/listings?q=fiddle'))),
    );
    await proxy.cut();
    const during = [
      ...(await Promise.all(inFlight)),
      await timed(() => request(app.app).get('/api/listings')),
      await timed(() => member.get(`/api/plans/${planId}`)),
      await timed(() => member.post('/api/plans').send({ name: 'During the outage', input: tenByThirteenTwoLevel })),
    ];

    for (const answer of during) {
      // A request that finished before the cut reached it may still be a 200; none is a 500 or a hang.
      expect([200, 503], JSON.stringify(answer.body)).toContain(answer.status);
      expect(answer.ms).toBeLessThan(8000);
      expect(answer.text).not.toMatch(/at \S+ \(|QueryFailedError|ECONNREFUSED|stack/i);
    }
    const refused = during.slice(-3);
    for (const answer of refused) {
      expect(answer.status).toBe(503);
      expect(answer.body).toEqual({
        error: {
          code: 'database_unavailable',
          message: 'Benchwright cannot reach its database just now. Nothing was changed; please try again in a minute.',
          retryAfterSeconds: 30,
        },
      });
    }

    const health = await request(app.app).get('/api/health');
    expect(health.status).toBe(503);
    expect(health.body.status).toBe('unavailable');
    expect(health.body.down).toContain('database');
    expect(health.body.parts.database.ok).toBe(false);
    expect(health.body.parts.database.message).toEqual(expect.any(String));

    await proxy.restore();
    await untilHealthy(app, 20_000);

    // The session made before the outage still signs the member in; the plan saved before it is still there.
    const session = await member.get('/api/auth/session');
    expect(session.status).toBe(200);
    expect(session.body.user.displayName).toBe('Olwen Trestle');
    const plan = await member.get(`/api/plans/${planId}`);
    expect(plan.status).toBe(200);
    expect(plan.body.plan.name).toBe('Loft before the outage');
    // The write refused during the outage left nothing behind.
    const mine = await member.get('/api/plans');
    expect(mine.body.items.map((p: { name: string }) => p.name)).toEqual(['Loft before the outage']);
    expect((await request(app.app).get('/api/listings')).status).toBe(200);
  }, 60_000);
});
