import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { notFound } from '../../http/errors';
import { findContactDetails } from '../../../shared/listings/contact-details';
import { PUBLIC_LISTING_STATES } from '../../../shared/listings/states';
import type { SentMessage } from '../../../shared/types/conversations';
import type { ListingActor } from '../listings/listing-actor';
import { findListingWithOwner } from '../listings/listing.repository';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { Order } from '../orders/order.entity';
import { findUserById } from '../users/user.repository';
import { assertMessageAllowance, assertNewThreadAllowance } from './conversation-allowance';
import { ConversationMessage } from './conversation-message.entity';
import { ConversationParticipant } from './conversation-participant.entity';
import { assertCanRead, assertCanWrite, assertNotOwnListing } from './conversation.policy';
import { presentMessage } from './conversation.presenter';
import { listingThreadKey, lockConversation, openConversation, orderThreadKey } from './conversation.repository';
import { Conversation } from './conversation.entity';

/** Reply in a thread the sender belongs to. Others get 404; a moderator reading a problem's thread gets 403. */
export async function sendInThread(ctx: AppContext, actor: ListingActor, id: number, body: string) {
  return ctx.transaction(async (m): Promise<SentMessage> => {
    await assertMessageAllowance(m, actor.id);
    const conversation = await lockConversation(m, id);
    const order = conversation.orderId ? await m.findOneBy(Order, { id: conversation.orderId }) : null;
    assertCanWrite(assertCanRead(actor, conversation, order));
    return addMessage(ctx, m, conversation, actor.id, body);
  });
}

/**
 * Ask the seller about a listing: the member's one thread about it is opened on the first message and reused
 * after. A new thread needs a listing the public can see; an existing one carries on whatever became of it.
 */
export async function sendAboutListing(ctx: AppContext, actor: ListingActor, listingId: number, body: string) {
  return ctx.transaction(async (m): Promise<SentMessage> => {
    await assertMessageAllowance(m, actor.id);
    const listing = await findListingWithOwner(m, listingId);
    assertNotOwnListing(actor, listing.ownerId);
    const threadKey = listingThreadKey(listing.id, actor.id);
    if (!(await m.existsBy(Conversation, { threadKey }))) {
      const shown = PUBLIC_LISTING_STATES.includes(listing.state) && listing.owner.suspendedAt === null;
      if (!shown) throw notFound('That listing');
      await assertNewThreadAllowance(m, actor.id);
    }
    const { conversation } = await openConversation(m, {
      kind: 'listing',
      threadKey,
      listingId: listing.id,
      orderId: null,
      buyerId: actor.id,
      sellerId: listing.ownerId,
    });
    return addMessage(ctx, m, conversation, actor.id, body);
  });
}

/** Write about an order: its buyer or seller only; the order's one thread is opened on the first message. */
export async function sendAboutOrder(ctx: AppContext, actor: ListingActor, orderId: number, body: string) {
  return ctx.transaction(async (m): Promise<SentMessage> => {
    await assertMessageAllowance(m, actor.id);
    const order = await m.findOneBy(Order, { id: orderId });
    if (!order || (order.buyerId !== actor.id && order.sellerId !== actor.id)) throw notFound('That order');
    const { conversation } = await openConversation(m, {
      kind: 'order',
      threadKey: orderThreadKey(order.id),
      listingId: order.listingId,
      orderId: order.id,
      buyerId: order.buyerId,
      sellerId: order.sellerId,
    });
    return addMessage(ctx, m, conversation, actor.id, body);
  });
}

/**
 * Store the message, flag contact details for moderators, count it as unread for the other member, and e-mail
 * them a link (never the text). Only the first message of an unread streak is e-mailed: someone who has not yet
 * read the last message already has an e-mail pointing at the thread, and ten e-mails for a burst of ten short
 * messages would be noise. Once they read the thread, the next message e-mails them again.
 * Runs under the thread's row lock, so the unread count read here is the one that is raised.
 */
async function addMessage(
  ctx: AppContext,
  m: EntityManager,
  conversation: Conversation,
  senderId: number,
  body: string,
): Promise<SentMessage> {
  const found = findContactDetails(body);
  const contactDetails = found.length ? found : null;
  const message = await m.save(
    m.create(ConversationMessage, { conversationId: conversation.id, senderId, body, contactDetails }),
  );
  const now = new Date();
  await m.update(
    Conversation,
    { id: conversation.id },
    contactDetails ? { lastMessageAt: now, flaggedAt: now } : { lastMessageAt: now },
  );
  const recipientId = senderId === conversation.buyerId ? conversation.sellerId : conversation.buyerId;
  const recipient = await m.findOneBy(ConversationParticipant, {
    conversationId: conversation.id,
    userId: recipientId,
  });
  await m.increment(
    ConversationParticipant,
    { conversationId: conversation.id, userId: recipientId },
    'unreadCount',
    1,
  );
  if (recipient?.unreadCount === 0) await notifyRecipient(ctx, m, conversation, senderId, recipientId);
  const saved = await m.findOneByOrFail(ConversationMessage, { id: message.id });
  return { conversationId: conversation.id, message: presentMessage(saved, false) };
}

async function notifyRecipient(
  ctx: AppContext,
  m: EntityManager,
  conversation: Conversation,
  senderId: number,
  recipientId: number,
): Promise<void> {
  const [recipient, sender] = await Promise.all([findUserById(m, recipientId), findUserById(m, senderId)]);
  if (!recipient || !sender || recipient.suspendedAt) return;
  const listing = await findListingWithOwner(m, conversation.listingId);
  const about = conversation.orderId ? `order ${conversation.orderId}: ${listing.title}` : listing.title;
  const url = `${ctx.config.appOrigin}/messages/${conversation.id}`;
  await enqueueEmail(
    m,
    recipient.email,
    mailTemplates.conversationMessage(recipient.displayName, sender.displayName, about, url),
  );
}
