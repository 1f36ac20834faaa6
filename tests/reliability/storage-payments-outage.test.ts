import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { PHOTO_MESSAGES } from '../../shared/listings/photo-limits';
import { buildUser } from '../support/factories';
import { buildListing } from '../support/listing-factories';
import { jpegPhoto } from '../support/photo-fixtures';
import { photoState } from '../support/photo-storage';
import { uploadPhoto } from '../support/photo-uploads';
import { signedInAs } from '../support/sessions';
import { startTcpProxy, type TcpProxy } from '../support/tcp-proxy';
import { startTestApp } from '../support/test-app';
import { testConfig } from '../support/test-env';
import { health, untilHealthy } from './support/outage-checks';

/**
 * Photo storage (S3) and the payments service each go away and come back while the app keeps running. Each is
 * reached through a proxy of this test's own; `direct` is an app on the same services without a proxy, used to
 * look at what was stored. The shared services are never stopped.
 */
let direct: AppInstance;
let seller: User;
beforeAll(async () => {
  direct = await startTestApp();
  seller = await buildUser(direct.ctx.dataSource, { displayName: 'Priya Girder' });
});
afterAll(() => direct?.close());

const payoutRows = async (userId: number) => {
  const [{ n }] = await direct.ctx.dataSource.query('SELECT COUNT(*) AS n FROM payout_accounts WHERE user_id = ?', [
    userId,
  ]);
  return Number(n);
};

/** An app whose connections to one service go through a fresh proxy. */
async function appWithProxy(route: (proxy: TcpProxy) => Parameters<typeof startTestApp>[0]) {
  const { s3 } = testConfig();
  const proxy = await startTcpProxy(Number(new URL(s3.endpoint!).port));
  const app = await startTestApp(route(proxy));
  return { proxy, app, close: async () => (await app.close(), await proxy.close()) };
}

describe('a photo storage outage', () => {
  it('refuses uploads and photo reads with a clear 503, leaves nothing half-made, and recovers', async () => {
    const s3 = testConfig().s3;
    const staged = await appWithProxy((p) => ({ s3: { ...s3, endpoint: `http://${p.host}:${p.port}` } }));
    try {
      const listing = await buildListing(direct.ctx.dataSource, seller);
      const agent = await signedInAs(staged.app, seller);
      const first = await uploadPhoto(agent, listing.id, await jpegPhoto());
      expect(first.status).toBe(201);
      const thumbUrl = first.body.photo.thumbUrl as string;
      const before = await photoState(direct);

      await staged.proxy.cut();
      const refused = await uploadPhoto(agent, listing.id, await jpegPhoto());
      const unreadable = await agent.get(thumbUrl);
      const down = await health(staged.app);

      expect(refused.status).toBe(503);
      expect(refused.body.error).toEqual({
        code: 'storage_unavailable',
        message: PHOTO_MESSAGES.storageDown,
        retryAfterSeconds: 30,
      });
      expect(unreadable.status).toBe(503);
      expect(unreadable.body.error.message).toBe(PHOTO_MESSAGES.storageUnreadable);
      expect(await photoState(direct)).toEqual(before);
      expect(down.status).toBe(503);
      expect(down.body.down).toEqual(['storage']);
      expect(down.body.parts.storage?.message).toEqual(expect.any(String));

      await staged.proxy.restore();
      await untilHealthy(staged.app, 15_000);
      const again = await uploadPhoto(agent, listing.id, await jpegPhoto());
      expect(again.status).toBe(201);
      expect((await agent.get(thumbUrl)).status).toBe(200);
      const after = await photoState(direct);
      expect(after.rows).toBe(before.rows + 1);
      expect(after.objects.length).toBe(before.objects.length + 2);
    } finally {
      await staged.close();
    }
  }, 30_000);
});

describe('a payments service outage', () => {
  it('shows in /api/health, refuses payout set-up clearly, and clears when the service is back', async () => {
    const { stripe } = testConfig();
    const proxy = await startTcpProxy(stripe.port!);
    const app = await startTestApp({ stripe: { ...stripe, host: proxy.host, port: proxy.port } });
    try {
      expect((await health(app)).status).toBe(200);
      const payee = await buildUser(direct.ctx.dataSource, { displayName: 'Quentin Dowel' });
      const agent = await signedInAs(app, payee);

      await proxy.cut();
      const down = await health(app);
      const connect = await agent.post('/api/payouts/account');

      expect(down.status).toBe(503);
      expect(down.body.down).toEqual(['payments']);
      expect(down.body.parts.payments).toEqual({ ok: false, message: expect.any(String) });
      expect(connect.status).toBe(503);
      expect(connect.body).toEqual({
        error: {
          code: 'payments_unavailable',
          message: 'Payments cannot be reached just now. Nothing was changed; please try again in a few minutes.',
          retryAfterSeconds: 60,
        },
      });
      expect(await payoutRows(payee.id)).toBe(0);
      // The rest of the app is unaffected: browsing does not need payments.
      expect((await request(app.app).get('/api/listings')).status).toBe(200);

      await proxy.restore();
      await untilHealthy(app, 15_000);
      const again = await agent.post('/api/payouts/account');
      expect(again.status).toBe(200);
      expect(again.body.url).toEqual(expect.any(String));
      expect(await payoutRows(payee.id)).toBe(1);
    } finally {
      await app.close();
      await proxy.close();
    }
  }, 30_000);
});
