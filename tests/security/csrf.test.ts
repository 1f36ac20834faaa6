import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { User } from '../../server/features/users/user.entity';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { browserLikeAgent, startTestApp, useToken } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

/** OWASP ASVS 5.0 V3.5.1 and the CSRF Prevention Cheat Sheet: synchroniser token on every state change. */
describe('cross-site request forgery', () => {
  it.each([
    ['JSON', 'application/json', JSON.stringify({ displayName: 'Forged Name' })],
    ['a form', 'application/x-www-form-urlencoded', 'displayName=Forged+Name'],
    ['text/plain', 'text/plain', '{"displayName":"Forged Name"}'],
  ])('refuses %s carrying the session cookie without the token, and changes nothing', async (_kind, type, body) => {
    const user = await buildUser(app.ctx.dataSource, { displayName: 'Ivo Original' });
    const agent = await browserLikeAgent(app);
    useToken(
      agent,
      (await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(200)).body,
    );

    const res = await agent.patch('/api/account/profile').set('X-CSRF-Token', '').set('Content-Type', type).send(body);

    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
    expect((await app.ctx.dataSource.getRepository(User).findOneByOrFail({ id: user.id })).displayName).toBe(
      'Ivo Original',
    );
  });

  it('refuses a token from another session', async () => {
    const other = await browserLikeAgent(app);
    const { body } = await other.get('/api/auth/session');

    const res = await request(app.app)
      .post('/api/auth/resend-verification')
      .set('X-CSRF-Token', body.csrfToken)
      .send({ email: 'a@example.test' });

    expect(res.status).toBe(403);
  });

  it('refuses a state change whose Origin is another site, even with a valid token', async () => {
    const agent = await browserLikeAgent(app);

    const res = await agent
      .post('/api/auth/resend-verification')
      .set('Origin', 'https://elsewhere.example')
      .send({ email: 'a@example.test' });

    expect(res.status).toBe(403);
  });

  it('sends no CORS headers, so other origins cannot read answers', async () => {
    const res = await request(app.app).get('/api/auth/session').set('Origin', 'https://elsewhere.example');
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
  });
});
