import { afterAll, beforeAll, describe, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { browserLikeAgent, startTestApp, useToken } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

/** Move the stored session's clock back, as if time had passed. */
async function ageSession(userId: number, field: 'lastSeenAt' | 'signedInAt', ms: number) {
  const rows: { session_id: string; data: string }[] = await app.ctx.dataSource.query(
    'SELECT session_id, data FROM sessions',
  );
  const row = rows.find((r) =>
    (JSON.parse(r.data) as { passport?: { user?: string } }).passport?.user?.startsWith(`${userId}:`),
  );
  if (!row) throw new Error('session not found');
  const data = JSON.parse(row.data) as Record<string, number>;
  data[field] = (data[field] ?? Date.now()) - ms;
  await app.ctx.dataSource.query('UPDATE sessions SET data = ? WHERE session_id = ?', [
    JSON.stringify(data),
    row.session_id,
  ]);
}

async function signedIn() {
  const user = await buildUser(app.ctx.dataSource);
  const agent = await browserLikeAgent(app);
  useToken(
    agent,
    (await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(200)).body,
  );
  return { user, agent };
}

/** OWASP ASVS 5.0 V7.3.1 (inactivity time-out) and V7.3.2 (absolute maximum lifetime). */
describe('session time-outs', () => {
  it('ends a session idle for longer than the idle limit', async () => {
    const { user, agent } = await signedIn();
    await agent.get('/api/account').expect(200);

    await ageSession(user.id, 'lastSeenAt', (app.ctx.config.session.idleMinutes + 1) * 60_000);

    await agent.get('/api/account').expect(401);
  });

  it('ends a busy session once it passes its absolute lifetime', async () => {
    const { user, agent } = await signedIn();

    await ageSession(user.id, 'signedInAt', (app.ctx.config.session.absoluteHours * 60 + 1) * 60_000);

    await agent.get('/api/account').expect(401);
  });

  it('keeps an active session within both limits', async () => {
    const { user, agent } = await signedIn();
    await ageSession(user.id, 'lastSeenAt', 60_000);
    await agent.get('/api/account').expect(200);
  });
});
