import { z } from 'zod';
import { minorUnits, pageField, plainTextField } from './listing-fields';

/** Schemas for what happens to an order after it is paid: hand-over, problems, settling, fees and lists. */

export const PROBLEM_REASON_MIN = 10;
export const NOTE_MAX = 2000;

/** POST /api/orders/:id/problem: what went wrong, in the person's words (a moderator reads it). */
export const raiseProblemSchema = z.strictObject({
  reason: plainTextField('description of the problem', PROBLEM_REASON_MIN, NOTE_MAX),
});
export type RaiseProblemInput = z.infer<typeof raiseProblemSchema>;

/** POST /api/orders/:id/cancel: an optional word to the other side. */
export const cancelOrderSchema = z.strictObject({
  reason: plainTextField('reason', 0, NOTE_MAX).optional(),
});
export type CancelOrderInput = z.infer<typeof cancelOrderSchema>;

/** POST /api/orders/:id/send and /offer-collection: an optional note (a tracking number, where to collect). */
export const handOverSchema = z.strictObject({
  note: plainTextField('note', 0, 500).optional(),
});
export type HandOverInput = z.infer<typeof handOverSchema>;

export const SETTLE_OUTCOMES = ['refund', 'part_refund', 'release'] as const;
export type SettleOutcome = (typeof SETTLE_OUTCOMES)[number];

/** POST /api/order-problems/:id/settle: a moderator's decision, with a note both sides read. */
export const settleProblemSchema = z
  .strictObject({
    outcome: z.enum(SETTLE_OUTCOMES, { error: 'Choose a full refund, a part refund or release to the seller.' }),
    note: plainTextField('note to both sides', 5, NOTE_MAX),
    /** Only for a part refund: how much goes back to the buyer (at most item + delivery). */
    refundMinor: minorUnits('part refund', 1, 100_000_000).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.outcome === 'part_refund' && v.refundMinor === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['refundMinor'],
        message: 'Give the amount to refund for a part refund.',
      });
    if (v.outcome !== 'part_refund' && v.refundMinor !== undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['refundMinor'],
        message: 'An amount is given only for a part refund.',
      });
  });
export type SettleProblemInput = z.infer<typeof settleProblemSchema>;

/** The highest rate an administrator may set, in basis points (30 %). */
export const MAX_FEE_BPS = 3000;

const basisPoints = (what: string) =>
  z
    .number({ error: `Enter the ${what} in basis points, e.g. 800 for 8 %.` })
    .int({ error: `Give the ${what} as a whole number of basis points (1 bp = 0.01 %).` })
    .min(0, { error: `The ${what} cannot be negative.` })
    .max(MAX_FEE_BPS, { error: `The ${what} must be at most ${MAX_FEE_BPS} basis points (30 %).` });

/** PUT /api/admin/fees: the rates for orders made from now on. */
export const feeRatesSchema = z.strictObject({
  commissionBps: basisPoints('commission'),
  buyerFeeBps: basisPoints("buyer's fee"),
});
export type FeeRatesInput = z.infer<typeof feeRatesSchema>;

export const ORDER_SIDES = ['buying', 'selling'] as const;
export type OrderSide = (typeof ORDER_SIDES)[number];

/** GET /api/orders: the signed-in person's purchases or sales, newest first. */
export const ordersListQuerySchema = z.strictObject({
  side: z.enum(ORDER_SIDES, { error: 'Choose buying or selling.' }).default('buying'),
  page: pageField,
});
export type OrdersListQuery = z.infer<typeof ordersListQuerySchema>;

/** A percentage typed by a person ("8", "8.5", "8.25") as whole basis points, checked like the server's rates. */
const percentAsBps = (what: string) =>
  z
    .string({ error: `Give the ${what} as a percentage, e.g. 8 or 8.25.` })
    .trim()
    .regex(/^\d{1,3}(\.\d{1,2})?$/, { error: `Give the ${what} as a percentage with at most two decimals, e.g. 8.25.` })
    .transform((v) => Math.round(Number(v) * 100))
    .pipe(basisPoints(what));

/** The administrator's fee form: percentages in, basis points out (the body of PUT /api/admin/fees). */
export const feeRatesFormSchema = z
  .object({ commission: percentAsBps('commission'), buyerFee: percentAsBps("buyer's fee") })
  .transform((v): FeeRatesInput => ({ commissionBps: v.commission, buyerFeeBps: v.buyerFee }));

const settleNote = plainTextField('note to both sides', 5, NOTE_MAX);

/**
 * The moderator's settle form: the outcome, a note, and for a part refund an amount in pounds (at most
 * `maxMinor`, the item and delivery), out as the body of POST /api/order-problems/:id/settle.
 */
export const settleFormSchema = (maxMinor: number) =>
  z
    .object({ outcome: z.string(), note: z.string(), refund: z.string() })
    .superRefine((v, ctx) => {
      if (!(SETTLE_OUTCOMES as readonly string[]).includes(v.outcome))
        ctx.addIssue({ code: 'custom', path: ['outcome'], message: 'Choose how the problem is settled.' });
      const note = settleNote.safeParse(v.note);
      if (!note.success) ctx.addIssue({ code: 'custom', path: ['note'], message: note.error.issues[0]!.message });
      if (v.outcome !== 'part_refund') return;
      const amount = v.refund.trim();
      if (!/^\d{1,7}(\.\d{1,2})?$/.test(amount) || Number(amount) <= 0)
        ctx.addIssue({
          code: 'custom',
          path: ['refund'],
          message: 'Give the amount to refund in pounds, e.g. 50 or 49.99.',
        });
      else if (Math.round(Number(amount) * 100) > maxMinor)
        ctx.addIssue({
          code: 'custom',
          path: ['refund'],
          message: `A part refund can be at most ${(maxMinor / 100).toFixed(2)}, the item and delivery together.`,
        });
    })
    .transform((v): SettleProblemInput => ({
      outcome: v.outcome as SettleOutcome,
      note: settleNote.parse(v.note),
      ...(v.outcome === 'part_refund' ? { refundMinor: Math.round(Number(v.refund.trim()) * 100) } : {}),
    }));
