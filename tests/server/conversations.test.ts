import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { MESSAGE_MAX_LENGTH, MESSAGES_PAGE_SIZE } from '../../shared/schemas/conversations';
import type { MessageView, ThreadView } from '../../shared/types/conversations';
import { buildUser } from '../support/factories';
import { linkIn, waitForMail } from '../support/inbox';
import { buildListedListing, buildListing } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let moderator: User;
let seller: User;
/** One listing for most tests: each test asks with members of its own, so their threads stay apart. */
let listing: Listing;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  seller = await buildUser(app.ctx.dataSource, { displayName: 'Hattie Fishplate' });
  listing = await buildListedListing(app.ctx, seller, moderator, { title: 'Four-road fiddle yard' });
});
afterAll(() => app.close());

const bodies = (messages: MessageView[]) => messages.map((m) => m.body);

describe('asking the seller about a listing', () => {
  it('opens one thread per listing and member, and asking again adds to the same thread', async () => {
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const before = await buyer.get(`/api/conversations/listings/${listing.id}`).expect(200);
    expect(before.body.thread).toBeNull();
    expect(before.body.about).toMatchObject({
      title: 'Four-road fiddle yard',
      other: { displayName: 'Hattie Fishplate' },
    });

    const first = await buyer
      .post(`/api/conversations/listings/${listing.id}/messages`)
      .send({ body: 'Is the fiddle yard still available?' })
      .expect(201);
    const again = await buyer
      .post(`/api/conversations/listings/${listing.id}/messages`)
      .send({ body: 'And would it fit in an estate car?' })
      .expect(201);

    expect(again.body.conversationId).toBe(first.body.conversationId);
    const thread = (await buyer.get(`/api/conversations/listings/${listing.id}`).expect(200)).body.thread as ThreadView;
    expect(thread.conversation).toMatchObject({ id: first.body.conversationId, kind: 'listing', you: 'buyer' });
    expect(bodies(thread.messages)).toEqual([
      'Is the fiddle yard still available?',
      'And would it fit in an estate car?',
    ]);
  });

  it('gives each asking member their own thread with the seller', async () => {
    const one = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const two = await signedInAs(app, await buildUser(app.ctx.dataSource));

    const a = await one.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'Question one' });
    const b = await two.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'Question two' });

    expect(a.status).toBe(201);
    expect(b.status).toBe(201);
    expect(a.body.conversationId).not.toBe(b.body.conversationId);
    const sellerAgent = await signedInAs(app, seller);
    const mine = await sellerAgent.get(`/api/conversations/${b.body.conversationId}`).expect(200);
    expect(bodies(mine.body.messages)).toEqual(['Question two']);
    expect(mine.body.conversation.you).toBe('seller');
  });

  it('e-mails the seller a link to the thread, not the message', async () => {
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource, { displayName: 'Ned Ballast' }));
    const secret = `Private detail ${Date.now()}`;

    const sent = await buyer
      .post(`/api/conversations/listings/${listing.id}/messages`)
      .send({ body: secret })
      .expect(201);

    const mail = await waitForMail(seller.email, 'New message from Ned Ballast about Four-road fiddle yard');
    expect(linkIn(mail, `/messages/${sent.body.conversationId}`).origin).toBe(app.ctx.config.appOrigin);
    expect(mail.text).not.toContain(secret);
    expect(mail.html).not.toContain(secret);
    expect(mail.html).toContain(`/messages/${sent.body.conversationId}`);
  });

  it('answers 409 when a seller asks about their own listing', async () => {
    const sellerAgent = await signedInAs(app, seller);

    const res = await sellerAgent
      .post(`/api/conversations/listings/${listing.id}/messages`)
      .send({ body: 'Hello me' })
      .expect(409);
    expect(res.body.error.code).toBe('own_listing');
    await sellerAgent.get(`/api/conversations/listings/${listing.id}`).expect(409);
  });

  it('answers 404 for a draft listing, and for one that does not exist', async () => {
    const draft = await buildListing(app.ctx.dataSource, seller);
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));

    await buyer.post(`/api/conversations/listings/${draft.id}/messages`).send({ body: 'Hello?' }).expect(404);
    await buyer.get(`/api/conversations/listings/${draft.id}`).expect(404);
    await buyer.post('/api/conversations/listings/4000000000/messages').send({ body: 'Hello?' }).expect(404);
  });

  it('keeps the text exactly as written, markup and line breaks included', async () => {
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const text = 'Line one\r\n<img src=x onerror="alert(1)">\n<script>alert("x")</script> & more';

    const res = await buyer.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: text }).expect(201);

    expect(res.body.message.body).toBe('Line one\n<img src=x onerror="alert(1)">\n<script>alert("x")</script> & more');
  });

  it('answers 422 with a message for the field when the text is empty or too long', async () => {
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const url = `/api/conversations/listings/${listing.id}/messages`;

    const empty = await buyer.post(url).send({ body: '   \n ' }).expect(422);
    expect(empty.body.error.fields.body).toBe('Write a message first.');
    const long = await buyer
      .post(url)
      .send({ body: 'x'.repeat(MESSAGE_MAX_LENGTH + 1) })
      .expect(422);
    expect(long.body.error.fields.body).toMatch(/at most 2,000 characters/);
    await buyer
      .post(url)
      .send({ body: 'y'.repeat(MESSAGE_MAX_LENGTH) })
      .expect(201);
    await buyer.post(url).send({ body: 'z', extra: true }).expect(422);
  });
});

describe('reading a thread', () => {
  it('answers 404 to members outside the thread, and to moderators, for a listing thread', async () => {
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const { body } = await buyer
      .post(`/api/conversations/listings/${listing.id}/messages`)
      .send({ body: 'Only for the seller' })
      .expect(201);
    const stranger = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const mod = await signedInAs(app, moderator);

    for (const agent of [stranger, mod]) {
      await agent.get(`/api/conversations/${body.conversationId}`).expect(404);
      await agent.get(`/api/conversations/${body.conversationId}/messages?before=999999`).expect(404);
      await agent.post(`/api/conversations/${body.conversationId}/messages`).send({ body: 'Me too' }).expect(404);
      await agent.post(`/api/conversations/${body.conversationId}/read`).send({ lastMessageId: 1 }).expect(404);
    }
    expect((await stranger.get('/api/conversations').expect(200)).body.items).toEqual([]);
  });

  it('pages from the newest page back to the first message, each page oldest first', async () => {
    const buyer = await buildUser(app.ctx.dataSource);
    const agent = await signedInAs(app, buyer);
    const first = await agent.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'm1' });
    const id = first.body.conversationId as number;
    // Arrange the rest directly: the sending allowance would otherwise stop this test.
    const total = MESSAGES_PAGE_SIZE + 5;
    for (let n = 2; n <= total; n += 1)
      await app.ctx.dataSource.query(
        'INSERT INTO conversation_messages (conversation_id, sender_id, body) VALUES (?, ?, ?)',
        [id, n % 2 ? buyer.id : seller.id, `m${n}`],
      );

    const latest = (await agent.get(`/api/conversations/${id}`).expect(200)).body as ThreadView;
    expect(latest.messages).toHaveLength(MESSAGES_PAGE_SIZE);
    expect(latest.messages[0]!.body).toBe('m6');
    expect(latest.messages.at(-1)!.body).toBe(`m${total}`);
    expect(latest.hasEarlier).toBe(true);

    const earlier = await agent.get(`/api/conversations/${id}/messages?before=${latest.messages[0]!.id}`).expect(200);
    expect(bodies(earlier.body.messages)).toEqual(['m1', 'm2', 'm3', 'm4', 'm5']);
    expect(earlier.body.hasEarlier).toBe(false);

    const after = await agent.get(`/api/conversations/${id}/messages?after=${latest.messages.at(-3)!.id}`).expect(200);
    expect(bodies(after.body.messages)).toEqual([`m${total - 1}`, `m${total}`]);
    await agent.get(`/api/conversations/${id}/messages`).expect(422);
  });
});
