import { Writable } from 'node:stream';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { browserLikeAgent, startTestApp } from '../support/test-app';

/*
 * OWASP ASVS 5.0 V16 (security logging): sign-ins, refused sign-ins and refused payment events are logged with the
 * time, the user where known and the address; never a password, token or the refused payload.
 */
let app: AppInstance;
const lines: string[] = [];

beforeAll(async () => {
  app = await startTestApp();
  const sink = new Writable({
    write(chunk, _encoding, done) {
      lines.push(String(chunk));
      done();
    },
  });
  // Every feature reads the logger from the shared context when it logs, so this catches what they write.
  app.ctx.logger = pino({ level: 'info' }, sink);
});
afterAll(() => app?.close());

const entries = () => lines.map((l) => JSON.parse(l) as Record<string, unknown>);

describe('security log', () => {
  it('logs a sign-in and a refused one with time, user and address, and never the password', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const agent = await browserLikeAgent(app);
    await agent.post('/api/auth/sign-in').send({ email: user.email, password: 'not-the-password-1234' }).expect(401);
    await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(200);

    const refused = entries().find((e) => e.event === 'sign_in_failed' && e.email === user.email);
    const accepted = entries().find((e) => e.event === 'sign_in' && e.userId === user.id);
    expect(refused).toMatchObject({ ip: expect.any(String), time: expect.any(Number) });
    expect(accepted).toMatchObject({ ip: expect.any(String), time: expect.any(Number) });
    expect(lines.join('\n')).not.toContain('not-the-password-1234');
    expect(lines.join('\n')).not.toContain(GOOD_PASSWORD);
  });

  it('logs a payment event with a bad signature with time and address, without its payload', async () => {
    const agent = await browserLikeAgent(app);
    const payload = JSON.stringify({
      id: 'evt_forged_4242',
      type: 'payment_intent.succeeded',
      card: '4242424242424242',
    });
    await agent
      .post('/api/payments/webhook')
      .set('Content-Type', 'application/json')
      .set('Stripe-Signature', 't=1,v1=forged')
      .send(payload)
      .expect(400);

    const refused = entries().find((e) => String(e.msg).startsWith('payment event refused'));
    expect(refused).toMatchObject({ ip: expect.any(String), time: expect.any(Number) });
    expect(lines.join('\n')).not.toContain('4242424242424242');
    expect(lines.join('\n')).not.toContain('evt_forged_4242');
  });
});
