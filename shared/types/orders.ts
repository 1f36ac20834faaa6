import type { Currency } from '../listings/vocabulary';
import type { HandoverMethod, OrderKind, OrderMove, OrderMover, OrderState } from '../orders/states';

/** Which side of an order the viewer is on; a moderator sees an order only once a problem was raised. */
export type OrderViewerRole = 'buyer' | 'seller' | 'moderator';

/** What a card payment was for: the whole price, or a build order's deposit or balance. */
export type OrderPaymentPurpose = 'full' | 'deposit' | 'balance';

/** Where one card payment stands at the provider. */
export type OrderPaymentStatus = 'started' | 'needs_authentication' | 'succeeded' | 'failed' | 'cancelled';

/** The money of an order, all in minor units of `currency`, fixed when the order was made. */
export interface OrderAmountsView {
  itemMinor: number;
  deliveryMinor: number;
  buyerFeeMinor: number;
  /** What the buyer pays: item + delivery + buyer's fee. */
  totalMinor: number;
  /** A build order's deposit; 0 for a module. */
  depositMinor: number;
  refundedMinor: number;
}

/** The seller's side of the money: shown to the seller and to moderators only. */
export interface OrderSellerMoneyView {
  commissionBps: number;
  commissionMinor: number;
  /** What the seller is due (after any part refund). */
  payoutMinor: number;
  transferredMinor: number;
}

/** One card payment asked of the buyer. */
export interface OrderPaymentView {
  id: number;
  purpose: OrderPaymentPurpose;
  attempt: number;
  amountMinor: number;
  status: OrderPaymentStatus;
  /** Plain words for a failed payment ("The card was declined."); null otherwise. */
  failure: string | null;
  createdAt: string;
}

/** One entry of the order's history. */
export interface OrderHistoryEntry {
  id: number;
  /** A move of ORDER_MOVES, or 'create' / 'stage'. */
  move: string;
  fromState: OrderState | null;
  toState: OrderState;
  by: OrderMover;
  /** The person's display name when a person made the move. */
  byName: string | null;
  note: string | null;
  at: string;
}

/** An order as one of its parties (or a moderator) sees it: GET /api/orders/:id. */
export interface OrderView {
  id: number;
  kind: OrderKind;
  state: OrderState;
  /** ORDER_STATE_LABELS[state]. */
  stateLabel: string;
  viewerRole: OrderViewerRole;
  listing: { id: number; title: string };
  quoteId: number | null;
  buyer: { id: number; displayName: string };
  seller: { id: number; displayName: string };
  currency: Currency;
  handover: HandoverMethod;
  /** HANDOVER_LABELS[handover]. */
  handoverLabel: string;
  amounts: OrderAmountsView;
  /** The buyer's fee rate when the order was made. */
  buyerFeeBps: number;
  /** Null for the buyer. */
  sellerMoney: OrderSellerMoneyView | null;
  /**
   * The delivery address: always for the buyer who gave it; for the seller and moderators only once the order has
   * been paid; null for collection.
   */
  deliveryAddress: string | null;
  /** Until when an unpaid order holds the listing (ISO), else null. */
  payableUntil: string | null;
  /** What the buyer must pay now, when the order waits for a payment; else null. */
  due: { purpose: OrderPaymentPurpose; amountMinor: number } | null;
  handedOverAt: string | null;
  confirmBy: string | null;
  problemRaisedAt: string | null;
  stateChangedAt: string;
  createdAt: string;
  payments: OrderPaymentView[];
  /** Oldest first. */
  history: OrderHistoryEntry[];
  /** The moves the viewer could make now, by their role (buttons to show). */
  moves: OrderMove[];
}

/** One way to get the module home, priced, on the checkout page (before any field). */
export interface CheckoutOption {
  handover: HandoverMethod;
  label: string;
  /** Plain words on what the choice means (distance limit, courier kind, where to collect). */
  explanation: string;
  needsAddress: boolean;
  itemMinor: number;
  deliveryMinor: number;
  buyerFeeMinor: number;
  totalMinor: number;
}

/** GET /api/orders/checkout?listing=… : what a buyer would pay for each hand-over the listing offers. */
export interface CheckoutPreview {
  listing: { id: number; title: string; townName: string; coverThumbUrl: string | null };
  seller: { id: number; displayName: string };
  currency: Currency;
  buyerFeeBps: number;
  options: CheckoutOption[];
  /** Whether the module can be bought now (listed, not reserved or sold). */
  available: boolean;
  /** The viewer's own unpaid order for this listing, to carry on paying; null if none. */
  openOrderId: number | null;
  /** Minutes the listing is held for the buyer once they start paying. */
  reservationMinutes: number;
  /** Test cards may be chosen (local payments fake); a real deployment needs a card element instead. */
  testCards: boolean;
}

/** The answer to POST /api/orders/:id/payments, in plain words. */
export type PaymentOutcome =
  'processing' | 'succeeded' | 'declined' | 'insufficient_funds' | 'needs_authentication' | 'authentication_failed';

export interface PaymentAttemptResult {
  outcome: PaymentOutcome;
  /** Shown to the buyer as it is. */
  message: string;
  payment: OrderPaymentView;
  order: OrderView;
}
