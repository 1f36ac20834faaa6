import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { wholeQueue } from '../support/moderation-queue';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

let app: AppInstance;
let moderator: User;
let mod: TestAgent;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  mod = await signedInAs(app, moderator);
});
afterAll(() => app.close());

describe('POST /api/listings/:id/reports', () => {
  it('puts a reported listing in the queue; a second report by the same member answers 409', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const reporter = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const res = await reporter.post(`/api/listings/${listing.id}/reports`).send({ reason: 'suspected-fraud' });
    expect(res.status).toBe(201);
    const again = await reporter.post(`/api/listings/${listing.id}/reports`).send({ reason: 'duplicate' });
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('already_reported');

    const item = (await wholeQueue(mod)).find((i) => i.listing.id === listing.id);
    expect(item?.reports).toHaveLength(1);
  });

  it('answers 403 to a seller reporting their own listing and 401 to a visitor', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const listing = await buildListedListing(app.ctx, seller, moderator);
    await (
      await signedInAs(app, seller)
    )
      .post(`/api/listings/${listing.id}/reports`)
      .send({ reason: 'duplicate' })
      .expect(403);
    await (
      await browserLikeAgent(app)
    )
      .post(`/api/listings/${listing.id}/reports`)
      .send({ reason: 'duplicate' })
      .expect(401);
  });

  it('takes the listing out of the queue when a moderator dismisses its reports, keeping it listed', async () => {
    const listing = await buildListedListing(app.ctx, await buildUser(app.ctx.dataSource), moderator);
    await (
      await signedInAs(app, await buildUser(app.ctx.dataSource))
    )
      .post(`/api/listings/${listing.id}/reports`)
      .send({ reason: 'other', details: 'Looks too cheap for a sceniced board.' })
      .expect(201);

    const res = await mod
      .post(`/api/moderation/listings/${listing.id}/dismiss-reports`)
      .send({ note: 'Price checked with the seller.' });

    expect(res.status).toBe(200);
    expect(res.body.listing.state).toBe('listed');
    expect((await wholeQueue(mod)).some((i) => i.listing.id === listing.id)).toBe(false);
    await mod.post(`/api/moderation/listings/${listing.id}/dismiss-reports`).send({ note: 'Again' }).expect(409);
  });
});
