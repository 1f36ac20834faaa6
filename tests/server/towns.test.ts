import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

describe('GET /api/towns', () => {
  it('suggests British and Irish towns whose names start with the typed letters, largest first', async () => {
    const res = await (await browserLikeAgent(app)).get('/api/towns').query({ q: 'man' });
    expect(res.status).toBe(200);
    expect(res.body.items[0]).toMatchObject({ id: 2643123, name: 'Manchester', adminArea: 'England', country: 'GB' });
    expect(res.body.items.length).toBeLessThanOrEqual(10);
    expect(res.body.items.every((t: { name: string }) => t.name.toLowerCase().startsWith('man'))).toBe(true);
  });

  it('matches without regard to case or accents, and can keep to one country', async () => {
    const res = await (await browserLikeAgent(app)).get('/api/towns').query({ q: 'DUBL', country: 'IE' });
    expect(res.body.items[0]).toMatchObject({ name: 'Dublin', adminArea: 'Leinster', country: 'IE' });
  });

  it('asks for the start of a name', async () => {
    const res = await (await browserLikeAgent(app)).get('/api/towns');
    expect(res.status).toBe(422);
    expect(res.body.error.fields.q).toMatch(/start of a town/);
  });
});
