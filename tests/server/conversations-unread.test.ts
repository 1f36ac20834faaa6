import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { UNREAD_TOTAL_SQL } from '../../server/features/conversations/conversation-reading.service';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import type { ThreadView } from '../../shared/types/conversations';
import { buildUser } from '../support/factories';
import { messagesTo, waitForMail } from '../support/inbox';
import { buildListedListing } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let moderator: User;
let seller: User;
let listing: Listing;
beforeAll(async () => {
  app = await startTestApp();
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  seller = await buildUser(app.ctx.dataSource, { displayName: 'Hattie Fishplate' });
  listing = await buildListedListing(app.ctx, seller, moderator, { title: 'Streak test module' });
});
afterAll(() => app.close());

async function queuedTo(address: string, subject: string): Promise<number> {
  const [row] = (await app.ctx.dataSource.query(
    'SELECT COUNT(*) AS n FROM outbound_emails WHERE to_address = ? AND subject = ?',
    [address, subject],
  )) as { n: number | string }[];
  return Number(row?.n ?? 0);
}

describe('unread messages', () => {
  it('counts what the other member wrote until it is read, and read markers never move back', async () => {
    const buyer = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const sellerAgent = await signedInAs(app, seller);
    const startCount = (await sellerAgent.get('/api/conversations/unread-count').expect(200)).body.count as number;

    const q1 = await buyer.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'One' });
    const q2 = await buyer.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'Two' });
    const id = q1.body.conversationId as number;

    expect((await sellerAgent.get('/api/conversations/unread-count').expect(200)).body.count).toBe(startCount + 2);
    expect((await buyer.get('/api/conversations/unread-count').expect(200)).body.count).toBe(0);
    const listed = (await sellerAgent.get('/api/conversations').expect(200)).body.items;
    expect(listed.find((t: { id: number }) => t.id === id)).toMatchObject({
      unreadCount: 2,
      lastMessage: { preview: 'Two' },
      listing: { id: listing.id },
    });

    const afterFirst = await sellerAgent
      .post(`/api/conversations/${id}/read`)
      .send({ lastMessageId: q1.body.message.id });
    expect(afterFirst.body.count).toBe(startCount + 1);
    await sellerAgent.post(`/api/conversations/${id}/read`).send({ lastMessageId: q2.body.message.id }).expect(200);
    const back = await sellerAgent.post(`/api/conversations/${id}/read`).send({ lastMessageId: q1.body.message.id });
    expect(back.body.count).toBe(startCount);

    const buyerView = (await buyer.get(`/api/conversations/${id}`).expect(200)).body as ThreadView;
    expect(buyerView.otherReadUpTo).toBe(q2.body.message.id);
  });

  it('e-mails once per unread streak: not again until the recipient has read the thread', async () => {
    const recipient = await buildUser(app.ctx.dataSource, { displayName: 'Olive Chair' });
    const asker = await signedInAs(app, recipient);
    const sellerAgent = await signedInAs(app, seller);
    const first = await asker.post(`/api/conversations/listings/${listing.id}/messages`).send({ body: 'Hello' });
    const id = first.body.conversationId as number;
    const subject = 'New message from Hattie Fishplate about Streak test module';

    await sellerAgent.post(`/api/conversations/${id}/messages`).send({ body: 'Reply 1' }).expect(201);
    await sellerAgent.post(`/api/conversations/${id}/messages`).send({ body: 'Reply 2' }).expect(201);
    const third = await sellerAgent.post(`/api/conversations/${id}/messages`).send({ body: 'Reply 3' }).expect(201);
    // The outbox is written in the sending transactions, so it shows every e-mail these messages will cause.
    expect(await queuedTo(recipient.email, subject)).toBe(1);
    await waitForMail(recipient.email, subject);

    await asker.post(`/api/conversations/${id}/read`).send({ lastMessageId: third.body.message.id }).expect(200);
    await sellerAgent.post(`/api/conversations/${id}/messages`).send({ body: 'Reply 4' }).expect(201);
    expect(await queuedTo(recipient.email, subject)).toBe(2);
    await expect
      .poll(async () => (await messagesTo(recipient.email)).filter((m) => m.subject === subject).length, {
        timeout: 10_000,
      })
      .toBe(2);
  });
});

describe('sending allowance and the unread count', () => {
  it('answers 429 with a wait once a member has sent 20 messages in 10 minutes', async () => {
    const agent = await signedInAs(app, await buildUser(app.ctx.dataSource));
    const url = `/api/conversations/listings/${listing.id}/messages`;

    for (let n = 1; n <= 20; n += 1)
      await agent
        .post(url)
        .send({ body: `Message ${n}` })
        .expect(201);
    const refused = await agent.post(url).send({ body: 'One more' }).expect(429);

    expect(refused.body.error.code).toBe('rate_limited');
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(refused.headers['retry-after'])).toBeLessThanOrEqual(600);
  });

  it('reads the unread total from the member index alone', async () => {
    const plan = (await app.ctx.dataSource.query(`EXPLAIN ${UNREAD_TOTAL_SQL}`, [moderator.id])) as {
      key: string | null;
      Extra: string;
    }[];

    expect(plan).toHaveLength(1);
    expect(plan[0]!.key).toBe('ix_conversation_participants_user_unread');
    expect(plan[0]!.Extra).toContain('Using index');
  });
});
