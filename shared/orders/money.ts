/**
 * Order arithmetic, all in integer minor units (pence for GBP). Rates are basis points (1 bp = 0.01 %).
 *
 * Rules (ours): commission is taken from what the seller is paid for — the item and their own delivery charge —
 * never from the buyer's fee; the buyer's fee is a share of the item price; a full refund returns everything the
 * buyer paid; a part refund comes out of the seller's side, and commission is then charged only on what the
 * seller keeps. Amounts are rounded half up to a whole minor unit, once per amount, so the parts always add up
 * to the total.
 */

export const MAX_BASIS_POINTS = 10_000;

/** `amount × bp / 10 000`, rounded half up. Exact for amounts and rates in range (below 2^53). */
export function shareOf(amountMinor: number, basisPoints: number): number {
  assertMinor(amountMinor, 'amount');
  if (!Number.isInteger(basisPoints) || basisPoints < 0 || basisPoints > MAX_BASIS_POINTS) {
    throw new RangeError(`basis points must be a whole number from 0 to ${MAX_BASIS_POINTS}`);
  }
  return Math.floor((amountMinor * basisPoints + MAX_BASIS_POINTS / 2) / MAX_BASIS_POINTS);
}

export interface FeeRates {
  /** Taken from the seller's side. */
  commissionBps: number;
  /** Added to what the buyer pays. */
  buyerFeeBps: number;
}

export interface OrderAmounts {
  itemMinor: number;
  deliveryMinor: number;
  buyerFeeMinor: number;
  /** What the buyer pays: item + delivery + buyer's fee. */
  totalMinor: number;
  commissionMinor: number;
  /** What the seller receives: item + delivery − commission. */
  payoutMinor: number;
}

/** The breakdown shown before paying and stored on the order. */
export function orderAmounts(itemMinor: number, deliveryMinor: number, rates: FeeRates): OrderAmounts {
  assertMinor(itemMinor, 'item price');
  assertMinor(deliveryMinor, 'delivery');
  const sellerGross = itemMinor + deliveryMinor;
  const buyerFeeMinor = shareOf(itemMinor, rates.buyerFeeBps);
  const commissionMinor = shareOf(sellerGross, rates.commissionBps);
  return {
    itemMinor,
    deliveryMinor,
    buyerFeeMinor,
    totalMinor: sellerGross + buyerFeeMinor,
    commissionMinor,
    payoutMinor: sellerGross - commissionMinor,
  };
}

export interface Settlement {
  /** Back to the buyer's card. */
  refundMinor: number;
  /** Commission kept by the platform. */
  commissionMinor: number;
  /** Transferred to the seller. */
  payoutMinor: number;
}

/**
 * A moderator's part refund of `refundMinor` out of the seller's side (at most item + delivery). The buyer's fee
 * stays with the platform; commission is recomputed on what the seller keeps.
 */
export function partRefund(amounts: OrderAmounts, refundMinor: number, commissionBps: number): Settlement {
  assertMinor(refundMinor, 'refund');
  const sellerGross = amounts.itemMinor + amounts.deliveryMinor;
  if (refundMinor > sellerGross) throw new RangeError('a part refund cannot exceed the item and delivery');
  const kept = sellerGross - refundMinor;
  const commissionMinor = shareOf(kept, commissionBps);
  return { refundMinor, commissionMinor, payoutMinor: kept - commissionMinor };
}

/** A build order's deposit (a share of the total) and the balance due before hand-over. */
export function depositSplit(totalMinor: number, depositBps: number): { depositMinor: number; balanceMinor: number } {
  const depositMinor = shareOf(totalMinor, depositBps);
  return { depositMinor, balanceMinor: totalMinor - depositMinor };
}

function assertMinor(value: number, what: string): void {
  if (!Number.isSafeInteger(value) || value < 0) throw new RangeError(`${what} must be a whole number of minor units`);
}
