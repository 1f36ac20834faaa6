import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { depositSplit, orderAmounts, partRefund, shareOf } from '../../../shared/orders/money';

/*
 * Worked examples, done by hand here (our own fee rules, stated in shared/orders/money.ts). Basis points: 1 bp is
 * 1/100 of a percent, so 800 bp = 8 % (the usual definition of a basis point; from memory).
 * Rounding is half up to the penny.
 */
describe('order arithmetic', () => {
  it('takes 8 % commission from item and delivery: £240.00 + £35.00 delivery → £22.00 commission, £253.00 payout', () => {
    // 27,500 p × 800 / 10,000 = 2,200 p exactly.
    expect(orderAmounts(24_000, 3_500, { commissionBps: 800, buyerFeeBps: 0 })).toEqual({
      itemMinor: 24_000,
      deliveryMinor: 3_500,
      buyerFeeMinor: 0,
      totalMinor: 27_500,
      commissionMinor: 2_200,
      payoutMinor: 25_300,
    });
  });

  it('adds a buyer fee of 2.5 % on the item only and rounds half up: £85.50 → 213.75 p → 214 p', () => {
    // 8,550 × 250 / 10,000 = 213.75 → 214; commission 8,550 × 7.5 % = 641.25 → 641.
    const a = orderAmounts(8_550, 0, { commissionBps: 750, buyerFeeBps: 250 });
    expect(a.buyerFeeMinor).toBe(214);
    expect(a.totalMinor).toBe(8_764);
    expect(a.commissionMinor).toBe(641);
    expect(a.payoutMinor).toBe(7_909);
  });

  it('rounds exactly half a penny up: 1,250 p × 2 bp = 0.25 p → 0; 2,500 p × 2 bp = 0.5 p → 1', () => {
    expect(shareOf(1_250, 2)).toBe(0);
    expect(shareOf(2_500, 2)).toBe(1);
  });

  it('settles a part refund of £40.00 on a £275.00 order at 8 %: the seller keeps £235.00 less £18.80', () => {
    const a = orderAmounts(24_000, 3_500, { commissionBps: 800, buyerFeeBps: 0 });
    // Kept 27,500 − 4,000 = 23,500 p; commission 23,500 × 8 % = 1,880 p; payout 21,620 p.
    expect(partRefund(a, 4_000, 800)).toEqual({ refundMinor: 4_000, commissionMinor: 1_880, payoutMinor: 21_620 });
    expect(() => partRefund(a, 27_501, 800)).toThrow(RangeError);
  });

  it('splits a £1,234.56 build into a 30 % deposit of £370.37 and a balance of £864.19', () => {
    // 123,456 × 3,000 / 10,000 = 37,036.8 → 37,037.
    expect(depositSplit(123_456, 3_000)).toEqual({ depositMinor: 37_037, balanceMinor: 86_419 });
  });

  it('refuses fractions of a penny and rates outside 0–100 %', () => {
    expect(() => orderAmounts(10.5, 0, { commissionBps: 800, buyerFeeBps: 0 })).toThrow(RangeError);
    expect(() => shareOf(100, 10_001)).toThrow(RangeError);
    expect(() => shareOf(-1, 100)).toThrow(RangeError);
  });

  it('always adds up: total = item + delivery + buyer fee and payout + commission = item + delivery', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 5_000_000 }),
        fc.integer({ min: 0, max: 500_000 }),
        fc.integer({ min: 0, max: 10_000 }),
        fc.integer({ min: 0, max: 10_000 }),
        (item, delivery, commissionBps, buyerFeeBps) => {
          const a = orderAmounts(item, delivery, { commissionBps, buyerFeeBps });
          expect(a.totalMinor).toBe(item + delivery + a.buyerFeeMinor);
          expect(a.payoutMinor + a.commissionMinor).toBe(item + delivery);
          expect(a.payoutMinor).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });
});
