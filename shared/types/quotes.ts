import type { Currency } from '../listings/vocabulary';
import type { OrderState } from '../orders/states';
import type { QuoteDraft, QuoteLine } from '../quotes/quote-pricing';
import type { BuildHandover, BuildStage } from '../schemas/quotes';

export type { QuoteDraft, QuoteLine };

/** A builder a buyer may ask: their service listing reaches the buyer's town. GET /api/quotes/builders */
export interface BuilderChoice {
  listingId: number;
  title: string;
  builder: { id: number; displayName: string; businessName: string };
  townName: string;
  distanceKm: number;
  serviceAreaKm: number;
  leadTimeWeeks: number;
  depositBps: number;
}

/** Where a request stands with one builder. */
export type RecipientState = 'waiting' | 'quoted';
/** Where a quote stands: sent, accepted, or not chosen because the buyer accepted another. */
export type QuoteState = 'sent' | 'accepted' | 'not_chosen';
/** Where a request stands: open for quotes, or settled by accepting one. */
export type QuoteRequestState = 'open' | 'accepted';

/** A quote as its buyer and its builder see it; totals as the buyer would pay them with delivery. */
export interface QuoteView {
  id: number;
  requestId: number;
  state: QuoteState;
  builder: { id: number; displayName: string; businessName: string };
  listing: { id: number; title: string };
  currency: Currency;
  lines: QuoteLine[];
  itemMinor: number;
  deliveryKm: number;
  deliveryMinor: number;
  buyerFeeMinor: number;
  totalMinor: number;
  depositBps: number;
  depositMinor: number;
  balanceMinor: number;
  leadTimeWeeks: number;
  /** YYYY-MM-DD, the last day it can be accepted. */
  validUntil: string;
  expired: boolean;
  /** The builder's note; always present when the quote differs from their rate card. */
  note: string;
  /** Whether the builder changed the rate card's prices. */
  adjusted: boolean;
  orderId: number | null;
  sentAt: string;
}

/** One builder a request went to. */
export interface QuoteRecipientView {
  listingId: number;
  builder: { id: number; displayName: string; businessName: string };
  distanceKm: number;
  state: RecipientState;
}

/** A buyer's request in their list. */
export interface QuoteRequestSummary {
  id: number;
  planName: string;
  townName: string;
  state: QuoteRequestState;
  neededBy: string | null;
  builderCount: number;
  quoteCount: number;
  createdAt: string;
}

/** A buyer's request with every quote, for comparing side by side. GET /api/quotes/requests/:id */
export interface QuoteRequestView extends QuoteRequestSummary {
  planId: number | null;
  /** The plan as it was when the request was sent. */
  planInput: unknown;
  notes: string;
  recipients: QuoteRecipientView[];
  quotes: QuoteView[];
  /** The build order made by accepting a quote. */
  orderId: number | null;
}

/** A request in a builder's inbox. */
export interface InboxItem {
  requestId: number;
  buyer: { id: number; displayName: string };
  planName: string;
  townName: string;
  distanceKm: number;
  neededBy: string | null;
  notes: string;
  state: RecipientState;
  receivedAt: string;
}

/** One request for the builder's quote editor, prefilled from the plan and their rate card. */
export interface InboxRequestView extends InboxItem {
  planInput: unknown;
  listing: { id: number; title: string };
  currency: Currency;
  /** The rate card's pricing of the plan; null when the saved input no longer makes a plan. */
  draft: QuoteDraft | null;
  leadTimeWeeks: number;
  depositBps: number;
  quote: QuoteView | null;
}

/** A builder's quoting settings. GET/PUT /api/quotes/settings */
export interface QuoteSettingsView {
  depositBps: number;
  /** Whether the account can quote (holds a listed build service). */
  builder: boolean;
}

/** One stage of a build, from the order's history. */
export interface BuildStageEntry {
  stage: BuildStage;
  label: string;
  note: string;
  at: string;
}

/** A build order's progress for its buyer and builder. GET /api/builds/:id */
export interface BuildView {
  orderId: number;
  state: OrderState;
  stateLabel: string;
  viewerRole: 'buyer' | 'builder';
  handover: BuildHandover | string;
  planName: string;
  /** The plan as the request carried it, for the quote document's bill of materials. */
  planInput: unknown;
  quote: QuoteView;
  currency: Currency;
  totalMinor: number;
  depositMinor: number;
  balanceMinor: number;
  /** Whether the provider's test cards are offered (the local payments fake). */
  testCards: boolean;
  /** What the buyer must pay now, if anything. */
  due: { purpose: 'deposit' | 'balance'; amountMinor: number } | null;
  stages: BuildStageEntry[];
  /** Stages the builder may record now (none for the buyer). */
  nextStages: BuildStage[];
}
