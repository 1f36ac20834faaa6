import type { Currency } from '../listings/vocabulary';
import type { OrderKind, OrderState } from '../orders/states';

/** One line of the orders list (GET /api/orders). */
export interface OrderSummary {
  id: number;
  kind: OrderKind;
  state: OrderState;
  stateLabel: string;
  listingTitle: string;
  /** The other side's display name: the seller on a purchase, the buyer on a sale. */
  otherParty: string;
  currency: Currency;
  /** What the buyer paid (purchases) or what the seller is due (sales). */
  amountMinor: number;
  createdAt: string;
  stateChangedAt: string;
}

/** The seller's payout account as the provider last reported it (GET /api/payouts/account). */
export interface PayoutAccountView {
  connected: boolean;
  /** Onboarding finished: transfers can be made. */
  ready: boolean;
}

/** Money of one currency on the balances page, in minor units. */
export interface BalanceTotals {
  currency: Currency;
  /** Paid by buyers and held by Benchwright until receipt is confirmed (or a problem is settled). */
  heldMinor: number;
  /** Receipt confirmed: waiting to be transferred (needs a ready payout account). */
  readyMinor: number;
  /** Transferred to the payout account, less anything taken back by a refund. */
  paidOutMinor: number;
}

/** GET /api/payouts/balances */
export interface BalancesView {
  account: PayoutAccountView;
  totals: BalanceTotals[];
  /** The seller's most recent sales. */
  recent: OrderSummary[];
}

/** The platform's rates in basis points (1 bp = 0.01 %). */
export interface FeeRatesView {
  commissionBps: number;
  buyerFeeBps: number;
  /** When these rates were set (ISO). */
  since: string;
}

/** GET /api/admin/fees: the rates now and the earlier ones, newest first. */
export interface FeeScheduleView {
  current: FeeRatesView;
  history: (FeeRatesView & { id: number; setBy: string | null })[];
}

/** One order waiting for a moderator (GET /api/order-problems). */
export interface OrderProblemSummary {
  id: number;
  listingTitle: string;
  buyer: string;
  seller: string;
  currency: Currency;
  itemMinor: number;
  deliveryMinor: number;
  totalMinor: number;
  /** The commission rate the order was made with, for the settlement's sums. */
  commissionBps: number;
  problemRaisedAt: string;
  /** The reason given when the problem was raised. */
  reason: string | null;
  /** Who raised it. */
  raisedBy: 'buyer' | 'seller' | null;
  /** Whether the module had been handed over when the problem was raised. */
  handedOver: boolean;
}
