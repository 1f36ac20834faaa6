import type { Express } from 'express';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { buildApp, noLog } from './app';
import type { Runtime } from './runtime';
import { Store } from './store';
import { WebhookDispatcher } from './webhooks/dispatcher';

/** The API version the installed `stripe` SDK (23.1.0) pins; stamped on events. */
export const DEFAULT_API_VERSION = '2026-10-28.endive';
export const HOST = '127.0.0.1';

export interface PaymentsFakeOptions {
  /** TCP port on 127.0.0.1; 0 (the default) picks a free one. */
  port?: number;
  /** Receives every event, signed with `webhookSecret`. */
  webhookUrl?: string;
  webhookSecret?: string;
  /** JSON file the state is loaded from and written to after every change; none keeps state in memory only. */
  stateFile?: string;
  apiVersion?: string;
  /** Delay before each webhook retry; its length bounds the retries. Default 1 s, 2 s, 4 s, 8 s. */
  webhookRetryDelaysMs?: readonly number[];
  webhookTimeoutMs?: number;
  /** Request and webhook log lines; silent by default. */
  log?: (line: string) => void;
  /** Clock in Unix seconds (for tests). */
  now?: () => number;
}

export interface RunningPaymentsFake {
  url: string;
  port: number;
  /** Stops accepting requests, cancels webhook retries, writes the state and closes connections. */
  close(): Promise<void>;
}

export interface PaymentsFake {
  app: Express;
  runtime: Runtime;
  /** Resolves once no webhook delivery is pending. */
  webhooksIdle(): Promise<void>;
  start(): Promise<RunningPaymentsFake>;
}

export function createPaymentsFake(options: PaymentsFakeOptions = {}): PaymentsFake {
  if (options.webhookUrl && !options.webhookSecret) {
    throw new Error('payments-fake: a webhook URL needs a webhook secret (whsec_…)');
  }
  const now = options.now ?? (() => Math.floor(Date.now() / 1000));
  const log = options.log ?? noLog;
  const store = new Store(options.stateFile);
  const dispatcher = new WebhookDispatcher({
    retryDelaysMs: options.webhookRetryDelaysMs ?? [1000, 2000, 4000, 8000],
    timeoutMs: options.webhookTimeoutMs ?? 5000,
    log,
    nowSeconds: now,
    onDelivered: (eventId) => {
      const event = store.state.events[eventId];
      if (event && event.pending_webhooks > 0) {
        event.pending_webhooks -= 1;
        store.save();
      }
    },
  });
  const runtime: Runtime = {
    store,
    dispatcher,
    apiVersion: options.apiVersion ?? DEFAULT_API_VERSION,
    now,
    log,
    staticTarget:
      options.webhookUrl && options.webhookSecret
        ? { url: options.webhookUrl, secret: options.webhookSecret, endpointId: null }
        : null,
  };
  const app = buildApp(runtime);

  const start = (): Promise<RunningPaymentsFake> =>
    new Promise((resolve, reject) => {
      const server: Server = app.listen(options.port ?? 0, HOST);
      server.once('error', reject);
      server.once('listening', () => {
        server.off('error', reject);
        const { port } = server.address() as AddressInfo;
        resolve({ url: `http://${HOST}:${port}`, port, close: () => closeServer(server, runtime) });
      });
    });

  return { app, runtime, webhooksIdle: () => dispatcher.idle(), start };
}

async function closeServer(server: Server, runtime: Runtime): Promise<void> {
  await runtime.dispatcher.close();
  await new Promise<void>((resolve) => {
    const force = setTimeout(() => server.closeAllConnections(), 2000);
    force.unref();
    server.close(() => {
      clearTimeout(force);
      resolve();
    });
    server.closeIdleConnections();
  });
  runtime.store.save();
}
