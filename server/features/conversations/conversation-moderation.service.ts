import type { AppContext } from '../../app-context';
import { THREADS_PAGE_SIZE } from '../../../shared/schemas/conversations';
import type { FlaggedThreadView } from '../../../shared/types/conversations';
import type { Page } from '../../../shared/types/user';
import type { ListingActor } from '../listings/listing-actor';
import { photosByListing } from '../photos/listing-photos.repository';
import { ConversationMessage } from './conversation-message.entity';
import { problemRaised } from './conversation.policy';
import { presentConversationHead } from './conversation.presenter';
import { loadedConversations, type LoadedConversation } from './conversation.repository';

/** Flagged messages shown per thread; the thread's own page (when readable) has the rest. */
const FLAGS_PER_THREAD = 20;

/**
 * Threads in which someone shared a phone number or an e-mail address, most recent first: who shared what, and
 * when. The text around it stays private unless the thread belongs to an order with a problem raised.
 */
export async function listFlaggedThreads(
  ctx: AppContext,
  moderator: ListingActor,
  page: number,
): Promise<Page<FlaggedThreadView>> {
  const m = ctx.dataSource.manager;
  const [rows, total] = await loadedConversations(m)
    .where('c.flagged_at IS NOT NULL')
    .orderBy('c.flagged_at', 'DESC')
    .addOrderBy('c.id', 'DESC')
    .skip((page - 1) * THREADS_PAGE_SIZE)
    .take(THREADS_PAGE_SIZE)
    .getManyAndCount();
  const threads = rows as LoadedConversation[];
  const ids = threads.map((t) => t.id);
  const [flagged, photos] = await Promise.all([
    ids.length
      ? m
          .getRepository(ConversationMessage)
          .createQueryBuilder('msg')
          .where('msg.conversation_id IN (:...ids) AND msg.contact_details IS NOT NULL', { ids })
          .orderBy('msg.id', 'DESC')
          .getMany()
      : Promise.resolve([]),
    photosByListing(
      m,
      threads.map((t) => t.listingId),
    ),
  ]);
  return {
    items: threads.map((t) => {
      const people = new Map([t.buyer, t.seller].map((u) => [u.id, { id: u.id, displayName: u.displayName }]));
      return {
        conversation: presentConversationHead(t, moderator, photos.get(t.listingId) ?? []),
        readable: t.kind === 'order' && t.order !== null && problemRaised(t.order),
        flags: flagged
          .filter((msg) => msg.conversationId === t.id)
          .slice(0, FLAGS_PER_THREAD)
          .map((msg) => ({
            messageId: msg.id,
            sender: people.get(msg.senderId) ?? { id: msg.senderId, displayName: '' },
            at: msg.createdAt.toISOString(),
            details: msg.contactDetails ?? [],
          })),
      };
    }),
    total,
    page,
    pageSize: THREADS_PAGE_SIZE,
  };
}
