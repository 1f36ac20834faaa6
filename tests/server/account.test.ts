import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { User } from '../../server/features/users/user.entity';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import { linkIn, waitForMail } from '../support/inbox';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp, useToken } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

describe('/api/account', () => {
  it('answers 401 to a visitor', async () => {
    const res = await (await browserLikeAgent(app)).get('/api/account');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('not_signed_in');
  });

  it('changes the display name', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const res = await agent.patch('/api/account/profile').send({ displayName: '  Fen Junction Club  ' });

    expect(res.status).toBe(200);
    expect(res.body.user.displayName).toBe('Fen Junction Club');
  });

  it('changes the password, keeps this session and ends every other one', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const here = await signedInAs(app, user);
    const elsewhere = await signedInAs(app, user);

    const res = await here
      .post('/api/account/password')
      .send({ currentPassword: GOOD_PASSWORD, newPassword: 'cross-members-at-400-centres' });

    expect(res.status).toBe(200);
    useToken(here, res.body);
    await here.get('/api/account').expect(200);
    await elsewhere.get('/api/account').expect(401);
    await waitForMail(user.email, 'password was changed');
  });

  it('names the current-password field when it is wrong', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const res = await agent
      .post('/api/account/password')
      .send({ currentPassword: 'not-my-password', newPassword: 'cross-members-at-400-centres' });

    expect(res.status).toBe(422);
    expect(res.body.error.fields).toEqual({ currentPassword: 'Your current password is not right.' });
  });

  it('changes the e-mail address only when the link sent to the new one is opened', async () => {
    const user = await buildUser(app.ctx.dataSource);
    const agent = await signedInAs(app, user);
    const newEmail = uniqueEmail('moved');

    await agent.post('/api/account/email').send({ newEmail, currentPassword: GOOD_PASSWORD }).expect(202);
    expect((await app.ctx.dataSource.getRepository(User).findOneByOrFail({ id: user.id })).email).toBe(user.email);
    const token = linkIn(
      await waitForMail(newEmail, 'Confirm your new e-mail'),
      '/account/confirm-email',
    ).searchParams.get('token');
    await agent.post('/api/account/email/confirm').send({ token }).expect(200);

    expect((await app.ctx.dataSource.getRepository(User).findOneByOrFail({ id: user.id })).email).toBe(newEmail);
    await waitForMail(user.email, 'e-mail address was changed');
  });
});
