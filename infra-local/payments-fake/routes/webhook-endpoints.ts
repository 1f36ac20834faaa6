import { Router } from 'express';
import { invalidRequest, notFound } from '../errors';
import { apiRoute } from '../http/api-route';
import type { ApiContext } from '../http/context';
import { LIST_PARAMS, newestFirst, paginate } from '../http/list';
import { newId, randomToken } from '../ids';
import { Params } from '../params';
import type { Runtime } from '../runtime';
import type { StoredWebhookEndpoint } from '../store';
import type { DeletedObject, WebhookEndpoint } from '../types';
import { validUrl } from './accounts';

/** Stripe never shows the signing secret again after creation. */
function publicView(endpoint: StoredWebhookEndpoint): WebhookEndpoint {
  const { secret: _secret, ...rest } = endpoint;
  return rest;
}

function readEnabledEvents(p: Params, required: boolean): string[] | undefined {
  const events = p.stringArray('enabled_events');
  if (events === undefined) {
    if (!required) return undefined;
    throw invalidRequest('Missing required param: enabled_events.', {
      param: 'enabled_events',
      code: 'parameter_missing',
    });
  }
  if (events.length === 0) throw invalidRequest('enabled_events must not be empty.', { param: 'enabled_events' });
  events.forEach((type, index) => {
    if (type !== '*' && !/^[a-z_]+(\.[a-z_]+)+$/.test(type)) {
      throw invalidRequest(`Invalid event type: ${type}`, { param: `enabled_events[${index}]` });
    }
  });
  return events;
}

function findEndpoint(ctx: ApiContext): StoredWebhookEndpoint {
  const id = ctx.path.id ?? '';
  const endpoint = ctx.store.state.webhookEndpoints[id];
  if (!endpoint) throw notFound('webhook_endpoint', id, 'webhook_endpoint');
  return endpoint;
}

function create(ctx: ApiContext): WebhookEndpoint {
  const p = new Params(ctx.raw, ['url', 'enabled_events', 'description', 'metadata', 'api_version']);
  const url = validUrl(p, 'url', true) ?? '';
  const enabledEvents = readEnabledEvents(p, true) ?? [];
  const endpoint: StoredWebhookEndpoint = {
    id: newId('we'),
    object: 'webhook_endpoint',
    api_version: p.string('api_version') ?? null,
    application: null,
    created: ctx.now(),
    description: p.nullableString('description') ?? null,
    enabled_events: enabledEvents,
    livemode: false,
    metadata: p.metadata() ?? {},
    secret: `whsec_${randomToken(32)}`,
    status: 'enabled',
    url,
  };
  ctx.store.state.webhookEndpoints[endpoint.id] = endpoint;
  return { ...endpoint };
}

function retrieve(ctx: ApiContext): WebhookEndpoint {
  new Params(ctx.raw, []);
  return publicView(findEndpoint(ctx));
}

function update(ctx: ApiContext): WebhookEndpoint {
  const endpoint = findEndpoint(ctx);
  const p = new Params(ctx.raw, ['url', 'enabled_events', 'description', 'metadata', 'disabled']);
  const url = validUrl(p, 'url', false);
  const enabledEvents = readEnabledEvents(p, false);
  const description = p.nullableString('description');
  const metadata = p.metadata(endpoint.metadata);
  const disabled = p.bool('disabled');
  if (url !== undefined) endpoint.url = url;
  if (enabledEvents !== undefined) endpoint.enabled_events = enabledEvents;
  if (description !== undefined) endpoint.description = description;
  if (metadata !== undefined) endpoint.metadata = metadata;
  if (disabled !== undefined) endpoint.status = disabled ? 'disabled' : 'enabled';
  return publicView(endpoint);
}

function remove(ctx: ApiContext): DeletedObject {
  new Params(ctx.raw, []);
  const endpoint = findEndpoint(ctx);
  delete ctx.store.state.webhookEndpoints[endpoint.id];
  return { id: endpoint.id, object: 'webhook_endpoint', deleted: true };
}

function list(ctx: ApiContext): object {
  const p = new Params(ctx.raw, [...LIST_PARAMS]);
  const page = paginate(newestFirst(ctx.store.state.webhookEndpoints), p, '/v1/webhook_endpoints', 'webhook_endpoint');
  return { ...page, data: page.data.map(publicView) };
}

export function webhookEndpointRoutes(runtime: Runtime): Router {
  const router = Router();
  router.post('/v1/webhook_endpoints', apiRoute(runtime, create));
  router.get('/v1/webhook_endpoints', apiRoute(runtime, list));
  router.get('/v1/webhook_endpoints/:id', apiRoute(runtime, retrieve));
  router.post('/v1/webhook_endpoints/:id', apiRoute(runtime, update));
  router.delete('/v1/webhook_endpoints/:id', apiRoute(runtime, remove));
  return router;
}
