import { Router } from 'express';
import { deliverEvent } from '../domain/events';
import { invalidRequest, notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import { sendJson } from '../http/respond';
import { Params } from '../params';
import { webhookTargetsFor, type Runtime } from '../runtime';

/**
 * Fake-only helpers (not part of Stripe's API, no API key needed):
 * health, reset, webhook resend and the delivery log.
 */
export function fakeRoutes(runtime: Runtime): Router {
  const router = Router();

  router.get('/_fake/health', (_req, res) => {
    const s = runtime.store.state;
    sendJson(res, 200, {
      ok: true,
      objects: {
        payment_intents: Object.keys(s.paymentIntents).length,
        charges: Object.keys(s.charges).length,
        refunds: Object.keys(s.refunds).length,
        accounts: Object.keys(s.accounts).length,
        transfers: Object.keys(s.transfers).length,
        events: Object.keys(s.events).length,
        webhook_endpoints: Object.keys(s.webhookEndpoints).length,
      },
    });
  });

  router.post(
    '/_fake/reset',
    apiRoute(runtime, (ctx) => {
      new Params(ctx.raw, []);
      runtime.dispatcher.cancelAll();
      ctx.store.reset();
      return { ok: true };
    }),
  );

  router.post(
    '/_fake/events/:id/resend',
    apiRoute(runtime, (ctx) => {
      const p = new Params(ctx.raw, ['webhook_endpoint']);
      const id = ctx.path.id ?? '';
      const event = ctx.store.state.events[id];
      if (!event) throw notFound('event', id);
      const only = p.string('webhook_endpoint');
      if (only === undefined) {
        deliverEvent(runtime, event);
      } else {
        const targets = webhookTargetsFor(runtime, event.type).filter((target) => target.endpointId === only);
        if (targets.length === 0) {
          throw invalidRequest(`Webhook endpoint ${only} does not exist or is not subscribed to ${event.type}.`, {
            param: 'webhook_endpoint',
          });
        }
        runtime.dispatcher.dispatch(event, targets);
      }
      return event;
    }),
  );

  router.get('/_fake/webhook_deliveries', (_req, res) => {
    sendJson(res, 200, { object: 'list', data: [...runtime.dispatcher.attempts].reverse() });
  });

  return router;
}
