import { Router } from 'express';
import { eventTypeMatches } from '../domain/events';
import { notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { StripeEvent } from '../types';

function list(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS, 'type', 'types']);
  const type = p.string('type');
  const types = p.stringArray('types');
  const events = newestFirst(ctx.store.state.events).filter(
    (event) =>
      (type === undefined || eventTypeMatches(type, event.type)) && (types === undefined || types.includes(event.type)),
  );
  return paginate(events, p, '/v1/events', 'event');
}

function retrieve(ctx: ApiContext): StripeEvent {
  new Params(ctx.raw, []);
  const id = ctx.path.id ?? '';
  const event = ctx.store.state.events[id];
  if (!event) throw notFound('event', id);
  return event;
}

export function eventRoutes(runtime: Runtime): Router {
  const router = Router();
  router.get('/v1/events', apiRoute(runtime, list));
  router.get('/v1/events/:id', apiRoute(runtime, retrieve));
  return router;
}
