import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { SESSION_COOKIE } from '../../server/features/auth/session';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { browserLikeAgent, startTestApp, useToken } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

const sessionCookie = (res: request.Response) =>
  ([] as string[])
    .concat(res.headers['set-cookie'] ?? [])
    .find((c) => c.startsWith(`${SESSION_COOKIE}=`))
    ?.split(';')[0];

describe('POST /api/auth/sign-in', () => {
  it('signs in, issues a new session id and a new CSRF token', async () => {
    const user = await buildUser(app.ctx.dataSource, { displayName: 'Esme Turnout' });
    const agent = await browserLikeAgent(app);
    const before = await agent.post('/api/auth/resend-verification').send({ email: uniqueEmail() });

    const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD });

    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({
      email: user.email,
      displayName: 'Esme Turnout',
      role: 'member',
      emailVerified: true,
    });
    expect(res.body.user).not.toHaveProperty('passwordHash');
    expect(sessionCookie(res)).toBeDefined();
    expect(sessionCookie(res)).not.toBe(sessionCookie(before));
    expect(res.headers['set-cookie']?.[0]).toMatch(/HttpOnly/);
    expect(res.headers['set-cookie']?.[0]).toMatch(/SameSite=Lax/);
  });

  it('answers a wrong password and an unknown address with the same 401', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const agent = await browserLikeAgent(app);

    const wrong = await agent
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: 'not-the-password-at-all' });
    const unknown = await agent
      .post('/api/auth/sign-in')
      .send({ email: uniqueEmail(), password: 'not-the-password-at-all' });

    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('tells an unconfirmed account to confirm its address first', async () => {
    const user = await buildUser(app.ctx.dataSource, { verified: false });
    const agent = await browserLikeAgent(app);

    const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD });

    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('email_unverified');
  });

  it('tells a suspended member why they cannot sign in', async () => {
    const user = await buildUser(app.ctx.dataSource, { suspendedReason: 'Listing boards you do not own' });
    const agent = await browserLikeAgent(app);

    const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD });

    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('account_suspended');
    expect(res.body.error.message).toContain('Listing boards you do not own');
  });

  it('ends the session at sign-out so the old cookie no longer works', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const agent = await browserLikeAgent(app);
    const signIn = await agent
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: GOOD_PASSWORD })
      .expect(200);
    const oldCookie = sessionCookie(signIn)!;
    useToken(agent, signIn.body);

    await agent.post('/api/auth/sign-out').expect(200);

    const replay = await request(app.app).get('/api/account').set('Cookie', oldCookie);
    expect(replay.status).toBe(401);
  });
});

describe('sign-in rate limits', () => {
  it('blocks an account after repeated failures, even for the right password, and says how long', async () => {
    const limited = await startTestApp({ signInLimits: { perAccount: 3, perAddress: 100, windowMinutes: 15 } });
    try {
      const user = await buildUser(limited.ctx.dataSource);
      const agent = await browserLikeAgent(limited);
      for (let i = 0; i < 3; i += 1) {
        await agent
          .post('/api/auth/sign-in')
          .send({ email: user.email, password: 'wrong-password-number' })
          .expect(401);
      }

      const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD });

      expect(res.status).toBe(429);
      expect(res.body.error.message).toMatch(/Try again in \d+ minutes?/);
      expect(res.headers['retry-after']).toBeDefined();
    } finally {
      await limited.close();
    }
  });

  it('keeps counting per address when X-Forwarded-For is forged', async () => {
    const limited = await startTestApp({ signInLimits: { perAccount: 100, perAddress: 3, windowMinutes: 15 } });
    try {
      const agent = await browserLikeAgent(limited);
      for (let i = 0; i < 3; i += 1) {
        await agent
          .post('/api/auth/sign-in')
          .set('X-Forwarded-For', `203.0.113.${i}`)
          .send({ email: uniqueEmail(), password: 'wrong-password-number' })
          .expect(401);
      }

      const res = await agent
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', '198.51.100.7')
        .send({ email: uniqueEmail(), password: 'wrong-password-number' });

      expect(res.status).toBe(429);
    } finally {
      await limited.close();
    }
  });
});
