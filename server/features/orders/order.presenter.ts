import { In, type EntityManager } from 'typeorm';
import {
  HANDOVER_LABELS,
  ORDER_STATE_LABELS,
  movesFrom,
  type OrderMover,
  type OrderState,
} from '../../../shared/orders/states';
import type { Currency } from '../../../shared/listings/vocabulary';
import type { OrderHistoryEntry, OrderPaymentView, OrderView, OrderViewerRole } from '../../../shared/types/orders';
import { Listing } from '../listings/listing.entity';
import { User } from '../users/user.entity';
import { dueNow } from './order-due';
import { OrderEvent } from './order-event.entity';
import { OrderPayment } from './order-payment.entity';
import type { Order } from './order.entity';

/** Plain words for a provider's failure code (decline code first). */
export function failureWords(code: string | null): string | null {
  if (!code) return null;
  if (code === 'insufficient_funds') return 'The card did not have enough money. Nothing was taken.';
  if (code === 'payment_intent_authentication_failure') return 'The payment was not approved. Nothing was taken.';
  if (code === 'card_declined' || code === 'generic_decline') return 'The card was declined. Nothing was taken.';
  return 'The payment did not go through. Nothing was taken.';
}

export function presentPayment(p: OrderPayment): OrderPaymentView {
  return {
    id: p.id,
    purpose: p.purpose,
    attempt: p.attempt,
    amountMinor: p.amountMinor,
    status: p.status,
    failure: p.status === 'failed' ? failureWords(p.failureCode) : null,
    createdAt: p.createdAt.toISOString(),
  };
}

/** Everything an order view is made of besides the order itself. */
export interface OrderParts {
  listingTitle: string;
  names: ReadonlyMap<number, string>;
  payments: readonly OrderPayment[];
  events: readonly OrderEvent[];
}

/** States before the buyer's money arrived: the seller (and a moderator) do not see the delivery address yet. */
const UNPAID: readonly OrderState[] = ['awaiting_payment', 'awaiting_deposit', 'lapsed'];

/**
 * An order as `role` sees it. The seller's side of the money is left out for the buyer; the delivery address is
 * shown to the seller (and a moderator) only once the order is paid.
 */
export function presentOrder(o: Order, role: OrderViewerRole, parts: OrderParts): OrderView {
  const name = (id: number) => parts.names.get(id) ?? 'A member';
  const history: OrderHistoryEntry[] = parts.events.map((e) => ({
    id: e.id,
    move: e.move,
    fromState: e.fromState,
    toState: e.toState,
    by: e.actorKind,
    byName: e.actorId === null ? null : name(e.actorId),
    note: e.note,
    at: e.createdAt.toISOString(),
  }));
  const showAddress = role === 'buyer' || !UNPAID.includes(o.state);
  return {
    id: o.id,
    kind: o.kind,
    state: o.state,
    stateLabel: ORDER_STATE_LABELS[o.state],
    viewerRole: role,
    listing: { id: o.listingId, title: parts.listingTitle },
    quoteId: o.quoteId,
    buyer: { id: o.buyerId, displayName: name(o.buyerId) },
    seller: { id: o.sellerId, displayName: name(o.sellerId) },
    currency: o.currency as Currency,
    handover: o.handover,
    handoverLabel: HANDOVER_LABELS[o.handover],
    amounts: {
      itemMinor: o.itemMinor,
      deliveryMinor: o.deliveryMinor,
      buyerFeeMinor: o.buyerFeeMinor,
      totalMinor: o.totalMinor,
      depositMinor: o.depositMinor,
      refundedMinor: o.refundedMinor,
    },
    buyerFeeBps: o.buyerFeeBps,
    sellerMoney:
      role === 'buyer'
        ? null
        : {
            commissionBps: o.commissionBps,
            commissionMinor: o.commissionMinor,
            payoutMinor: o.payoutMinor,
            transferredMinor: o.transferredMinor,
          },
    deliveryAddress: showAddress ? o.deliveryAddress : null,
    payableUntil: o.payableUntil?.toISOString() ?? null,
    due: dueNow(o),
    handedOverAt: o.handedOverAt?.toISOString() ?? null,
    confirmBy: o.confirmBy?.toISOString() ?? null,
    problemRaisedAt: o.problemRaisedAt?.toISOString() ?? null,
    stateChangedAt: o.stateChangedAt.toISOString(),
    createdAt: o.createdAt.toISOString(),
    payments: parts.payments.map(presentPayment),
    history,
    moves: movesFrom(o.state, role as OrderMover),
  };
}

/** Load what an order view needs (listing title, names, payments, history) and present it for `role`. */
export async function orderViewOf(m: EntityManager, o: Order, role: OrderViewerRole): Promise<OrderView> {
  // One after another: inside a transaction the queries share one connection.
  const listing = await m.findOne(Listing, { where: { id: o.listingId }, select: { id: true, title: true } });
  const payments = await m.find(OrderPayment, { where: { orderId: o.id }, order: { id: 'ASC' } });
  const events = await m.find(OrderEvent, { where: { orderId: o.id }, order: { id: 'ASC' } });
  const ids = new Set([o.buyerId, o.sellerId, ...events.flatMap((e) => (e.actorId === null ? [] : [e.actorId]))]);
  const users = await m.find(User, { where: { id: In([...ids]) }, select: { id: true, displayName: true } });
  return presentOrder(o, role, {
    listingTitle: listing?.title ?? 'A listing no longer shown',
    names: new Map(users.map((u) => [u.id, u.displayName])),
    payments,
    events,
  });
}
