import type { Store } from './store';
import type { WebhookDispatcher, WebhookTarget } from './webhooks/dispatcher';

/** Everything the handlers share: state, clock, settings and the webhook dispatcher. */
export interface Runtime {
  store: Store;
  dispatcher: WebhookDispatcher;
  apiVersion: string;
  /** Unix seconds. */
  now: () => number;
  log: (line: string) => void;
  /** The command-line webhook target, if any; it receives every event. */
  staticTarget: WebhookTarget | null;
}

/** The command-line target plus every enabled registered endpoint subscribed to `type`. */
export function webhookTargetsFor(runtime: Runtime, type: string): WebhookTarget[] {
  const targets: WebhookTarget[] = runtime.staticTarget ? [runtime.staticTarget] : [];
  for (const endpoint of Object.values(runtime.store.state.webhookEndpoints)) {
    if (endpoint.status !== 'enabled') continue;
    if (!endpoint.enabled_events.includes('*') && !endpoint.enabled_events.includes(type)) continue;
    targets.push({ url: endpoint.url, secret: endpoint.secret, endpointId: endpoint.id });
  }
  return targets;
}
