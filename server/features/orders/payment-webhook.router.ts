import express, { Router } from 'express';
import type Stripe from 'stripe';
import type { AppContext } from '../../app-context';
import { badRequest } from '../../http/errors';
import { clientIp } from '../../http/request-helpers';
import { dispatchPaymentEvent } from './payment-events';

/**
 * POST /api/payments/webhook: events from the payment provider. Mounted before the JSON parser, sessions and
 * CSRF: the signature over the raw body, checked with the webhook secret, is the only credential. A bad
 * signature is refused with 400 and logged with the sender's address, never with the payload.
 */
export function paymentWebhookRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/webhook', express.raw({ type: 'application/json', limit: '512kb' }), async (req, res) => {
    let event: Stripe.Event;
    try {
      const body: unknown = req.body;
      if (!Buffer.isBuffer(body)) throw new Error('not a JSON body');
      event = ctx.payments.webhooks.constructEvent(
        body,
        req.header('stripe-signature') ?? '',
        ctx.config.stripe.webhookSecret,
      );
    } catch {
      ctx.logger.warn({ ip: clientIp(req) }, 'payment event refused: signature missing or wrong');
      throw badRequest('bad_signature', 'The event signature is missing or does not match.');
    }
    const outcome = await dispatchPaymentEvent(ctx, event);
    res.json({ received: true, outcome });
  });
  return router;
}
