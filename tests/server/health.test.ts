import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app.close());

describe('GET /api/health', () => {
  it('answers 200 when database, storage, payments and mail all answer', async () => {
    const res = await request(app.app).get('/api/health');

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      status: 'ok',
      down: [],
      parts: { database: { ok: true }, storage: { ok: true }, payments: { ok: true }, mail: { ok: true } },
    });
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('answers 503 naming the part that is down', async () => {
    const broken = await startTestApp({ mail: { ...app.ctx.config.mail, port: 9 } });
    try {
      const res = await request(broken.app).get('/api/health');

      expect(res.status).toBe(503);
      expect(res.body.down).toEqual(['mail']);
    } finally {
      await broken.close();
    }
  });
});

describe('unknown API routes', () => {
  it('answer a JSON 404 in the one error shape', async () => {
    const res = await request(app.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not_found', message: 'That API route was not found.' } });
  });
});
