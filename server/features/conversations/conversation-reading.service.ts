import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { MESSAGES_PAGE_SIZE, THREADS_PAGE_SIZE } from '../../../shared/schemas/conversations';
import type { ConversationSummary, MessagePage, ThreadView } from '../../../shared/types/conversations';
import type { Page } from '../../../shared/types/user';
import type { ListingActor } from '../listings/listing-actor';
import { photosByListing } from '../photos/listing-photos.repository';
import { ConversationMessage } from './conversation-message.entity';
import { ConversationParticipant } from './conversation-participant.entity';
import { assertCanRead } from './conversation.policy';
import { presentMessage, presentSummary } from './conversation.presenter';
import {
  findConversation,
  lastMessages,
  loadedConversations,
  type LoadedConversation,
} from './conversation.repository';
import { notFound } from '../../http/errors';

/** Messages newer than a known one, fetched when a thread page checks for replies; more would be a flood. */
const AFTER_LIMIT = 100;

/**
 * The sum the header shows. The (user, unread) index answers it alone: a range read over the member's threads
 * with something unread, cheap enough to poll every minute from every open page.
 */
export const UNREAD_TOTAL_SQL =
  'SELECT COALESCE(SUM(unread_count), 0) AS total FROM conversation_participants WHERE user_id = ? AND unread_count > 0';

export async function unreadTotal(m: EntityManager, userId: number): Promise<number> {
  const [row] = (await m.query(UNREAD_TOTAL_SQL, [userId])) as { total: number | string }[];
  return Number(row?.total ?? 0);
}

/** The member's threads, the one with the newest message first, with what each has unread. */
export async function listThreads(
  ctx: AppContext,
  actor: ListingActor,
  page: number,
): Promise<Page<ConversationSummary>> {
  const m = ctx.dataSource.manager;
  const query = loadedConversations(m)
    .innerJoin(ConversationParticipant, 'p', 'p.conversation_id = c.id AND p.user_id = :me', { me: actor.id })
    .addSelect('p.unread_count', 'unread')
    .orderBy('c.last_message_at', 'DESC')
    .addOrderBy('c.id', 'DESC')
    .offset((page - 1) * THREADS_PAGE_SIZE)
    .limit(THREADS_PAGE_SIZE);
  const [{ entities, raw }, total] = await Promise.all([
    query.getRawAndEntities<{ unread: number | string; c_id: number }>(),
    m.countBy(ConversationParticipant, { userId: actor.id }),
  ]);
  const threads = entities as LoadedConversation[];
  const unreadById = new Map(raw.map((r) => [Number(r.c_id), Number(r.unread)]));
  const ids = threads.map((t) => t.id);
  const [last, photos] = await Promise.all([
    lastMessages(m, ids),
    photosByListing(
      m,
      threads.map((t) => t.listingId),
    ),
  ]);
  return {
    items: threads.map((t) =>
      presentSummary(
        t,
        actor,
        t.buyerId === actor.id ? 'buyer' : 'seller',
        unreadById.get(t.id) ?? 0,
        last.get(t.id),
        photos.get(t.listingId) ?? [],
      ),
    ),
    total,
    page,
    pageSize: THREADS_PAGE_SIZE,
  };
}

/** A thread with its newest page of messages, for one of its members or a moderator allowed to read it. */
export async function getThread(ctx: AppContext, actor: ListingActor, id: number): Promise<ThreadView> {
  const thread = await findConversation(ctx.dataSource.manager, { id });
  if (!thread) throw notFound('That conversation');
  return presentThread(ctx.dataSource.manager, actor, thread);
}

export async function presentThread(
  m: EntityManager,
  actor: ListingActor,
  thread: LoadedConversation,
): Promise<ThreadView> {
  const you = assertCanRead(actor, thread, thread.order);
  const [page, participants, last, photos] = await Promise.all([
    messagesBefore(m, thread.id, null, you === 'moderator'),
    m.findBy(ConversationParticipant, { conversationId: thread.id }),
    lastMessages(m, [thread.id]),
    photosByListing(m, [thread.listingId]),
  ]);
  const mine = participants.find((p) => p.userId === actor.id);
  const other = participants.find(
    (p) => p.userId !== actor.id && (p.userId === thread.buyerId || p.userId === thread.sellerId),
  );
  return {
    conversation: presentSummary(
      thread,
      actor,
      you,
      mine?.unreadCount ?? 0,
      last.get(thread.id),
      photos.get(thread.listingId) ?? [],
    ),
    ...page,
    otherReadUpTo: you === 'moderator' ? null : (other?.lastReadMessageId ?? null),
  };
}

/** An earlier page, or the messages after one, oldest first. */
export async function messagePage(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  query: { before?: number; after?: number },
): Promise<MessagePage> {
  const m = ctx.dataSource.manager;
  const thread = await findConversation(m, { id });
  if (!thread) throw notFound('That conversation');
  const forModerator = assertCanRead(actor, thread, thread.order) === 'moderator';
  if (query.before !== undefined) return messagesBefore(m, id, query.before, forModerator);
  const rows = await m
    .getRepository(ConversationMessage)
    .createQueryBuilder('msg')
    .where('msg.conversation_id = :id AND msg.id > :after', { id, after: query.after })
    .orderBy('msg.id', 'ASC')
    .limit(AFTER_LIMIT)
    .getMany();
  return { messages: rows.map((r) => presentMessage(r, forModerator)), hasEarlier: false };
}

async function messagesBefore(
  m: EntityManager,
  id: number,
  before: number | null,
  forModerator: boolean,
): Promise<MessagePage> {
  const query = m
    .getRepository(ConversationMessage)
    .createQueryBuilder('msg')
    .where('msg.conversation_id = :id', { id })
    .orderBy('msg.id', 'DESC')
    .limit(MESSAGES_PAGE_SIZE + 1);
  if (before !== null) query.andWhere('msg.id < :before', { before });
  const rows = await query.getMany();
  const hasEarlier = rows.length > MESSAGES_PAGE_SIZE;
  const shown = rows.slice(0, MESSAGES_PAGE_SIZE).reverse();
  return { messages: shown.map((r) => presentMessage(r, forModerator)), hasEarlier };
}

/**
 * The member has seen the thread up to `lastMessageId`: move their marker forward (never back) and count again
 * what is left unread after it. Answers the member's new total for the header.
 */
export async function markRead(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  lastMessageId: number,
): Promise<number> {
  return ctx.transaction(async (m) => {
    const mine = await m
      .getRepository(ConversationParticipant)
      .findOne({ where: { conversationId: id, userId: actor.id }, lock: { mode: 'pessimistic_write' } });
    if (!mine) throw notFound('That conversation');
    const [row] = (await m.query(
      'SELECT MAX(id) AS newest FROM conversation_messages WHERE conversation_id = ? AND id <= ?',
      [id, lastMessageId],
    )) as { newest: number | null }[];
    const upTo = Math.max(mine.lastReadMessageId ?? 0, Number(row?.newest ?? 0));
    const [left] = (await m.query(
      'SELECT COUNT(*) AS n FROM conversation_messages WHERE conversation_id = ? AND id > ? AND sender_id <> ?',
      [id, upTo, actor.id],
    )) as { n: number | string }[];
    await m.update(
      ConversationParticipant,
      { conversationId: id, userId: actor.id },
      { lastReadMessageId: upTo || null, unreadCount: Number(left?.n ?? 0) },
    );
    return unreadTotal(m, actor.id);
  });
}
