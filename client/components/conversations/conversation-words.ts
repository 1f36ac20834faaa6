import type { ConversationSummary } from '@shared/types/conversations';
import { ORDER_STATE_LABELS } from '@shared/orders/states';

/** The member on the other side of a thread from the viewer (for a moderator: the seller). */
export function otherMember(c: Pick<ConversationSummary, 'you' | 'buyer' | 'seller'>) {
  return c.you === 'seller' ? c.buyer : c.seller;
}

/** A line saying what the thread is and who it is with, from the viewer's side. */
export function threadLine(c: Pick<ConversationSummary, 'kind' | 'you' | 'buyer' | 'seller' | 'order'>): string {
  if (c.kind === 'order' && c.order) {
    const state = ORDER_STATE_LABELS[c.order.state];
    if (c.you === 'moderator')
      return `Order ${c.order.id} between ${c.buyer.displayName} and ${c.seller.displayName} · ${state}`;
    return `Order ${c.order.id} with ${otherMember(c).displayName} · ${state}`;
  }
  if (c.you === 'seller') return `Question from ${c.buyer.displayName}`;
  return `Your question to ${c.seller.displayName}`;
}

/** Who wrote a message, from the viewer's side. */
export function senderName(
  c: Pick<ConversationSummary, 'buyer' | 'seller'>,
  senderId: number,
  viewerId: number | null,
) {
  if (senderId === viewerId) return 'You';
  if (senderId === c.buyer.id) return c.buyer.displayName;
  if (senderId === c.seller.id) return c.seller.displayName;
  return 'Someone';
}
