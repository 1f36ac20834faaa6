import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { AuditEvent } from '../../server/features/audit/audit-event.entity';
import { ListingDecision } from '../../server/features/listings/listing-decision.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { buildListedListing, buildListing, moduleBody } from '../support/listing-factories';
import { wholeQueue } from '../support/moderation-queue';
import { signedInAs } from '../support/sessions';
import { browserLikeAgent, startTestApp } from '../support/test-app';

const TICKED = { photosShowItem: true, plausiblePrice: true, nothingProhibited: true, noContactDetails: true };

let app: AppInstance;
let moderator: User;
let mod: TestAgent;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator', displayName: 'Rhoda Quarrie' });
  mod = await signedInAs(app, moderator);
});
afterAll(() => app.close());

async function submitted(seller: User, overrides = {}) {
  const listing = await buildListing(app.ctx.dataSource, seller, overrides);
  await (await signedInAs(app, seller)).post(`/api/listings/${listing.id}/submit`).send({}).expect(200);
  return listing;
}

describe('GET /api/moderation/queue', () => {
  it('lists listings awaiting review and reported ones, oldest first, with the checklist and contact flags', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const first = await submitted(seller, {
      description: 'Sturdy OO module, ring 07700 900123 or write to seller@example.org before buying.',
    });
    const second = await submitted(seller);
    const reported = await buildListedListing(app.ctx, seller, moderator);
    await (
      await signedInAs(app, await buildUser(app.ctx.dataSource))
    )
      .post(`/api/listings/${reported.id}/reports`)
      .send({ reason: 'misdescribed', details: 'The photos show a different board.' })
      .expect(201);

    const queue = await wholeQueue(mod);

    const times = queue.map((i) => i.queuedAt);
    expect(times).toEqual([...times].sort());
    const ids = queue.map((i) => i.listing.id);
    expect(ids.indexOf(first.id)).toBeLessThan(ids.indexOf(second.id));
    expect(ids.indexOf(second.id)).toBeLessThan(ids.indexOf(reported.id));
    const item = queue.find((i) => i.listing.id === first.id)!;
    expect(item.awaitingReview).toBe(true);
    expect(item.checklist.map((c) => c.item)).toEqual([
      'photosShowItem',
      'plausiblePrice',
      'nothingProhibited',
      'noContactDetails',
    ]);
    expect(item.flags).toEqual([
      { field: 'description', kind: 'phone', match: '07700 900123' },
      { field: 'description', kind: 'email', match: 'seller@example.org' },
    ]);
    const reportedItem = queue.find((i) => i.listing.id === reported.id)!;
    expect(reportedItem).toMatchObject({ awaitingReview: false, reports: [{ reason: 'misdescribed' }] });
  });
});

describe('approving and sending back', () => {
  it('refuses to approve unless every checklist item holds, naming the item', async () => {
    const listing = await submitted(await buildUser(app.ctx.dataSource));
    const res = await mod
      .post(`/api/moderation/listings/${listing.id}/approve`)
      .send({ checklist: { ...TICKED, plausiblePrice: false } });
    expect(res.status).toBe(422);
    expect(Object.keys(res.body.error.fields)).toEqual(['checklist.plausiblePrice']);
  });

  it('sends a listing back with reasons, e-mails the seller and records the decision', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Ivo Penhallow' });
    const listing = await submitted(seller, { title: 'N gauge fiddle yard, six roads' });

    const res = await mod.post(`/api/moderation/listings/${listing.id}/send-back`).send({
      reasons: ['contact-details', 'other'],
      note: 'Please also say which end carries the two tracks.',
      checklist: { ...TICKED, noContactDetails: false },
    });

    expect(res.status).toBe(200);
    expect(res.body.listing.state).toBe('sent_back');
    expect(res.body.listing.lastDecision).toMatchObject({ moderator: { displayName: 'Rhoda Quarrie' } });
    const mail = await waitForMail(seller.email, 'Your listing needs changes: N gauge fiddle yard, six roads');
    expect(mail.text).toContain('Hello Ivo Penhallow');
    expect(mail.text).toContain('Contact details must not appear in the listing');
    expect(mail.text).toContain('Please also say which end carries the two tracks.');
    const decision = await app.ctx.dataSource.getRepository(ListingDecision).findOneByOrFail({ listingId: listing.id });
    expect(decision).toMatchObject({
      moderatorId: moderator.id,
      decision: 'sent_back',
      reasons: ['contact-details', 'other'],
      checklist: { ...TICKED, noContactDetails: false },
    });

    const sellerAgent = await signedInAs(app, seller);
    const own = await sellerAgent.get(`/api/listings/${listing.id}`);
    expect(own.body.listing.lastDecision).toMatchObject({
      decision: 'sent_back',
      reasons: ['contact-details', 'other'],
    });
    expect(own.body.listing.lastDecision).not.toHaveProperty('moderator');
    await sellerAgent.put(`/api/listings/${listing.id}`).send(moduleBody()).expect(200);
    await sellerAgent.post(`/api/listings/${listing.id}/submit`).send({}).expect(200);
  });

  it('asks for a note when the reason is "other"', async () => {
    const listing = await submitted(await buildUser(app.ctx.dataSource));
    const res = await mod.post(`/api/moderation/listings/${listing.id}/send-back`).send({ reasons: ['other'] });
    expect(res.status).toBe(422);
    expect(res.body.error.fields.note).toMatch(/another reason/);
  });
});

describe('POST /api/moderation/listings/:id/take-down', () => {
  it('withdraws a listing and warns its seller by e-mail, recording the warning', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const listing = await buildListedListing(app.ctx, seller, moderator, { title: 'TT scale station throat board' });

    const res = await mod
      .post(`/api/moderation/listings/${listing.id}/take-down`)
      .send({ reason: 'The board shown is not the one for sale.', sellerAction: 'warn' });

    expect(res.status).toBe(200);
    expect(res.body.listing.state).toBe('withdrawn');
    const mail = await waitForMail(seller.email, 'Your listing was withdrawn: TT scale station throat board');
    expect(mail.text).toContain('This is a warning');
    const warned = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .findOneBy({ action: 'user.warned', targetId: String(seller.id) });
    expect(warned).toMatchObject({ actorId: moderator.id });
  });

  it('suspends the seller: their session ends, sign-in names the reason, and the audit log says who', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const sellerAgent = await signedInAs(app, seller);
    const listing = await buildListedListing(app.ctx, seller, moderator);

    await mod
      .post(`/api/moderation/listings/${listing.id}/take-down`)
      .send({ reason: 'Selling boards that do not exist.', sellerAction: 'suspend' })
      .expect(200);

    await sellerAgent.get('/api/listings/mine').expect(401);
    const refused = await (
      await browserLikeAgent(app)
    )
      .post('/api/auth/sign-in')
      .send({ email: seller.email, password: GOOD_PASSWORD });
    expect(refused.body.error.message).toContain('Selling boards that do not exist.');
    const suspended = await app.ctx.dataSource
      .getRepository(AuditEvent)
      .findOneBy({ action: 'user.suspended', targetId: String(seller.id) });
    expect(suspended).toMatchObject({ actorId: moderator.id, detail: { reason: 'Selling boards that do not exist.' } });
  });

  it('leaves suspending a moderator to an administrator', async () => {
    const otherModerator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    const listing = await buildListedListing(app.ctx, otherModerator, moderator);
    const res = await mod
      .post(`/api/moderation/listings/${listing.id}/take-down`)
      .send({ reason: 'Testing the limits.', sellerAction: 'suspend' });
    expect(res.status).toBe(403);
  });
});
