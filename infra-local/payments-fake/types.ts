/**
 * The Stripe objects the fake stores and returns. Field names and shapes follow the
 * Stripe API (and the types of the `stripe` SDK); only the fields the app can rely on
 * are modelled, and every field that is present has Stripe's meaning.
 */

export type Metadata = Record<string, string>;

export interface ListObject<T> {
  object: 'list';
  data: T[];
  has_more: boolean;
  url: string;
  total_count?: number;
}

export interface CardDetails {
  brand: string;
  country: string;
  exp_month: number;
  exp_year: number;
  fingerprint: string;
  funding: string;
  last4: string;
}

export interface PaymentMethod {
  id: string;
  object: 'payment_method';
  billing_details: {
    address: null;
    email: null;
    name: null;
    phone: null;
  };
  card: CardDetails;
  created: number;
  customer: null;
  livemode: false;
  metadata: Metadata;
  type: 'card';
}

export interface PaymentError {
  type: 'card_error' | 'invalid_request_error';
  code: string;
  decline_code?: string;
  message: string;
  doc_url: string;
  charge?: string;
  payment_method?: PaymentMethod;
  payment_method_type?: string;
}

export type PaymentIntentStatus =
  | 'requires_payment_method'
  | 'requires_confirmation'
  | 'requires_action'
  | 'processing'
  | 'requires_capture'
  | 'canceled'
  | 'succeeded';

export interface NextAction {
  type: 'use_stripe_sdk';
  use_stripe_sdk: {
    type: 'three_d_secure_redirect';
    stripe_js: string;
    source: string;
  };
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  application: null;
  application_fee_amount: null;
  automatic_payment_methods: { enabled: boolean; allow_redirects?: 'always' | 'never' } | null;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: 'automatic' | 'automatic_async';
  client_secret: string;
  confirmation_method: 'automatic';
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  next_action: NextAction | null;
  on_behalf_of: null;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  setup_future_usage: null;
  shipping: null;
  statement_descriptor: null;
  statement_descriptor_suffix: null;
  status: PaymentIntentStatus;
  transfer_data: null;
  transfer_group: string | null;
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  application: null;
  application_fee: null;
  application_fee_amount: null;
  balance_transaction: string | null;
  billing_details: PaymentMethod['billing_details'];
  captured: boolean;
  created: number;
  currency: string;
  customer: null;
  description: string | null;
  disputed: false;
  failure_balance_transaction: null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Metadata;
  on_behalf_of: null;
  outcome: {
    network_status: 'approved_by_network' | 'declined_by_network';
    reason: string | null;
    risk_level: 'normal';
    seller_message: string;
    type: 'authorized' | 'issuer_declined';
  };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { type: 'card'; card: CardDetails };
  receipt_email: string | null;
  receipt_number: null;
  receipt_url: string | null;
  refunded: boolean;
  review: null;
  shipping: null;
  source_transfer: null;
  statement_descriptor: null;
  statement_descriptor_suffix: null;
  status: 'succeeded' | 'failed';
  transfer_data: null;
  transfer_group: string | null;
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  balance_transaction: string;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: 'duplicate' | 'fraudulent' | 'requested_by_customer' | null;
  receipt_number: null;
  source_transfer_reversal: null;
  status: 'succeeded';
  transfer_reversal: null;
}

export type CapabilityStatus = 'active' | 'inactive' | 'pending';

export interface Account {
  id: string;
  object: 'account';
  business_type: string | null;
  business_profile: Record<string, string | null>;
  capabilities: Record<string, CapabilityStatus>;
  charges_enabled: boolean;
  country: string;
  created: number;
  default_currency: string;
  details_submitted: boolean;
  email: string | null;
  metadata: Metadata;
  payouts_enabled: boolean;
  requirements: {
    current_deadline: null;
    currently_due: string[];
    disabled_reason: string | null;
    errors: [];
    eventually_due: string[];
    past_due: string[];
    pending_verification: [];
  };
  type: 'express' | 'custom' | 'standard';
}

export interface AccountLink {
  object: 'account_link';
  created: number;
  expires_at: number;
  url: string;
}

export interface TransferReversal {
  id: string;
  object: 'transfer_reversal';
  amount: number;
  balance_transaction: string;
  created: number;
  currency: string;
  destination_payment_refund: string;
  metadata: Metadata;
  source_refund: null;
  transfer: string;
}

export interface Transfer {
  id: string;
  object: 'transfer';
  amount: number;
  amount_reversed: number;
  balance_transaction: string;
  created: number;
  currency: string;
  description: string | null;
  destination: string;
  destination_payment: string;
  livemode: false;
  metadata: Metadata;
  reversals: ListObject<TransferReversal> & { total_count: number };
  reversed: boolean;
  source_transaction: string | null;
  source_type: 'card';
  transfer_group: string | null;
}

export interface BalanceAmount {
  amount: number;
  currency: string;
  source_types: { card: number };
}

export interface Balance {
  object: 'balance';
  available: BalanceAmount[];
  connect_reserved: { amount: number; currency: string }[];
  livemode: false;
  pending: BalanceAmount[];
}

/** Any object the fake can put into an event or expand by id. */
export type StripeObject = PaymentIntent | Charge | Refund | PaymentMethod | Account | Transfer | TransferReversal;

export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: StripeObject; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export interface WebhookEndpoint {
  id: string;
  object: 'webhook_endpoint';
  api_version: string | null;
  application: null;
  created: number;
  description: string | null;
  enabled_events: string[];
  livemode: false;
  metadata: Metadata;
  /** Stripe returns the signing secret only when the endpoint is created. */
  secret?: string;
  status: 'enabled' | 'disabled';
  url: string;
}

export interface DeletedObject {
  id: string;
  object: string;
  deleted: true;
}
