import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let admin: User;
beforeAll(async () => {
  app = await startTestApp();
  admin = await buildUser(app.ctx.dataSource, { role: 'admin', displayName: 'Gwen Admin' });
});
afterAll(() => app.close());

describe('/api/admin/users', () => {
  it('lists people by search text for an administrator', async () => {
    const target = await buildUser(app.ctx.dataSource, { displayName: 'Harriet Gradient' });
    const agent = await signedInAs(app, admin);

    const res = await agent.get('/api/admin/users').query({ q: target.email, pageSize: 10 });

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items[0]).toMatchObject({ id: target.id, displayName: 'Harriet Gradient', suspendedAt: null });
  });

  it('treats SQL wildcards in the search text as plain characters', async () => {
    const agent = await signedInAs(app, admin);

    const res = await agent.get('/api/admin/users').query({ q: "%' OR 1=1 -- _" });

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(0);
  });

  it('answers 403 to a moderator', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource, { role: 'moderator' }));
    const res = await agent.get('/api/admin/users');
    expect(res.status).toBe(403);
  });

  it('changes a role and records who, what, why and when in the audit log', async () => {
    const target = await buildUser(app.ctx.dataSource);
    const agent = await signedInAs(app, admin);

    const res = await agent
      .patch(`/api/admin/users/${target.id}/role`)
      .send({ role: 'moderator', reason: 'Joined the review team' });

    expect(res.status).toBe(200);
    expect(res.body.user.role).toBe('moderator');
    const events = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .findBy({ action: 'user.role_changed', targetId: String(target.id) });
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      actorId: admin.id,
      detail: { from: 'member', to: 'moderator', reason: 'Joined the review team' },
    });
  });

  it('refuses to change the administrator’s own role', async () => {
    const agent = await signedInAs(app, admin);
    const res = await agent
      .patch(`/api/admin/users/${admin.id}/role`)
      .send({ role: 'member', reason: 'Testing myself' });
    expect(res.status).toBe(409);
  });

  it('requires a reason and a known role', async () => {
    const target = await buildUser(app.ctx.dataSource);
    const agent = await signedInAs(app, admin);

    const res = await agent.patch(`/api/admin/users/${target.id}/role`).send({ role: 'owner' });

    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['reason', 'role']);
  });

  it('suspends an account: its sessions end and sign-in names the reason; reinstating restores it', async () => {
    const target = await buildUser(app.ctx.dataSource);
    const targetAgent = await signedInAs(app, target);
    const agent = await signedInAs(app, admin);

    await agent
      .post(`/api/admin/users/${target.id}/suspension`)
      .send({ reason: 'Repeated misleading listings' })
      .expect(200);

    await targetAgent.get('/api/account').expect(401);
    const refused = await (
      await browserLikeAgent(app)
    )
      .post('/api/auth/sign-in')
      .send({ email: target.email, password: GOOD_PASSWORD });
    expect(refused.body.error.message).toContain('Repeated misleading listings');
    await agent.delete(`/api/admin/users/${target.id}/suspension`).expect(200);
    await signedInAs(app, target);
  });
});

describe('GET /api/audit-events', () => {
  it('shows moderators the newest events with the actor’s name', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource, { role: 'moderator' }));

    const res = await agent.get('/api/audit-events').query({ pageSize: 5 });

    expect(res.status).toBe(200);
    expect(res.body.items.length).toBeGreaterThan(0);
    expect(res.body.items[0]).toHaveProperty('actor');
  });

  it('answers 403 to a member', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));
    await agent.get('/api/audit-events').expect(403);
  });
});
