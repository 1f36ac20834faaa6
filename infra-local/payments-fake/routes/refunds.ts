import { Router } from 'express';
import { checkPositiveAmount, formatMoney } from '../domain/amounts';
import { adjustBalance } from '../domain/balance';
import { invalidRequest, noSuchParam, notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { newId } from '../ids';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { Charge, Refund } from '../types';

const EXPANDABLE = ['charge', 'payment_intent'] as const;

function chargeToRefund(ctx: ApiContext, p: Params): Charge {
  const intentId = p.string('payment_intent');
  const chargeId = p.string('charge');
  if (intentId && chargeId) {
    throw invalidRequest('You may only specify one of these parameters: charge, payment_intent.', {
      code: 'parameters_exclusive',
      param: 'payment_intent',
    });
  }
  if (intentId) {
    const intent = ctx.store.state.paymentIntents[intentId];
    if (!intent) throw noSuchParam('payment_intent', intentId, 'payment_intent');
    const charge = intent.latest_charge ? ctx.store.state.charges[intent.latest_charge] : undefined;
    if (intent.status !== 'succeeded' || !charge || charge.status !== 'succeeded') {
      throw invalidRequest(`This PaymentIntent (${intent.id}) does not have a successful charge to refund.`, {
        code: 'charge_not_refundable',
        param: 'payment_intent',
      });
    }
    return charge;
  }
  if (chargeId) {
    const charge = ctx.store.state.charges[chargeId];
    if (!charge) throw noSuchParam('charge', chargeId, 'charge');
    if (charge.status !== 'succeeded') {
      throw invalidRequest(`Charge ${charge.id} has failed and cannot be refunded.`, {
        code: 'charge_not_refundable',
        param: 'charge',
      });
    }
    return charge;
  }
  throw invalidRequest('One of the following params should be provided for this request: payment_intent or charge.', {
    code: 'parameter_missing',
    param: 'payment_intent',
  });
}

function create(ctx: ApiContext): Refund {
  const p = new Params(ctx.raw, ['payment_intent', 'charge', 'amount', 'reason', 'metadata']);
  const charge = chargeToRefund(ctx, p);
  const reason = p.oneOf('reason', ['duplicate', 'fraudulent', 'requested_by_customer'] as const) ?? null;
  const metadata = p.metadata() ?? {};
  const remaining = charge.amount - charge.amount_refunded;
  if (remaining <= 0) {
    throw invalidRequest(`Charge ${charge.id} has already been refunded.`, { code: 'charge_already_refunded' });
  }
  const amount = p.int('amount') ?? remaining;
  checkPositiveAmount(amount);
  if (amount > remaining) {
    throw invalidRequest(
      `Refund amount (${formatMoney(amount, charge.currency)}) is greater than unrefunded amount on charge (${formatMoney(remaining, charge.currency)})`,
      { code: 'amount_too_large', param: 'amount' },
    );
  }
  const refund: Refund = {
    id: newId('re'),
    object: 'refund',
    amount,
    balance_transaction: newId('txn'),
    charge: charge.id,
    created: ctx.now(),
    currency: charge.currency,
    metadata,
    payment_intent: charge.payment_intent,
    reason,
    receipt_number: null,
    source_transfer_reversal: null,
    status: 'succeeded',
    transfer_reversal: null,
  };
  ctx.store.state.refunds[refund.id] = refund;
  const previous = { amount_refunded: charge.amount_refunded, refunded: charge.refunded };
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  adjustBalance(ctx.store, charge.currency, -amount);
  ctx.emit('refund.created', refund);
  ctx.emit('charge.refunded', charge, previous);
  return refund;
}

function retrieve(ctx: ApiContext): Refund {
  new Params(ctx.raw, []);
  const id = ctx.path.id ?? '';
  const refund = ctx.store.state.refunds[id];
  if (!refund) throw notFound('refund', id);
  return refund;
}

function list(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS, 'charge', 'payment_intent']);
  const chargeId = p.string('charge');
  const intentId = p.string('payment_intent');
  const refunds = newestFirst(ctx.store.state.refunds).filter(
    (refund) =>
      (chargeId === undefined || refund.charge === chargeId) &&
      (intentId === undefined || refund.payment_intent === intentId),
  );
  return paginate(refunds, p, '/v1/refunds', 'refund');
}

export function refundRoutes(runtime: Runtime): Router {
  const router = Router();
  router.post('/v1/refunds', apiRoute(runtime, create, { expandable: EXPANDABLE }));
  router.get('/v1/refunds', apiRoute(runtime, list, { expandable: EXPANDABLE.map((f) => `data.${f}`) }));
  router.get('/v1/refunds/:id', apiRoute(runtime, retrieve, { expandable: EXPANDABLE }));
  return router;
}
