import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { singlePortableModule, tenByThirteenTwoLevel } from '../../shared/planner';
import { buildUser } from '../support/factories';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

describe('POST /api/planner/plan', () => {
  it('computes a plan for a visitor, with the cutting list, weight and sag checks', async () => {
    const agent = await browserLikeAgent(app);

    const res = await agent.post('/api/planner/plan').send(tenByThirteenTwoLevel);

    expect(res.status).toBe(200);
    expect(res.body.plan.boards.length).toBeGreaterThan(4);
    expect(res.body.plan.cuttingList.length).toBeGreaterThan(0);
    expect(res.body.plan.weight).toBeDefined();
    expect(res.body.plan.safety).toBeDefined();
  });

  it('answers 400 naming the field that is wrong', async () => {
    const agent = await browserLikeAgent(app);

    const res = await agent.post('/api/planner/plan').send({ boards: [{ lengthMm: 250, widthMm: 200 }] });

    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_plan_input');
    expect(Object.keys(res.body.error.fields)).toEqual(['boards.0.lengthMm']);
    expect(res.body.error.fields['boards.0.lengthMm']).toMatch(/at least/);
  });

  it('limits how many plans one address computes a minute', async () => {
    const limited = await startTestApp({ plannerLimitPerMinute: 2 });
    try {
      const agent = await browserLikeAgent(limited);
      await agent.post('/api/planner/plan').send(singlePortableModule).expect(200);
      await agent.post('/api/planner/plan').send(singlePortableModule).expect(200);

      const third = await agent.post('/api/planner/plan').send(singlePortableModule);

      expect(third.status).toBe(429);
    } finally {
      await limited.close();
    }
  });
});

describe('/api/plans', () => {
  it('saves, lists, reopens, renames and deletes a member’s plan', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const created = await agent.post('/api/plans').send({ name: 'Loft layout', input: tenByThirteenTwoLevel });
    expect(created.status).toBe(201);
    const id = created.body.plan.id as number;
    expect((await agent.get('/api/plans')).body.items.map((p: { name: string }) => p.name)).toEqual(['Loft layout']);
    const reopened = await agent.get(`/api/plans/${id}`).expect(200);
    expect(reopened.body.plan.input.room).toBeDefined();
    await agent.put(`/api/plans/${id}`).send({ name: 'Loft, version 2', input: singlePortableModule }).expect(200);
    expect((await agent.get(`/api/plans/${id}`)).body.plan.name).toBe('Loft, version 2');
    await agent.delete(`/api/plans/${id}`).expect(204);
    await agent.get(`/api/plans/${id}`).expect(404);
  });

  it('refuses to store an input the planner would refuse, naming the field', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const res = await agent
      .post('/api/plans')
      .send({ name: 'Bad', input: { boards: [{ lengthMm: 1200, widthMm: -5 }] } });

    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields)).toEqual(['input.boards.0.widthMm']);
  });

  it('answers 404 when another member asks for, changes or deletes the plan', async () => {
    const owner = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const other = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const { body } = await owner.post('/api/plans').send({ name: 'Private', input: singlePortableModule }).expect(201);
    const url = `/api/plans/${body.plan.id}`;

    await other.get(url).expect(404);
    await other.put(url).send({ name: 'Mine now', input: singlePortableModule }).expect(404);
    await other.post(`${url}/share`).send({ shared: true }).expect(404);
    await other.delete(url).expect(404);
    expect((await owner.get(url)).body.plan.name).toBe('Private');
  });

  it('shares a read-only copy by an unguessable link, and stops sharing it', async () => {
    const owner = await signedInAs(app, await buildUser(app.ctx.dataSource, { displayName: 'Vera Ballast' }));
    const { body } = await owner.post('/api/plans').send({ name: 'Shed layout', input: singlePortableModule });

    const shared = await owner.post(`/api/plans/${body.plan.id}/share`).send({ shared: true }).expect(200);
    const token = new URL(shared.body.plan.shareUrl as string).pathname.split('/').pop()!;
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const seen = await request(app.app).get(`/api/shared-plans/${token}`).expect(200);
    expect(seen.body.plan).toMatchObject({ name: 'Shed layout', sharedBy: 'Vera Ballast' });

    await owner.post(`/api/plans/${body.plan.id}/share`).send({ shared: false }).expect(200);
    await request(app.app).get(`/api/shared-plans/${token}`).expect(404);
  });
});
