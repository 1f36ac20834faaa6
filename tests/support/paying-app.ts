import { randomBytes } from 'node:crypto';
import http, { type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { createPaymentsFake, type RunningPaymentsFake } from '../../infra-local/payments-fake/index';
import type { AppInstance } from '../../server/app';
import type { Config } from '../../server/config';
import { startTestApp } from './test-app';
import { testConfig } from './test-env';

/**
 * A test app wired to its own in-process payments fake, so the fake's signed webhooks reach this app and nothing
 * else: the app listens on a free port, the fake posts events there. In front of the fake sits a small relay
 * that can lose the fake's answers (as a dropped connection would), and in front of the app a gate that can hold
 * webhook deliveries back, so tests can stage "the answer was lost" and "the event has not come yet".
 */
export interface PayingApp {
  app: AppInstance;
  /** The official SDK pointed straight at the fake, to count what happened there. */
  provider: Stripe;
  webhookSecret: string;
  /** The app's webhook address. */
  webhookUrl: string;
  /** Drop the next `count` answers to POST /v1/payment_intents after the fake has acted on the request. */
  loseIntentAnswers(count: number): void;
  holdWebhooks(): void;
  releaseWebhooks(): void;
  /** Succeeded charges at the fake for an order (its transfer group). */
  chargesFor(orderId: number): Promise<Stripe.Charge[]>;
  close(): Promise<void>;
}

const listen = (server: http.Server) =>
  new Promise<number>((resolve) =>
    server.listen(0, '127.0.0.1', () => resolve((server.address() as AddressInfo).port)),
  );

const closeServer = (server: http.Server) =>
  new Promise<void>((resolve) => {
    server.closeAllConnections();
    server.close(() => resolve());
  });

/** Forward a request to the fake; `lose` decides, per request, whether its answer is thrown away. */
function relayTo(fakePort: number, lose: (req: IncomingMessage) => boolean) {
  return (req: IncomingMessage, res: ServerResponse) => {
    const upstream = http.request(
      { host: '127.0.0.1', port: fakePort, method: req.method, path: req.url, headers: req.headers },
      (answer) => {
        if (lose(req)) {
          answer.resume();
          answer.on('end', () => res.socket?.destroy());
          return;
        }
        res.writeHead(answer.statusCode ?? 502, answer.headers);
        answer.pipe(res);
      },
    );
    upstream.on('error', () => res.socket?.destroy());
    req.pipe(upstream);
  };
}

export async function startPayingApp(overrides: Partial<Config> = {}): Promise<PayingApp> {
  const webhookSecret = `whsec_checkout_${randomBytes(12).toString('hex')}`;
  let release: (() => void) | null = null;
  let gate: Promise<void> = Promise.resolve();
  let instance: AppInstance | null = null;
  const appServer = http.createServer((req, res) => {
    const pass = () => instance!.app(req, res);
    if (req.url === '/api/payments/webhook') void gate.then(pass);
    else pass();
  });
  const appPort = await listen(appServer);
  const webhookUrl = `http://127.0.0.1:${appPort}/api/payments/webhook`;
  const fake: RunningPaymentsFake = await createPaymentsFake({
    webhookUrl,
    webhookSecret,
    webhookRetryDelaysMs: [300, 600, 1200, 2400],
  }).start();

  let toLose = 0;
  const relay = http.createServer(
    relayTo(fake.port, (req) => {
      if (toLose === 0 || req.method !== 'POST' || req.url !== '/v1/payment_intents') return false;
      toLose -= 1;
      return true;
    }),
  );
  const relayPort = await listen(relay);
  const base = testConfig();
  instance = await startTestApp({
    stripe: { ...base.stripe, host: '127.0.0.1', port: relayPort, protocol: 'http', webhookSecret },
    signInLimits: { perAccount: 1000, perAddress: 10_000, windowMinutes: 1 },
    ...overrides,
  });
  const provider = new Stripe(base.stripe.secretKey, {
    host: '127.0.0.1',
    port: fake.port,
    protocol: 'http',
    maxNetworkRetries: 0,
  });
  const app = instance;

  return {
    app,
    provider,
    webhookSecret,
    webhookUrl,
    loseIntentAnswers: (count) => {
      toLose = count;
    },
    holdWebhooks: () => {
      gate = new Promise((resolve) => (release = resolve));
    },
    releaseWebhooks: () => {
      release?.();
      gate = Promise.resolve();
    },
    async chargesFor(orderId) {
      const list = await provider.charges.list({ transfer_group: `order-${orderId}`, limit: 100 });
      return list.data.filter((charge) => charge.status === 'succeeded');
    },
    async close() {
      release?.();
      await app.close();
      await fake.close();
      await closeServer(relay);
      await closeServer(appServer);
    },
  };
}

/** Poll `read` until `done` holds for its value, or fail after `timeoutMs`. */
export async function eventually<T>(read: () => Promise<T>, done: (value: T) => boolean, timeoutMs = 10_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`condition not met within ${timeoutMs} ms: ${JSON.stringify(value)}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}
