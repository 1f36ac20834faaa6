import type { EntityManager } from 'typeorm';
import { notFound } from '../../http/errors';
import type { Listing } from '../listings/listing.entity';
import { Order } from '../orders/order.entity';
import type { User } from '../users/user.entity';
import { ConversationMessage } from './conversation-message.entity';
import { ConversationParticipant } from './conversation-participant.entity';
import { Conversation } from './conversation.entity';

/** A thread with what its heading shows: the listing (with its seller), the two members and any order. */
export type LoadedConversation = Conversation & {
  listing: Listing & { owner: User };
  buyer: User;
  seller: User;
  order: Order | null;
};

export const listingThreadKey = (listingId: number, buyerId: number) => `listing:${listingId}:${buyerId}`;
export const orderThreadKey = (orderId: number) => `order:${orderId}`;

/** Threads with their listing, members and order; `where` filters on alias `c`. */
export const loadedConversations = (m: EntityManager) =>
  m
    .getRepository(Conversation)
    .createQueryBuilder('c')
    .innerJoinAndSelect('c.listing', 'l')
    .innerJoinAndSelect('l.owner', 'owner')
    .innerJoinAndSelect('c.buyer', 'buyer')
    .innerJoinAndSelect('c.seller', 'seller')
    .leftJoinAndSelect('c.order', 'o');

/** One thread, loaded, or null. */
export async function findConversation(
  m: EntityManager,
  where: { id: number } | { threadKey: string },
): Promise<LoadedConversation | null> {
  const query = loadedConversations(m);
  if ('id' in where) query.where('c.id = :id', { id: where.id });
  else query.where('c.thread_key = :key', { key: where.threadKey });
  return ((await query.getOne()) as LoadedConversation | null) ?? null;
}

/** Hold the thread's row until the transaction ends, so messages and unread counts change one at a time. */
export async function lockConversation(m: EntityManager, id: number): Promise<Conversation> {
  const found = await m.getRepository(Conversation).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!found) throw notFound('That conversation');
  return found;
}

/**
 * Open the thread named by `key` unless it exists, with both members as participants, and return it locked.
 * INSERT IGNORE on the unique key lets two first messages sent at the same moment land in one thread.
 */
export async function openConversation(
  m: EntityManager,
  values: Pick<Conversation, 'kind' | 'threadKey' | 'listingId' | 'orderId' | 'buyerId' | 'sellerId'>,
): Promise<{ conversation: Conversation; created: boolean }> {
  const inserted = await m.createQueryBuilder().insert().into(Conversation).values(values).orIgnore().execute();
  const created = (inserted.raw as { affectedRows?: number }).affectedRows === 1;
  const conversation = await m
    .getRepository(Conversation)
    .findOne({ where: { threadKey: values.threadKey }, lock: { mode: 'pessimistic_write' } });
  if (!conversation) throw notFound('That conversation');
  await m
    .createQueryBuilder()
    .insert()
    .into(ConversationParticipant)
    .values([
      { conversationId: conversation.id, userId: values.buyerId },
      { conversationId: conversation.id, userId: values.sellerId },
    ])
    .orIgnore()
    .execute();
  return { conversation, created };
}

/** The newest message of each thread in `ids`, by thread. */
export async function lastMessages(m: EntityManager, ids: number[]): Promise<Map<number, ConversationMessage>> {
  if (ids.length === 0) return new Map();
  const rows = await m
    .getRepository(ConversationMessage)
    .createQueryBuilder('msg')
    .where(
      'msg.id IN (SELECT MAX(x.id) FROM conversation_messages x WHERE x.conversation_id IN (:...ids) GROUP BY x.conversation_id)',
      { ids },
    )
    .getMany();
  return new Map(rows.map((row) => [row.conversationId, row]));
}

/** A participant's row, or null when `userId` is not one of the thread's members. */
export const findParticipant = (m: EntityManager, conversationId: number, userId: number) =>
  m.getRepository(ConversationParticipant).findOneBy({ conversationId, userId });
