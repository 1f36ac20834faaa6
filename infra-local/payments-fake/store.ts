import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import type {
  Account,
  Charge,
  PaymentIntent,
  PaymentMethod,
  Refund,
  StripeEvent,
  StripeObject,
  Transfer,
  WebhookEndpoint,
} from './types';

/** A stored response for an `Idempotency-Key`, replayed byte for byte. */
export interface IdempotencyRecord {
  method: string;
  path: string;
  fingerprint: string;
  status: number;
  body: string;
  requestId: string;
  createdAt: number;
}

export type StoredWebhookEndpoint = WebhookEndpoint & { secret: string };

export interface FakeState {
  version: 1;
  paymentIntents: Record<string, PaymentIntent>;
  charges: Record<string, Charge>;
  refunds: Record<string, Refund>;
  paymentMethods: Record<string, PaymentMethod>;
  /** Which documented test payment method (`pm_card_visa`, …) a stored PaymentMethod came from. */
  paymentMethodOrigins: Record<string, string>;
  accounts: Record<string, Account>;
  transfers: Record<string, Transfer>;
  events: Record<string, StripeEvent>;
  webhookEndpoints: Record<string, StoredWebhookEndpoint>;
  /** Platform available balance in minor units, per lower-case currency. */
  balance: Record<string, number>;
  idempotency: Record<string, IdempotencyRecord>;
}

export function emptyState(): FakeState {
  return {
    version: 1,
    paymentIntents: {},
    charges: {},
    refunds: {},
    paymentMethods: {},
    paymentMethodOrigins: {},
    accounts: {},
    transfers: {},
    events: {},
    webhookEndpoints: {},
    balance: {},
    idempotency: {},
  };
}

/**
 * In-memory state, written to a JSON file after every change (write to a temporary file,
 * then rename, so a crash never leaves half a file). Object key order is insertion order,
 * which is the order the lists use.
 */
export class Store {
  state: FakeState;
  private readonly file: string | undefined;

  constructor(file: string | undefined) {
    this.file = file;
    this.state = file ? loadState(file) : emptyState();
  }

  save(): void {
    if (!this.file) return;
    mkdirSync(dirname(this.file), { recursive: true });
    const tmp = `${this.file}.${process.pid}.tmp`;
    writeFileSync(tmp, JSON.stringify(this.state));
    renameSync(tmp, this.file);
  }

  reset(): void {
    this.state = emptyState();
    this.save();
  }

  /** Finds any stored object by id, using Stripe's id prefixes. */
  findById(id: string): StripeObject | StripeEvent | undefined {
    const s = this.state;
    const prefix = id.slice(0, id.indexOf('_') + 1);
    switch (prefix) {
      case 'pi_':
        return s.paymentIntents[id];
      case 'ch_':
        return s.charges[id];
      case 're_':
        return s.refunds[id];
      case 'pm_':
        return s.paymentMethods[id];
      case 'acct_':
        return s.accounts[id];
      case 'tr_':
        return s.transfers[id];
      case 'evt_':
        return s.events[id];
      default:
        return undefined;
    }
  }
}

function loadState(file: string): FakeState {
  if (!existsSync(file)) return emptyState();
  const text = readFileSync(file, 'utf8');
  if (text.trim() === '') return emptyState();
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch (error) {
    throw new Error(`payments-fake: state file ${file} is not valid JSON (${String(error)}); delete it to start empty`);
  }
  if (typeof parsed !== 'object' || parsed === null || (parsed as { version?: unknown }).version !== 1) {
    throw new Error(`payments-fake: state file ${file} has an unknown format; delete it to start empty`);
  }
  return { ...emptyState(), ...(parsed as Partial<FakeState>), version: 1 };
}
