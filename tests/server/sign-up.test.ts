import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { User } from '../../server/features/users/user.entity';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { linkIn, messagesTo, waitForMail } from '../support/inbox';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

describe('POST /api/auth/sign-up', () => {
  it('opens an account and e-mails a link that confirms the address', async () => {
    const agent = await browserLikeAgent(app);
    const email = uniqueEmail();

    const res = await agent
      .post('/api/auth/sign-up')
      .send({ email: email.toUpperCase(), displayName: 'Ada Pennant', password: GOOD_PASSWORD });

    expect(res.status).toBe(202);
    const mail = await waitForMail(email, 'Confirm your e-mail address');
    const token = linkIn(mail, '/verify-email').searchParams.get('token');
    await agent.post('/api/auth/verify-email').send({ token }).expect(200);
    const stored = await app.ctx.dataSource.getRepository(User).findOneByOrFail({ email });
    expect(stored.emailVerifiedAt).not.toBeNull();
    expect(stored.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });

  it('gives the same answer for an address that already has an account, and tells its owner', async () => {
    const owner = await buildUser(app.ctx.dataSource);
    const agent = await browserLikeAgent(app);
    const fresh = await agent
      .post('/api/auth/sign-up')
      .send({ email: uniqueEmail(), displayName: 'New Person', password: GOOD_PASSWORD });

    const taken = await agent
      .post('/api/auth/sign-up')
      .send({ email: owner.email, displayName: 'Someone Else', password: GOOD_PASSWORD });

    expect(taken.status).toBe(fresh.status);
    expect(taken.body).toEqual(fresh.body);
    await waitForMail(owner.email, 'Someone tried to join');
  });

  it('refuses a link that has already been used', async () => {
    const agent = await browserLikeAgent(app);
    const email = uniqueEmail();
    await agent
      .post('/api/auth/sign-up')
      .send({ email, displayName: 'Bram Siding', password: GOOD_PASSWORD })
      .expect(202);
    const token = linkIn(await waitForMail(email, 'Confirm'), '/verify-email').searchParams.get('token');
    await agent.post('/api/auth/verify-email').send({ token }).expect(200);

    const again = await agent.post('/api/auth/verify-email').send({ token });

    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('token_invalid');
  });

  it('answers 422 naming each bad field, and stores nothing', async () => {
    const agent = await browserLikeAgent(app);
    const email = uniqueEmail();

    const res = await agent
      .post('/api/auth/sign-up')
      .send({ email, displayName: 'J', password: 'short', role: 'admin' });

    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.fields).toEqual({
      displayName: 'Name must be at least 2 characters.',
      password: 'Password must be at least 12 characters.',
      role: 'This field is not accepted here.',
    });
    expect(await app.ctx.dataSource.getRepository(User).countBy({ email })).toBe(0);
  });

  it('refuses one of the most common passwords, even with digits added', async () => {
    const agent = await browserLikeAgent(app);

    const res = await agent
      .post('/api/auth/sign-up')
      .send({ email: uniqueEmail(), displayName: 'Cass Viaduct', password: 'qwertyuiop123' });

    expect(res.status).toBe(422);
    expect(res.body.error.fields.password).toMatch(/most commonly used/);
  });

  it('answers 400 to malformed JSON and 415 to a body that is not JSON', async () => {
    const agent = await browserLikeAgent(app);

    const malformed = await agent.post('/api/auth/sign-up').set('Content-Type', 'application/json').send('{"email": ');
    const text = await agent.post('/api/auth/sign-up').set('Content-Type', 'text/plain').send('email=a@b.test');

    expect(malformed.status).toBe(400);
    expect(malformed.body.error.code).toBe('malformed_json');
    expect(text.status).toBe(415);
  });

  it('refuses a request without the session CSRF token and sends no e-mail', async () => {
    const email = uniqueEmail();

    const res = await request(app.app)
      .post('/api/auth/sign-up')
      .send({ email, displayName: 'Dee Fishplate', password: GOOD_PASSWORD });

    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(await messagesTo(email)).toHaveLength(0);
  });
});
