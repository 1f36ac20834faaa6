import type { StripeEvent } from '../types';
import { signatureHeader } from './signature';

export interface WebhookTarget {
  url: string;
  secret: string;
  /** `we_…` for endpoints registered through the API; null for the one given on the command line. */
  endpointId: string | null;
}

export interface DeliveryAttempt {
  event: string;
  type: string;
  url: string;
  attempt: number;
  at: string;
  status: number | null;
  error: string | null;
}

export interface DispatcherOptions {
  /** Delay before each retry; the number of entries bounds the retries. */
  retryDelaysMs: readonly number[];
  timeoutMs: number;
  log: (line: string) => void;
  /** Called once per target that answered 2xx. */
  onDelivered: (eventId: string) => void;
  nowSeconds: () => number;
}

const MAX_LOGGED_ATTEMPTS = 500;

/**
 * Delivers events by POST in the background, never blocking the API response: the first
 * attempt starts on the next tick, failures (network error, timeout, non-2xx) are retried
 * with the configured backoff, then given up. `close()` cancels pending retries and aborts
 * requests in flight.
 */
export class WebhookDispatcher {
  private readonly options: DispatcherOptions;
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<AbortController>();
  private readonly idleWaiters: (() => void)[] = [];
  private pending = 0;
  private closed = false;
  /** Bumped by cancelAll so that attempts started before it are forgotten. */
  private generation = 0;
  readonly attempts: DeliveryAttempt[] = [];

  constructor(options: DispatcherOptions) {
    this.options = options;
  }

  dispatch(event: StripeEvent, targets: readonly WebhookTarget[]): void {
    if (this.closed) return;
    const payload = JSON.stringify(event, null, 2);
    for (const target of targets) {
      this.pending += 1;
      this.schedule(0, () => this.attempt(event, payload, target, 0));
    }
  }

  /** Resolves when no delivery is pending (all succeeded or were given up). */
  idle(): Promise<void> {
    if (this.pending === 0) return Promise.resolve();
    return new Promise((resolve) => this.idleWaiters.push(resolve));
  }

  /** Drops every pending retry and aborts requests in flight (used by reset and close). */
  cancelAll(): void {
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    this.generation += 1;
    for (const controller of this.inFlight) controller.abort();
    this.pending = 0;
    this.settle();
  }

  async close(): Promise<void> {
    this.closed = true;
    this.cancelAll();
  }

  private schedule(delayMs: number, run: () => Promise<void>): void {
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      void run();
    }, delayMs);
    this.timers.add(timer);
  }

  private async attempt(event: StripeEvent, payload: string, target: WebhookTarget, attempt: number): Promise<void> {
    if (this.closed) return;
    const generation = this.generation;
    const controller = new AbortController();
    const timeout = setTimeout(() => controller.abort(), this.options.timeoutMs);
    this.inFlight.add(controller);
    let status: number | null = null;
    let error: string | null = null;
    try {
      const response = await fetch(target.url, {
        method: 'POST',
        headers: {
          'Content-Type': 'application/json; charset=utf-8',
          'User-Agent': 'Stripe/1.0 (+https://stripe.com/docs/webhooks)',
          'Stripe-Signature': signatureHeader(payload, target.secret, this.options.nowSeconds()),
        },
        body: payload,
        signal: controller.signal,
      });
      status = response.status;
      await response.arrayBuffer().catch(() => undefined);
    } catch (caught) {
      error = caught instanceof Error ? caught.message : String(caught);
    } finally {
      clearTimeout(timeout);
      this.inFlight.delete(controller);
    }
    if (this.closed || generation !== this.generation) return;
    this.record({
      event: event.id,
      type: event.type,
      url: target.url,
      attempt,
      at: new Date().toISOString(),
      status,
      error,
    });
    const ok = status !== null && status >= 200 && status < 300;
    if (ok) {
      this.options.onDelivered(event.id);
      this.finish();
      return;
    }
    const delay = this.options.retryDelaysMs[attempt];
    const reason = error ?? `HTTP ${status}`;
    if (delay === undefined) {
      this.options.log(
        `webhook ${event.id} (${event.type}) to ${target.url} given up after ${attempt + 1} attempts: ${reason}`,
      );
      this.finish();
      return;
    }
    this.options.log(`webhook ${event.id} (${event.type}) to ${target.url} failed (${reason}); retry in ${delay} ms`);
    this.schedule(delay, () => this.attempt(event, payload, target, attempt + 1));
  }

  private record(entry: DeliveryAttempt): void {
    this.attempts.push(entry);
    if (this.attempts.length > MAX_LOGGED_ATTEMPTS) this.attempts.splice(0, this.attempts.length - MAX_LOGGED_ATTEMPTS);
  }

  private finish(): void {
    this.pending = Math.max(0, this.pending - 1);
    this.settle();
  }

  private settle(): void {
    if (this.pending !== 0) return;
    for (const resolve of this.idleWaiters.splice(0)) resolve();
  }
}
