import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { linkIn, messagesTo, waitForMail } from '../support/inbox';
import { browserLikeAgent, startTestApp, useToken } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

const NEW_PASSWORD = 'level-deck-above-hidden-sidings';

describe('password reset', () => {
  it('answers alike for a known and an unknown address, e-mailing only the known one', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const stranger = uniqueEmail();
    const agent = await browserLikeAgent(app);

    const known = await agent.post('/api/auth/password-reset/request').send({ email: user.email });
    const unknown = await agent.post('/api/auth/password-reset/request').send({ email: stranger });

    expect(known.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    await waitForMail(user.email, 'Reset your Benchwright password');
    expect(await messagesTo(stranger)).toHaveLength(0);
  });

  it('sets the new password once, ends existing sessions, and refuses the link a second time', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const signedIn = await browserLikeAgent(app);
    useToken(
      signedIn,
      (await signedIn.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(200)).body,
    );
    const agent = await browserLikeAgent(app);
    await agent.post('/api/auth/password-reset/request').send({ email: user.email }).expect(202);
    const token = linkIn(await waitForMail(user.email, 'Reset your'), '/reset-password').searchParams.get('token');

    await agent.post('/api/auth/password-reset/confirm').send({ token, password: NEW_PASSWORD }).expect(200);

    await signedIn.get('/api/account').expect(401);
    await agent.post('/api/auth/sign-in').send({ email: user.email, password: GOOD_PASSWORD }).expect(401);
    await agent.post('/api/auth/sign-in').send({ email: user.email, password: NEW_PASSWORD }).expect(200);
    const again = await (
      await browserLikeAgent(app)
    )
      .post('/api/auth/password-reset/confirm')
      .send({ token, password: 'another-fine-password' });
    expect(again.body.error.code).toBe('token_invalid');
    await waitForMail(user.email, 'password was changed');
  });

  it('keeps the link usable when the new password is refused', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const agent = await browserLikeAgent(app);
    await agent.post('/api/auth/password-reset/request').send({ email: user.email }).expect(202);
    const token = linkIn(await waitForMail(user.email, 'Reset your'), '/reset-password').searchParams.get('token');

    const weak = await agent.post('/api/auth/password-reset/confirm').send({ token, password: 'password1234' });

    expect(weak.status).toBe(422);
    expect(weak.body.error.fields.password).toBeDefined();
    await agent.post('/api/auth/password-reset/confirm').send({ token, password: NEW_PASSWORD }).expect(200);
  });

  it('limits reset e-mails for one address to three an hour', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const agent = await browserLikeAgent(app);
    for (let i = 0; i < 3; i += 1)
      await agent.post('/api/auth/password-reset/request').send({ email: user.email }).expect(202);

    const fourth = await agent.post('/api/auth/password-reset/request').send({ email: user.email });

    expect(fourth.status).toBe(429);
    expect(fourth.body.error.code).toBe('rate_limited');
  });
});
