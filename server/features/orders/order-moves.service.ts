import type { EntityManager } from 'typeorm';
import { partRefund } from '../../../shared/orders/money';
import { ORDER_MOVES, canMoveOrder, type OrderMove, type OrderMover } from '../../../shared/orders/states';
import type { SettleOutcome, SettleProblemInput } from '../../../shared/schemas/order-aftercare';
import type { AppContext } from '../../app-context';
import { forbidden, validationFailed } from '../../http/errors';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { loadOrderFor, type OrderViewer } from './order-access';
import { afterRefund, moveOrderListing } from './order-listing';
import { formatMoney, orderParties } from './order-mail';
import { settleOrderMoney } from './order-money';
import { lockOrder, moveOrder, refusedOrderMove, type OrderActor } from './order-lifecycle';
import type { Order } from './order.entity';

/**
 * The moves the buyer and the seller make on a paid order: hand it over, confirm receipt, cancel, raise a
 * problem. Each runs in one transaction: lock the order, apply the move from the one table (409 if the state does
 * not allow it), move the listing, queue the e-mails; then the money follows outside the transaction
 * (settleOrderMoney: refunds, reversals, payout). The timer's and the moderators' moves are here too.
 */

/** A signed-in person acting on an order. */
export type OrderPerson = OrderViewer;

const MOVER_WORDS: Record<OrderMover, string> = {
  buyer: 'buyer',
  seller: 'seller',
  moderator: 'moderator',
  payments: 'payment provider',
  system: 'timer',
};

type Effects = (m: EntityManager, order: Order, actor: OrderActor) => Promise<void>;

async function personMove(
  ctx: AppContext,
  person: OrderPerson,
  orderId: number,
  move: OrderMove,
  note: string | null,
  effects: Effects,
): Promise<void> {
  await ctx.transaction(async (m) => {
    const { order, role: side } = await loadOrderFor(m, person, orderId, { lock: true });
    const rule = ORDER_MOVES[move];
    if (side === 'moderator' || !(rule.by as readonly OrderMover[]).includes(side))
      throw forbidden(
        `Only the ${rule.by.map((b) => MOVER_WORDS[b]).join(' or ')} can say this order is ${rule.verb}.`,
      );
    const actor: OrderActor = { as: side, id: person.id, ip: person.ip };
    await moveOrder(m, order, move, actor, note);
    await effects(m, order, actor);
  });
  await settleOrderMoney(ctx, orderId);
}

export const send = (ctx: AppContext, person: OrderPerson, orderId: number, note: string | null = null) =>
  personMove(ctx, person, orderId, 'send', note, handOverMail(ctx, 'sent', note));

export const offerCollection = (ctx: AppContext, person: OrderPerson, orderId: number, note: string | null = null) =>
  personMove(ctx, person, orderId, 'offerCollection', note, handOverMail(ctx, 'collect', note));

/** The buyer confirms it arrived as described: the listing is sold and the seller's payout falls due. */
export const confirmReceipt = (ctx: AppContext, person: OrderPerson, orderId: number) =>
  personMove(ctx, person, orderId, 'confirmReceipt', null, receivedEffects(ctx, false));

/** Before hand-over, either side cancels; the buyer gets back everything they paid. */
export const cancel = (ctx: AppContext, person: OrderPerson, orderId: number, reason: string | null = null) =>
  personMove(ctx, person, orderId, 'cancel', reason, async (m, order, actor) => {
    await moveOrderListing(m, order, afterRefund(order), actor);
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    const byWhom = actor.as === 'buyer' ? 'the buyer' : 'the seller';
    const refund = formatMoney(order.totalMinor, order.currency);
    for (const to of [parties.buyer, parties.seller])
      await enqueueEmail(
        m,
        to.email,
        mailTemplates.orderCancelled(to.displayName, parties.title, byWhom, refund, reason, parties.url),
      );
  });

/** Either side reports a problem; the money stays held until a moderator settles it. */
export const raiseProblem = (ctx: AppContext, person: OrderPerson, orderId: number, reason: string) =>
  personMove(ctx, person, orderId, 'raiseProblem', reason, async (m, order, actor) => {
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    const byWhom = actor.as === 'buyer' ? 'The buyer' : 'The seller';
    for (const to of [parties.buyer, parties.seller])
      await enqueueEmail(
        m,
        to.email,
        mailTemplates.orderProblemRaised(to.displayName, parties.title, byWhom, reason, parties.url),
      );
  });

/** Effects of receipt being settled in the seller's favour: the listing is sold and the seller told. */
export const receivedEffects =
  (ctx: AppContext, automatic: boolean): Effects =>
  async (m, order, actor) => {
    await moveOrderListing(m, order, 'sell', actor);
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    await enqueueEmail(
      m,
      parties.seller.email,
      mailTemplates.orderReceived(
        parties.seller.displayName,
        parties.title,
        automatic,
        formatMoney(order.payoutMinor, order.currency),
        parties.url,
      ),
    );
  };

function handOverMail(ctx: AppContext, how: 'sent' | 'collect', note: string | null): Effects {
  return async (m, order) => {
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    await enqueueEmail(
      m,
      parties.buyer.email,
      mailTemplates.orderHandedOver(parties.buyer.displayName, parties.title, how, note, parties.url),
    );
  };
}

/** A timer confirms receipt when no problem was raised within the confirmation period; false if no longer due. */
export async function autoConfirm(ctx: AppContext, orderId: number, now = new Date()): Promise<boolean> {
  const moved = await ctx.transaction(async (m) => {
    const order = await lockOrder(m, orderId);
    if (!order || !canMoveOrder(order.state, 'autoConfirm') || !order.confirmBy || order.confirmBy > now) return false;
    const actor: OrderActor = { as: 'system', id: null };
    await moveOrder(m, order, 'autoConfirm', actor, null);
    await receivedEffects(ctx, true)(m, order, actor);
    return true;
  });
  if (moved) await settleOrderMoney(ctx, orderId);
  return moved;
}

const SETTLE_MOVES = { refund: 'settleRefund', part_refund: 'settlePartRefund', release: 'settleRelease' } as const;

/** Lower what the seller keeps by a part refund; commission is then charged only on what they keep. */
function applyPartRefund(order: Order, refundMinor: number): void {
  const gross = order.itemMinor + order.deliveryMinor;
  if (refundMinor > gross)
    throw validationFailed({
      refundMinor: `A part refund can be at most ${formatMoney(gross, order.currency)}, the item and delivery together.`,
    });
  const settlement = partRefund(order, refundMinor, order.commissionBps);
  order.commissionMinor = settlement.commissionMinor;
  order.payoutMinor = settlement.payoutMinor;
}

function outcomeWords(order: Order, outcome: SettleOutcome, refundMinor: number): string {
  const money = (minor: number) => formatMoney(minor, order.currency);
  if (outcome === 'refund') return `everything the buyer paid (${money(order.totalMinor)}) goes back to their card.`;
  if (outcome === 'part_refund')
    return `${money(refundMinor)} goes back to the buyer's card and the seller receives ${money(order.payoutMinor)}.`;
  return `the money is released to the seller, who receives ${money(order.payoutMinor)}.`;
}

/** A moderator settles a problem: a full refund, a part refund, or release to the seller, with a note. */
export async function settleProblem(
  ctx: AppContext,
  moderator: OrderPerson,
  orderId: number,
  input: SettleProblemInput,
): Promise<void> {
  await ctx.transaction(async (m) => {
    // Moderators see an order only once a problem has been raised on it; a party to it cannot settle it.
    const { order, role } = await loadOrderFor(m, moderator, orderId, { lock: true });
    if (role !== 'moderator') throw forbidden('A moderator who bought or sold this order cannot settle it.');
    const move = SETTLE_MOVES[input.outcome];
    if (!canMoveOrder(order.state, move)) throw refusedOrderMove(order.state, move);
    if (input.outcome === 'part_refund') applyPartRefund(order, input.refundMinor ?? 0);
    const actor: OrderActor = { as: 'moderator', id: moderator.id, ip: moderator.ip };
    await moveOrder(m, order, move, actor, input.note);
    await moveOrderListing(m, order, input.outcome === 'refund' ? afterRefund(order) : 'sell', actor);
    const parties = await orderParties(m, order, ctx.config.appOrigin);
    const outcome = outcomeWords(order, input.outcome, input.refundMinor ?? 0);
    for (const to of [parties.buyer, parties.seller])
      await enqueueEmail(
        m,
        to.email,
        mailTemplates.orderProblemSettled(to.displayName, parties.title, outcome, input.note, parties.url),
      );
  });
  await settleOrderMoney(ctx, orderId);
}

export const settleRefund = (ctx: AppContext, moderator: OrderPerson, orderId: number, note: string) =>
  settleProblem(ctx, moderator, orderId, { outcome: 'refund', note });

export const settlePartRefund = (
  ctx: AppContext,
  moderator: OrderPerson,
  orderId: number,
  note: string,
  refundMinor: number,
) => settleProblem(ctx, moderator, orderId, { outcome: 'part_refund', note, refundMinor });

export const settleRelease = (ctx: AppContext, moderator: OrderPerson, orderId: number, note: string) =>
  settleProblem(ctx, moderator, orderId, { outcome: 'release', note });
