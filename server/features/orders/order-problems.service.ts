import { In, type EntityManager } from 'typeorm';
import type { Currency } from '../../../shared/listings/vocabulary';
import type { OrderProblemSummary } from '../../../shared/types/order-aftercare';
import { OrderEvent } from './order-event.entity';
import { Order } from './order.entity';

/** Orders waiting for a moderator, oldest problem first, with the reason given and who gave it. */
export async function openProblems(m: EntityManager): Promise<OrderProblemSummary[]> {
  const orders = await m
    .getRepository(Order)
    .createQueryBuilder('o')
    .leftJoinAndSelect('o.listing', 'listing')
    .leftJoinAndSelect('o.buyer', 'buyer')
    .leftJoinAndSelect('o.seller', 'seller')
    .where("o.state = 'problem_raised'")
    // Orders made before problems were dated fall back to when their state last changed.
    .orderBy('COALESCE(o.problem_raised_at, o.state_changed_at)', 'ASC')
    .addOrderBy('o.id', 'ASC')
    // Each order joins one listing, buyer and seller, so a plain LIMIT is safe (take() cannot order by an expression).
    .limit(100)
    .getMany();
  if (orders.length === 0) return [];
  const events = await m.find(OrderEvent, {
    where: { orderId: In(orders.map((o) => o.id)), move: 'raiseProblem' },
    order: { id: 'ASC' },
  });
  const raised = new Map(events.map((e) => [e.orderId, e]));
  return orders.map((o) => {
    const event = raised.get(o.id);
    const by = event?.actorKind;
    return {
      id: o.id,
      listingTitle: o.listing?.title ?? 'A listing no longer shown',
      buyer: o.buyer?.displayName ?? 'A member',
      seller: o.seller?.displayName ?? 'A member',
      currency: o.currency as Currency,
      itemMinor: o.itemMinor,
      deliveryMinor: o.deliveryMinor,
      totalMinor: o.totalMinor,
      commissionBps: o.commissionBps,
      problemRaisedAt: (o.problemRaisedAt ?? o.stateChangedAt).toISOString(),
      reason: event?.note ?? null,
      raisedBy: by === 'buyer' || by === 'seller' ? by : null,
      handedOver: o.handedOverAt !== null,
    };
  });
}
