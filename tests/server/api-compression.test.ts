import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { compressApi } from '../../server/http/middlewares/compress-api';
import { buildUser } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;

beforeAll(async () => {
  app = await startTestApp();
  const seller = await buildUser(app.ctx.dataSource);
  const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  // Enough listings that a page of results is well over the 1 KB below which nothing is compressed.
  for (let i = 0; i < 3; i += 1)
    await buildListedListing(app.ctx, seller, moderator, { title: `Compression board ${i}` });
});
afterAll(() => app?.close());

describe('API compression', () => {
  it('sends search results gzip-compressed to a browser that accepts it', async () => {
    const agent = await browserLikeAgent(app);
    const res = await agent.get('/api/listings').set('Accept-Encoding', 'gzip').expect(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect((res.body as { items: unknown[] }).items.length).toBeGreaterThan(0);
  });

  it('never compresses sign-in and account answers, which carry the CSRF token (BREACH: secrets beside typed text)', async () => {
    // A large answer on each side of the filter, so only the filter decides (small answers are never compressed).
    const big = { csrfToken: 'x'.repeat(40), note: 'board '.repeat(2_000) };
    const api = express.Router();
    api.use(compressApi());
    for (const path of ['/auth/session', '/account', '/listings']) api.get(path, (_req, res) => res.json(big));
    const probe = express().use('/api', api);
    for (const path of ['/api/auth/session', '/api/account']) {
      const res = await request(probe).get(path).set('Accept-Encoding', 'gzip').expect(200);
      expect(res.headers['content-encoding'], path).toBeUndefined();
    }
    const listings = await request(probe).get('/api/listings').set('Accept-Encoding', 'gzip').expect(200);
    expect(listings.headers['content-encoding']).toBe('gzip');
  });
});
