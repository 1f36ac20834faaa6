import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { TOWNS, serviceBody } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

const application = {
  businessName: 'Wharfside Benchworks',
  about: 'Portable module frames in planed softwood and birch ply, built square and true to club standards.',
  townId: TOWNS.derby,
  builds: ['portable-modules', 'fiddle-yards'],
};

let app: AppInstance;
let moderator: User;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
});
afterAll(() => app.close());

describe('builder profiles', () => {
  it('makes a member a builder once a moderator approves, audit-logged, and then lets them list services', async () => {
    const member = await buildUser(app.ctx.dataSource, { displayName: 'Tamsin Orrell' });
    const agent = await signedInAs(app, member);
    await agent.post('/api/listings').send(serviceBody()).expect(403);

    const applied = await agent.post('/api/builder-profiles').send(application);
    expect(applied.status).toBe(201);
    expect(applied.body.profile).toMatchObject({ state: 'applied', town: { name: 'Derby' } });
    const pending = await (await signedInAs(app, moderator)).get('/api/builder-profiles').query({ pageSize: 100 });
    expect(pending.body.items.some((p: { id: number }) => p.id === applied.body.profile.id)).toBe(true);

    const approved = await (
      await signedInAs(app, moderator)
    )
      .post(`/api/builder-profiles/${applied.body.profile.id}/approve`)
      .send({});

    expect(approved.status).toBe(200);
    expect(approved.body.profile.state).toBe('approved');
    const user = await app.ctx.dataSource.getRepository(User).findOneByOrFail({ id: member.id });
    expect(user.role).toBe('builder');
    const audit = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .findBy({ targetId: String(member.id), action: 'user.role_changed' });
    expect(audit[0]).toMatchObject({ actorId: moderator.id, detail: { from: 'member', to: 'builder' } });
    await waitForMail(member.email, 'Your builder profile is approved');
    const builderAgent = await signedInAs(app, user);
    await builderAgent.post('/api/listings').send(serviceBody()).expect(201);
    await builderAgent.post('/api/builder-profiles').send(application).expect(409);
  });

  it('declines with a reason the member is e-mailed, and lets them apply again', async () => {
    const member = await buildUser(app.ctx.dataSource);
    const agent = await signedInAs(app, member);
    const { body } = await agent.post('/api/builder-profiles').send(application).expect(201);

    const declined = await (
      await signedInAs(app, moderator)
    )
      .post(`/api/builder-profiles/${body.profile.id}/decline`)
      .send({ reason: 'Please add photographs of frames you have built.' });

    expect(declined.body.profile).toMatchObject({
      state: 'declined',
      decisionNote: 'Please add photographs of frames you have built.',
    });
    const mail = await waitForMail(member.email, 'builder profile was not approved');
    expect(mail.text).toContain('Please add photographs of frames you have built.');
    const again = await agent.post('/api/builder-profiles').send(application);
    expect(again.body.profile.state).toBe('applied');
    expect((await agent.get('/api/builder-profiles/mine')).body.profile.id).toBe(body.profile.id);
  });

  it('answers 403 when a member approves an application, and 409 when a moderator applies for one', async () => {
    const member = await buildUser(app.ctx.dataSource);
    const { body } = await (await signedInAs(app, member)).post('/api/builder-profiles').send(application).expect(201);
    await (
      await signedInAs(app, await buildUser(app.ctx.dataSource))
    )
      .post(`/api/builder-profiles/${body.profile.id}/approve`)
      .send({})
      .expect(403);
    await (await signedInAs(app, moderator)).post('/api/builder-profiles').send(application).expect(409);
  });
});
