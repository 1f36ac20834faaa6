import type { AppContext } from '../../app-context';
import { payOutIfDue } from './payouts.service';
import { refundWhatIsOwed, reverseTransfers } from './refunds.service';

/**
 * Bring the money at the provider in line with the order's state: refunds first (a part refund must leave the
 * charge before the seller's share is transferred from it), then reversals, then the payout. Every step is
 * idempotent, so this runs after each move and again from the sweep job; a provider failure is logged and left
 * for the sweep, since the move itself is already recorded.
 */
export async function settleOrderMoney(ctx: AppContext, orderId: number): Promise<void> {
  try {
    await refundWhatIsOwed(ctx, orderId);
    await reverseTransfers(ctx, orderId);
    await payOutIfDue(ctx, orderId);
  } catch (error) {
    ctx.logger.warn({ err: error, orderId }, 'order money not settled yet; the sweep job will try again');
  }
}
