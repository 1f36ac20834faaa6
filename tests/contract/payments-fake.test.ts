/**
 * Contract test: the official `stripe` SDK against the local payments fake
 * (infra-local/payments-fake). Each test proves one behaviour the app relies on,
 * through the same client calls the app makes.
 */
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createPaymentsFake, type RunningPaymentsFake } from '../../infra-local/payments-fake/index';

const API_KEY = 'sk_test_contract';
const WEBHOOK_SECRET = 'whsec_contract_test_secret';
const NO_REDIRECTS = { enabled: true, allow_redirects: 'never' } as const;

interface ReceivedWebhook {
  path: string;
  rawBody: Buffer;
  signature: string;
}

/** A small HTTP server that records webhook deliveries; `failFirst` answers 500 to the first delivery of each event. */
class WebhookReceiver {
  readonly received: ReceivedWebhook[] = [];
  failFirst = false;
  private readonly seen = new Set<string>();
  private readonly server = http.createServer((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      const rawBody = Buffer.concat(chunks);
      const { id } = JSON.parse(rawBody.toString('utf8')) as { id: string };
      const key = `${req.url ?? ''} ${id}`;
      if (this.failFirst && !this.seen.has(key)) {
        this.seen.add(key);
        res.writeHead(500).end('try again');
        return;
      }
      this.received.push({ path: req.url ?? '', rawBody, signature: String(req.headers['stripe-signature'] ?? '') });
      res.writeHead(200, { 'Content-Type': 'application/json' }).end('{"received":true}');
    });
  });

  url = '';

  async start(): Promise<void> {
    await new Promise<void>((resolve) => this.server.listen(0, '127.0.0.1', resolve));
    this.url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}`;
  }

  close(): Promise<void> {
    this.server.closeAllConnections();
    return new Promise((resolve) => this.server.close(() => resolve()));
  }

  /** Waits for a delivery to `path` whose event matches. */
  async waitFor(path: string, match: (event: Stripe.Event) => boolean, timeoutMs = 5000): Promise<ReceivedWebhook> {
    const deadline = Date.now() + timeoutMs;
    for (;;) {
      const found = this.received.find(
        (hook) => hook.path === path && match(JSON.parse(hook.rawBody.toString('utf8')) as Stripe.Event),
      );
      if (found) return found;
      if (Date.now() > deadline) throw new Error(`no webhook to ${path} matched within ${timeoutMs} ms`);
      await new Promise((resolve) => setTimeout(resolve, 20));
    }
  }
}

function clientFor(port: number, key = API_KEY): Stripe {
  return new Stripe(key, { host: '127.0.0.1', port, protocol: 'http', maxNetworkRetries: 0 });
}

/** Resolves to the error the promise rejects with (fails the test if it resolves). */
async function rejection(promise: Promise<unknown>): Promise<Stripe.errors.StripeError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof Stripe.errors.StripeError) return error;
    throw error;
  }
  throw new Error('expected the request to be refused');
}

function uniqueKey(label: string): string {
  return `${label}-${Date.now()}-${Math.random().toString(36).slice(2)}`;
}

describe('the payments fake, driven by the official stripe SDK', () => {
  let stateDir: string;
  let receiver: WebhookReceiver;
  let fake: RunningPaymentsFake;
  let stripe: Stripe;

  async function availableGbp(): Promise<number> {
    const balance = await stripe.balance.retrieve();
    return balance.available.find((entry) => entry.currency === 'gbp')?.amount ?? 0;
  }

  function pay(paymentMethod: string, amount = 2500, extra: Partial<Stripe.PaymentIntentCreateParams> = {}) {
    return stripe.paymentIntents.create({
      amount,
      currency: 'gbp',
      payment_method: paymentMethod,
      confirm: true,
      automatic_payment_methods: NO_REDIRECTS,
      metadata: { order_id: uniqueKey('order') },
      ...extra,
    });
  }

  async function onboardedAccount(): Promise<Stripe.Account> {
    const account = await stripe.accounts.create({
      type: 'express',
      country: 'GB',
      email: 'seller@example.test',
      capabilities: { transfers: { requested: true } },
    });
    const response = await fetch(`${fake.url}/_fake/accounts/${account.id}/complete`, { method: 'POST' });
    expect(response.status).toBe(200);
    return stripe.accounts.retrieve(account.id);
  }

  beforeAll(async () => {
    stateDir = mkdtempSync(path.join(tmpdir(), 'payments-fake-contract-'));
    receiver = new WebhookReceiver();
    await receiver.start();
    fake = await createPaymentsFake({
      port: 0,
      webhookUrl: `${receiver.url}/cli`,
      webhookSecret: WEBHOOK_SECRET,
      stateFile: path.join(stateDir, 'main.json'),
      webhookRetryDelaysMs: [50, 100, 200],
    }).start();
    stripe = clientFor(fake.port);
  });

  afterAll(async () => {
    await fake?.close();
    await receiver?.close();
    if (stateDir) rmSync(stateDir, { recursive: true, force: true });
  });

  describe('payments', () => {
    it('takes a Visa payment, creates a succeeded charge and adds the amount to the balance', async () => {
      const before = await availableGbp();
      const intent = await pay('pm_card_visa', 2500, {
        transfer_group: 'order_visa',
        description: 'Module: Hogwood Junction',
      });

      expect(intent.id).toMatch(/^pi_/);
      expect(intent.object).toBe('payment_intent');
      expect(intent.status).toBe('succeeded');
      expect(intent.amount_received).toBe(2500);
      expect(intent.livemode).toBe(false);
      expect(intent.client_secret).toMatch(new RegExp(`^${intent.id}_secret_\\w+$`));
      expect(intent.payment_method).toMatch(/^pm_/);
      expect(intent.latest_charge).toMatch(/^ch_/);

      const charge = await stripe.charges.retrieve(intent.latest_charge as string);
      expect(charge).toMatchObject({
        object: 'charge',
        amount: 2500,
        amount_refunded: 0,
        refunded: false,
        paid: true,
        status: 'succeeded',
        payment_intent: intent.id,
        transfer_group: 'order_visa',
        currency: 'gbp',
      });
      expect(charge.payment_method_details?.card?.last4).toBe('4242');
      expect(await availableGbp()).toBe(before + 2500);
    });

    it('confirms an intent created earlier and expands its latest charge on request', async () => {
      const created = await stripe.paymentIntents.create({
        amount: 1800,
        currency: 'gbp',
        automatic_payment_methods: NO_REDIRECTS,
        metadata: { order_id: 'ord_later' },
      });
      expect(created.status).toBe('requires_payment_method');

      const updated = await stripe.paymentIntents.update(created.id, { metadata: { buyer: 'u_7' } });
      expect(updated.metadata).toEqual({ order_id: 'ord_later', buyer: 'u_7' });

      const confirmed = await stripe.paymentIntents.confirm(created.id, {
        payment_method: 'pm_card_mastercard',
        expand: ['latest_charge'],
      });
      expect(confirmed.status).toBe('succeeded');
      const charge = confirmed.latest_charge as Stripe.Charge;
      expect(charge.object).toBe('charge');
      expect(charge.payment_method_details?.card?.brand).toBe('mastercard');
    });

    it('raises a card error for a declined card and leaves the intent waiting for another payment method', async () => {
      const error = await rejection(pay('pm_card_chargeDeclined'));

      expect(error).toBeInstanceOf(Stripe.errors.StripeCardError);
      expect(error.statusCode).toBe(402);
      expect(error.code).toBe('card_declined');
      expect(error.decline_code).toBe('generic_decline');
      const intentId = error.payment_intent?.id as string;
      expect(intentId).toMatch(/^pi_/);

      const intent = await stripe.paymentIntents.retrieve(intentId);
      expect(intent.status).toBe('requires_payment_method');
      expect(intent.last_payment_error?.decline_code).toBe('generic_decline');
      expect(intent.payment_method).toBeNull();

      const retried = await stripe.paymentIntents.confirm(intentId, { payment_method: 'pm_card_visa' });
      expect(retried.status).toBe('succeeded');
    });

    it('raises a card error with decline code insufficient_funds for the insufficient-funds card', async () => {
      const error = await rejection(pay('pm_card_chargeDeclinedInsufficientFunds'));

      expect(error).toBeInstanceOf(Stripe.errors.StripeCardError);
      expect(error.decline_code).toBe('insufficient_funds');
      const intent = await stripe.paymentIntents.retrieve(error.payment_intent?.id as string);
      expect(intent.status).toBe('requires_payment_method');
      expect(intent.last_payment_error?.code).toBe('card_declined');
    });

    it('asks for authentication, and completing it on the fake makes the payment succeed', async () => {
      const intent = await pay('pm_card_authenticationRequired', 4200);
      expect(intent.status).toBe('requires_action');
      expect(intent.next_action?.type).toBe('use_stripe_sdk');

      const before = await availableGbp();
      const authenticated = (await stripe.rawRequest('POST', `/v1/payment_intents/${intent.id}/_fake/authenticate`, {
        outcome: 'success',
      })) as Stripe.PaymentIntent;
      expect(authenticated.status).toBe('succeeded');
      expect((await stripe.paymentIntents.retrieve(intent.id)).latest_charge).toMatch(/^ch_/);
      expect(await availableGbp()).toBe(before + 4200);
    });

    it('returns the intent to requires_payment_method when authentication fails', async () => {
      const intent = await pay('pm_card_authenticationRequired');
      const failed = (await stripe.rawRequest('POST', `/v1/payment_intents/${intent.id}/_fake/authenticate`, {
        outcome: 'failure',
      })) as Stripe.PaymentIntent;

      expect(failed.status).toBe('requires_payment_method');
      expect(failed.last_payment_error?.code).toBe('payment_intent_authentication_failure');
    });

    it('cancels an unpaid intent and then refuses to confirm it', async () => {
      const intent = await stripe.paymentIntents.create({
        amount: 900,
        currency: 'gbp',
        automatic_payment_methods: NO_REDIRECTS,
      });
      const canceled = await stripe.paymentIntents.cancel(intent.id, { cancellation_reason: 'abandoned' });
      expect(canceled.status).toBe('canceled');
      expect(canceled.cancellation_reason).toBe('abandoned');

      const error = await rejection(stripe.paymentIntents.confirm(intent.id, { payment_method: 'pm_card_visa' }));
      expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(error.code).toBe('payment_intent_unexpected_state');
    });

    it('refuses amounts under the GBP minimum, unknown payment methods and unknown parameters', async () => {
      const tooSmall = await rejection(pay('pm_card_visa', 29));
      expect(tooSmall).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(tooSmall.statusCode).toBe(400);
      expect(tooSmall.param).toBe('amount');

      const unknownMethod = await rejection(pay('pm_card_doesNotExist'));
      expect(unknownMethod.code).toBe('resource_missing');
      expect(unknownMethod.param).toBe('payment_method');

      const unknownParam = await rejection(
        stripe.paymentIntents.create({
          amount: 1000,
          currency: 'gbp',
          colour: 'green',
        } as Stripe.PaymentIntentCreateParams),
      );
      expect(unknownParam.code).toBe('parameter_unknown');
      expect(unknownParam.param).toBe('colour');
    });

    it('requires a return_url for server-side confirmation when redirect payment methods are allowed, as Stripe does', async () => {
      const error = await rejection(
        stripe.paymentIntents.create({ amount: 1000, currency: 'gbp', payment_method: 'pm_card_visa', confirm: true }),
      );
      expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);

      const withReturnUrl = await stripe.paymentIntents.create({
        amount: 1000,
        currency: 'gbp',
        payment_method: 'pm_card_visa',
        confirm: true,
        return_url: 'http://127.0.0.1:8080/orders/return',
      });
      expect(withReturnUrl.status).toBe('succeeded');
    });
  });

  describe('requests', () => {
    it('replays an idempotent request and refuses the same key with different parameters', async () => {
      const key = uniqueKey('create-order');
      const params: Stripe.PaymentIntentCreateParams = {
        amount: 3100,
        currency: 'gbp',
        automatic_payment_methods: NO_REDIRECTS,
        metadata: { order_id: key },
      };
      const first = await stripe.paymentIntents.create(params, { idempotencyKey: key });
      const second = await stripe.paymentIntents.create(params, { idempotencyKey: key });

      expect(second.id).toBe(first.id);
      expect(second.lastResponse.headers['idempotent-replayed']).toBe('true');
      expect(first.lastResponse.headers['idempotent-replayed']).toBeUndefined();

      const error = await rejection(stripe.paymentIntents.create({ ...params, amount: 3200 }, { idempotencyKey: key }));
      expect(error).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
      expect(error.statusCode).toBe(400);
      expect(error.rawType).toBe('idempotency_error');
    });

    it('refuses a request without an API key, or with a key that is not a test secret key, with an authentication error', async () => {
      const keyless = new Stripe('', {
        host: '127.0.0.1',
        port: fake.port,
        protocol: 'http',
        maxNetworkRetries: 0,
        authenticator: async () => {},
      });
      const missing = await rejection(keyless.balance.retrieve());
      expect(missing).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
      expect(missing.statusCode).toBe(401);
      expect(missing.message).toContain('You did not provide an API key');

      const publishable = await rejection(clientFor(fake.port, 'pk_test_not_secret').balance.retrieve());
      expect(publishable).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
    });

    it('answers unknown objects and unknown routes with 404 and Stripe’s error object', async () => {
      const missing = await rejection(stripe.paymentIntents.retrieve('pi_doesnotexist'));
      expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(missing.statusCode).toBe(404);
      expect(missing.code).toBe('resource_missing');

      const route = await rejection(stripe.rawRequest('GET', '/v1/no_such_things'));
      expect(route.statusCode).toBe(404);
      expect(route.message).toContain('Unrecognized request URL');
    });
  });

  describe('refunds', () => {
    it('refunds part of a payment, then the rest, then refuses a further refund', async () => {
      const intent = await pay('pm_card_visa', 5000);
      const before = await availableGbp();

      const partial = await stripe.refunds.create({
        payment_intent: intent.id,
        amount: 2000,
        reason: 'requested_by_customer',
      });
      expect(partial).toMatchObject({ object: 'refund', amount: 2000, status: 'succeeded', payment_intent: intent.id });
      let charge = await stripe.charges.retrieve(intent.latest_charge as string);
      expect(charge.amount_refunded).toBe(2000);
      expect(charge.refunded).toBe(false);

      const rest = await stripe.refunds.create({ payment_intent: intent.id });
      expect(rest.amount).toBe(3000);
      charge = await stripe.charges.retrieve(intent.latest_charge as string);
      expect(charge.amount_refunded).toBe(5000);
      expect(charge.refunded).toBe(true);
      expect((await stripe.refunds.retrieve(rest.id)).charge).toBe(charge.id);
      expect(await availableGbp()).toBe(before - 5000);

      const again = await rejection(stripe.refunds.create({ payment_intent: intent.id }));
      expect(again).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(again.code).toBe('charge_already_refunded');
    });

    it('refuses to refund more than was paid', async () => {
      const intent = await pay('pm_card_visa', 1000);
      const error = await rejection(stripe.refunds.create({ charge: intent.latest_charge as string, amount: 1500 }));

      expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(error.param).toBe('amount');
      expect((await stripe.charges.retrieve(intent.latest_charge as string)).amount_refunded).toBe(0);
    });
  });

  describe('Connect payouts', () => {
    it('creates a seller account whose onboarding link, once completed, enables payouts', async () => {
      const account = await stripe.accounts.create({
        type: 'express',
        country: 'GB',
        email: 'seller@example.test',
        capabilities: { transfers: { requested: true } },
        metadata: { user_id: '42' },
      });
      expect(account.id).toMatch(/^acct_/);
      expect(account.payouts_enabled).toBe(false);
      expect(account.capabilities?.transfers).toBe('inactive');

      const returnUrl = 'http://127.0.0.1:8080/seller/payouts/done';
      const link = await stripe.accountLinks.create({
        account: account.id,
        refresh_url: 'http://127.0.0.1:8080/seller/payouts/retry',
        return_url: returnUrl,
        type: 'account_onboarding',
      });
      expect(link.object).toBe('account_link');
      expect(link.url.startsWith(`${fake.url}/_fake/onboarding/${account.id}`)).toBe(true);

      const page = await fetch(link.url);
      expect(page.status).toBe(200);
      expect(await page.text()).toContain('<form method="post">');
      const submitted = await fetch(link.url, { method: 'POST', redirect: 'manual' });
      expect(submitted.status).toBe(303);
      expect(submitted.headers.get('location')).toBe(returnUrl);

      const onboarded = await stripe.accounts.retrieve(account.id);
      expect(onboarded).toMatchObject({ charges_enabled: true, payouts_enabled: true, details_submitted: true });
      expect(onboarded.capabilities?.transfers).toBe('active');
      expect(onboarded.metadata).toEqual({ user_id: '42' });
    });

    it('transfers to an onboarded account and refuses an account that has not finished onboarding', async () => {
      const seller = await onboardedAccount();
      const intent = await pay('pm_card_visa', 10_000, { transfer_group: 'order_transfer' });

      const transfer = await stripe.transfers.create({
        amount: 8800,
        currency: 'gbp',
        destination: seller.id,
        transfer_group: 'order_transfer',
        source_transaction: intent.latest_charge as string,
        metadata: { order_id: 'order_transfer' },
      });
      expect(transfer).toMatchObject({ object: 'transfer', amount: 8800, destination: seller.id, reversed: false });
      expect(transfer.id).toMatch(/^tr_/);
      expect((await stripe.transfers.retrieve(transfer.id)).amount_reversed).toBe(0);

      const pending = await stripe.accounts.create({
        type: 'express',
        country: 'GB',
        capabilities: { transfers: { requested: true } },
      });
      const refused = await rejection(
        stripe.transfers.create({ amount: 100, currency: 'gbp', destination: pending.id }),
      );
      expect(refused).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
      expect(refused.param).toBe('destination');

      const unknown = await rejection(
        stripe.transfers.create({ amount: 100, currency: 'gbp', destination: 'acct_nobody' }),
      );
      expect(unknown.code).toBe('resource_missing');
    });

    it('refuses a transfer the platform balance cannot cover', async () => {
      const seller = await onboardedAccount();
      const tooMuch = (await availableGbp()) + 1;
      const error = await rejection(
        stripe.transfers.create({ amount: tooMuch, currency: 'gbp', destination: seller.id }),
      );
      expect(error.code).toBe('balance_insufficient');
    });

    it('reverses a transfer partly and then fully', async () => {
      const seller = await onboardedAccount();
      await pay('pm_card_visa', 6000);
      const transfer = await stripe.transfers.create({ amount: 5000, currency: 'gbp', destination: seller.id });

      const partial = await stripe.transfers.createReversal(transfer.id, { amount: 2000 });
      expect(partial.id).toMatch(/^trr_/);
      expect(partial.object).toBe('transfer_reversal');
      let after = await stripe.transfers.retrieve(transfer.id);
      expect(after.amount_reversed).toBe(2000);
      expect(after.reversed).toBe(false);

      await stripe.transfers.createReversal(transfer.id);
      after = await stripe.transfers.retrieve(transfer.id);
      expect(after.amount_reversed).toBe(5000);
      expect(after.reversed).toBe(true);
      expect(after.reversals.data).toHaveLength(2);

      const again = await rejection(stripe.transfers.createReversal(transfer.id));
      expect(again).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    });

    it('moves the balance: a charge adds, a refund and a transfer subtract, a reversal adds back', async () => {
      const seller = await onboardedAccount();
      const start = await availableGbp();

      const intent = await pay('pm_card_visa', 4000);
      expect(await availableGbp()).toBe(start + 4000);
      await stripe.refunds.create({ payment_intent: intent.id, amount: 1000 });
      expect(await availableGbp()).toBe(start + 3000);
      const transfer = await stripe.transfers.create({ amount: 2000, currency: 'gbp', destination: seller.id });
      expect(await availableGbp()).toBe(start + 1000);
      await stripe.transfers.createReversal(transfer.id, { amount: 500 });
      expect(await availableGbp()).toBe(start + 1500);

      const balance = await stripe.balance.retrieve();
      expect(balance.object).toBe('balance');
      expect(balance.pending.find((entry) => entry.currency === 'gbp')?.amount).toBe(0);
    });
  });

  describe('webhooks', () => {
    it('delivers signed events that constructEvent accepts, and rejects a tampered body', async () => {
      const intent = await pay('pm_card_visa', 2600);
      const hook = await receiver.waitFor(
        '/cli',
        (event) => event.type === 'payment_intent.succeeded' && (event.data.object as { id: string }).id === intent.id,
      );

      expect(hook.signature).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
      const event = stripe.webhooks.constructEvent(hook.rawBody, hook.signature, WEBHOOK_SECRET);
      expect(event.id).toMatch(/^evt_/);
      expect(event.type).toBe('payment_intent.succeeded');
      expect((event.data.object as Stripe.PaymentIntent).amount).toBe(2600);
      expect((await stripe.events.retrieve(event.id)).type).toBe('payment_intent.succeeded');

      const tampered = Buffer.from(hook.rawBody.toString('utf8').replace('"amount": 2600', '"amount": 1'));
      expect(() => stripe.webhooks.constructEvent(tampered, hook.signature, WEBHOOK_SECRET)).toThrow(
        Stripe.errors.StripeSignatureVerificationError,
      );
      expect(() => stripe.webhooks.constructEvent(hook.rawBody, hook.signature, 'whsec_someone_else')).toThrow(
        Stripe.errors.StripeSignatureVerificationError,
      );
    });

    it('delivers to registered endpoints with their own secret and retries a failed delivery', async () => {
      receiver.failFirst = true;
      try {
        const endpoint = await stripe.webhookEndpoints.create({
          url: `${receiver.url}/registered`,
          enabled_events: ['charge.refunded'],
        });
        expect(endpoint.id).toMatch(/^we_/);
        expect(endpoint.secret).toMatch(/^whsec_/);

        const intent = await pay('pm_card_visa', 1200);
        await stripe.refunds.create({ payment_intent: intent.id });
        const hook = await receiver.waitFor(
          '/registered',
          (event) => (event.data.object as { payment_intent?: string }).payment_intent === intent.id,
        );
        const event = stripe.webhooks.constructEvent(hook.rawBody, hook.signature, endpoint.secret as string);
        expect(event.type).toBe('charge.refunded');
        expect(() => stripe.webhooks.constructEvent(hook.rawBody, hook.signature, WEBHOOK_SECRET)).toThrow();
        // Only the subscribed type reached the endpoint.
        const types = receiver.received
          .filter((received) => received.path === '/registered')
          .map((received) => (JSON.parse(received.rawBody.toString('utf8')) as Stripe.Event).type);
        expect(new Set(types)).toEqual(new Set(['charge.refunded']));

        const deleted = await stripe.webhookEndpoints.del(endpoint.id);
        expect(deleted.deleted).toBe(true);
      } finally {
        receiver.failFirst = false;
      }
    });

    it('lists events filtered by type', async () => {
      const intent = await pay('pm_card_visa', 700);
      const events = await stripe.events.list({ type: 'payment_intent.succeeded', limit: 5 });
      expect(events.data.every((event) => event.type === 'payment_intent.succeeded')).toBe(true);
      expect((events.data[0]?.data.object as Stripe.PaymentIntent).id).toBe(intent.id);
    });
  });

  describe('lists', () => {
    it('pages with limit and starting_after, newest first', async () => {
      const own = await createPaymentsFake().start();
      try {
        const client = clientFor(own.port);
        const ids: string[] = [];
        for (let i = 0; i < 5; i += 1) {
          ids.push((await client.paymentIntents.create({ amount: 1000 + i, currency: 'gbp' })).id);
        }
        const newest = [...ids].reverse();

        const first = await client.paymentIntents.list({ limit: 2 });
        expect(first.object).toBe('list');
        expect(first.url).toBe('/v1/payment_intents');
        expect(first.data.map((intent) => intent.id)).toEqual(newest.slice(0, 2));
        expect(first.has_more).toBe(true);

        const second = await client.paymentIntents.list({ limit: 2, starting_after: first.data[1]?.id });
        expect(second.data.map((intent) => intent.id)).toEqual(newest.slice(2, 4));
        expect(second.has_more).toBe(true);

        const last = await client.paymentIntents.list({ limit: 2, starting_after: second.data[1]?.id });
        expect(last.data.map((intent) => intent.id)).toEqual(newest.slice(4));
        expect(last.has_more).toBe(false);

        const all = await client.paymentIntents.list({ limit: 2 }).autoPagingToArray({ limit: 100 });
        expect(all.map((intent) => intent.id)).toEqual(newest);
      } finally {
        await own.close();
      }
    });
  });

  describe('persistence', () => {
    it('keeps objects, the balance and idempotency keys across a restart with the same state file', async () => {
      const stateFile = path.join(stateDir, 'restart.json');
      const first = await createPaymentsFake({ stateFile }).start();
      const key = uniqueKey('restart');
      let intentId: string;
      let accountId: string;
      try {
        const client = clientFor(first.port);
        intentId = (
          await client.paymentIntents.create(
            {
              amount: 2200,
              currency: 'gbp',
              payment_method: 'pm_card_visa',
              confirm: true,
              automatic_payment_methods: NO_REDIRECTS,
            },
            { idempotencyKey: key },
          )
        ).id;
        accountId = (await client.accounts.create({ type: 'express', country: 'GB' })).id;
        // Written after each change, not only on close: a crash loses nothing.
        expect(readFileSync(stateFile, 'utf8')).toContain(accountId);
      } finally {
        await first.close();
      }

      const second = await createPaymentsFake({ stateFile }).start();
      try {
        const client = clientFor(second.port);
        const intent = await client.paymentIntents.retrieve(intentId);
        expect(intent.status).toBe('succeeded');
        expect((await client.charges.retrieve(intent.latest_charge as string)).amount).toBe(2200);
        expect((await client.accounts.retrieve(accountId)).id).toBe(accountId);
        const balance = await client.balance.retrieve();
        expect(balance.available.find((entry) => entry.currency === 'gbp')?.amount).toBe(2200);

        const replay = await client.paymentIntents.create(
          {
            amount: 2200,
            currency: 'gbp',
            payment_method: 'pm_card_visa',
            confirm: true,
            automatic_payment_methods: NO_REDIRECTS,
          },
          { idempotencyKey: key },
        );
        expect(replay.id).toBe(intentId);
        expect(replay.lastResponse.headers['idempotent-replayed']).toBe('true');
      } finally {
        await second.close();
      }
    });
  });
});
