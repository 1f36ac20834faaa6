import { Router } from 'express';
import { notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { Charge, PaymentMethod } from '../types';

function retrieveCharge(ctx: ApiContext): Charge {
  new Params(ctx.raw, []);
  const id = ctx.path.id ?? '';
  const charge = ctx.store.state.charges[id];
  if (!charge) throw notFound('charge', id);
  return charge;
}

function listCharges(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS, 'payment_intent', 'transfer_group']);
  const paymentIntent = p.string('payment_intent');
  const transferGroup = p.string('transfer_group');
  const charges = newestFirst(ctx.store.state.charges).filter(
    (charge) =>
      (paymentIntent === undefined || charge.payment_intent === paymentIntent) &&
      (transferGroup === undefined || charge.transfer_group === transferGroup),
  );
  return paginate(charges, p, '/v1/charges', 'charge');
}

function retrievePaymentMethod(ctx: ApiContext): PaymentMethod {
  new Params(ctx.raw, []);
  const id = ctx.path.id ?? '';
  const paymentMethod = ctx.store.state.paymentMethods[id];
  if (!paymentMethod) throw notFound('PaymentMethod', id, 'payment_method');
  return paymentMethod;
}

export function chargeRoutes(runtime: Runtime): Router {
  const router = Router();
  router.get('/v1/charges', apiRoute(runtime, listCharges, { expandable: ['data.payment_intent'] }));
  router.get('/v1/charges/:id', apiRoute(runtime, retrieveCharge, { expandable: ['payment_intent'] }));
  router.get('/v1/payment_methods/:id', apiRoute(runtime, retrievePaymentMethod));
  return router;
}
