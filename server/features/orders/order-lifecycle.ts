import type { EntityManager } from 'typeorm';
import {
  ORDER_MOVES,
  ORDER_STATE_LABELS,
  canMoveOrder,
  type OrderMove,
  type OrderMover,
  type OrderState,
} from '../../../shared/orders/states';
import { CONFIRMATION_DAYS } from '../../../shared/orders/timing';
import { AppError, conflict } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { OrderEvent } from './order-event.entity';
import { Order } from './order.entity';

export interface OrderActor {
  as: OrderMover;
  /** The person making the move; null for payment events and timers. */
  id: number | null;
  ip?: string | null;
}

/** The 409 answer for a move the table does not allow from the order's state. */
export function refusedOrderMove(state: OrderState, move: OrderMove): AppError {
  const rule = ORDER_MOVES[move];
  const from = rule.from.map((s) => `“${ORDER_STATE_LABELS[s]}”`).join(' or ');
  return conflict(
    'order_state',
    `This order is “${ORDER_STATE_LABELS[state]}”, so it cannot be ${rule.verb}. That is possible only when it is ${from}.`,
  );
}

/** Load an order with a row lock for the rest of the transaction, so moves on one order never interleave. */
export async function lockOrder(m: EntityManager, orderId: number): Promise<Order | null> {
  return m
    .getRepository(Order)
    .createQueryBuilder('o')
    .setLock('pessimistic_write')
    .where('o.id = :orderId', { orderId })
    .getOne();
}

/**
 * Apply one move of the transition table to an order held with a row lock: refuse it with 409 if the table does
 * not allow it from the current state or for this kind of actor, else change the state, stamp the dates the
 * state implies, and record the move (who, when, a note) in the order's history and the audit log.
 * Money and the listing are the caller's business: this function only moves the state.
 */
export async function moveOrder(
  m: EntityManager,
  order: Order,
  move: OrderMove,
  actor: OrderActor,
  note: string | null = null,
): Promise<void> {
  const rule = ORDER_MOVES[move];
  if (!(rule.by as readonly OrderMover[]).includes(actor.as)) {
    throw conflict('order_state', `Only the ${rule.by.join(' or ')} can do that to this order.`);
  }
  if (!canMoveOrder(order.state, move)) throw refusedOrderMove(order.state, move);
  const from = order.state;
  const now = new Date();
  order.state = rule.to;
  order.stateChangedAt = now;
  if (rule.to === 'sent' || rule.to === 'ready_to_collect') {
    order.handedOverAt = now;
    order.confirmBy = new Date(now.getTime() + CONFIRMATION_DAYS * 24 * 3600 * 1000);
  }
  if (rule.to === 'problem_raised') order.problemRaisedAt = now;
  if (from === 'awaiting_payment' || from === 'awaiting_deposit') order.payableUntil = null;
  await m.save(order);
  await m.insert(OrderEvent, {
    orderId: order.id,
    move,
    fromState: from,
    toState: rule.to,
    actorKind: actor.as,
    actorId: actor.id,
    note,
  });
  await recordAudit(m, {
    actorId: actor.id,
    action: `order.${move}`,
    targetType: 'order',
    targetId: order.id,
    detail: { from, to: rule.to, by: actor.as },
    ip: actor.ip ?? null,
  });
}

/** Record a history entry that does not change the state (an order made, a build stage reached). */
export async function noteOrderEvent(
  m: EntityManager,
  order: Order,
  move: 'create' | 'stage',
  actor: OrderActor,
  note: string | null,
): Promise<void> {
  await m.insert(OrderEvent, {
    orderId: order.id,
    move,
    fromState: move === 'create' ? null : order.state,
    toState: order.state,
    actorKind: actor.as,
    actorId: actor.id,
    note,
  });
}
