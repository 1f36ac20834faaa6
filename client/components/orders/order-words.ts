import type { OrderMover, OrderState } from '@shared/orders/states';
import type { OrderHistoryEntry, OrderView } from '@shared/types/orders';

/** What each history entry says happened, in our words. */
const MOVE_WORDS: Record<string, string> = {
  create: 'Order started',
  pay: 'Paid; money held by Benchwright',
  payDeposit: 'Deposit paid',
  finishBuild: 'Marked as built',
  payBalance: 'Balance paid',
  lapse: 'Closed unpaid',
  send: 'Marked as sent',
  offerCollection: 'Ready to collect',
  confirmReceipt: 'Receipt confirmed',
  autoConfirm: 'Receipt confirmed automatically',
  payOut: 'Payout sent to the seller',
  cancel: 'Cancelled; everything refunded',
  raiseProblem: 'Problem raised',
  settleRefund: 'Settled with a full refund',
  settlePartRefund: 'Settled with a part refund',
  settleRelease: 'Settled in the seller’s favour',
  stage: 'Build stage reached',
};

export const moveWords = (move: string) => MOVE_WORDS[move] ?? move;

const MOVER_WORDS: Record<OrderMover, string> = {
  buyer: 'the buyer',
  seller: 'the seller',
  moderator: 'a moderator',
  payments: 'the card payment',
  system: 'Benchwright',
};

/** Who made a history entry: the person's name, or what acted. */
export const byWords = (entry: OrderHistoryEntry) => entry.byName ?? MOVER_WORDS[entry.by];

/** One station of the progress line. */
export interface ProgressStop {
  label: string;
  /** reached: done; current: where the order stands; ahead: not yet. */
  status: 'reached' | 'current' | 'ahead';
}

/** The stops of an order's journey, with how far it has come; a build order starts with its deposit and build. */
export function progressStops(order: OrderView): ProgressStop[] {
  const labels = [
    ...(order.kind === 'build' ? ['Deposit paid', 'Built'] : []),
    'Paid, money held',
    order.handover === 'collection' ? 'Ready to collect' : 'Sent',
    'Received',
    'Seller paid',
  ];
  const offset = order.kind === 'build' ? 2 : 0;
  const reachedAt: Partial<Record<OrderState, number>> = {
    in_build: 0,
    awaiting_balance: 1,
    paid_held: offset,
    sent: offset + 1,
    ready_to_collect: offset + 1,
    received: offset + 2,
    paid_out: offset + 3,
  };
  let index = reachedAt[order.state];
  if (order.state === 'problem_raised') index = order.handedOverAt ? offset + 1 : offset;
  if (index === undefined) index = -1;
  return labels.map((label, i) => ({
    label,
    status: i < index ? 'reached' : i === index ? (order.state === 'paid_out' ? 'reached' : 'current') : 'ahead',
  }));
}

/** States in which the journey stopped or paused, with a line saying why. */
export function interruption(order: OrderView): string | null {
  const when = order.state === 'problem_raised' ? 'A moderator is looking at the problem; the money stays held.' : null;
  if (when) return when;
  if (order.state === 'cancelled')
    return 'Cancelled before hand-over. Everything the buyer paid goes back to their card.';
  if (order.state === 'refunded') return 'Settled with a full refund to the buyer’s card.';
  if (order.state === 'lapsed') return 'Not paid in time; the module was offered to others again.';
  return null;
}

/** The percentage of a rate in basis points, with two decimals: 800 → "8.00 %". */
export const percent = (bps: number) => `${(bps / 100).toFixed(2)}\u00a0%`;

/** A sentence on what happens next, for the viewer's side. */
export function nextStep(order: OrderView, formatDate: (iso: string | null) => string): string {
  const seller = order.viewerRole === 'seller';
  const by = formatDate(order.confirmBy);
  switch (order.state) {
    case 'paid_held':
      return seller
        ? 'Paid, and held by Benchwright. Send the module, or tell the buyer it is ready to collect.'
        : 'Paid. Benchwright holds your money until you confirm the module arrived as described.';
    case 'sent':
    case 'ready_to_collect':
      return seller
        ? `Waiting for the buyer to confirm receipt; if they raise no problem, it is confirmed automatically on ${by}.`
        : `When you have it, check it and confirm it arrived as described, or report a problem, by ${by}. After that receipt is confirmed automatically.`;
    case 'received':
      return seller
        ? 'Receipt confirmed. Your payout is transferred as soon as your payout account is connected and ready.'
        : 'Receipt confirmed. Thank you; the seller is being paid.';
    case 'paid_out':
      return seller ? 'Your payout has been transferred.' : 'All done: the seller has been paid.';
    case 'awaiting_payment':
    case 'awaiting_deposit':
    case 'awaiting_balance':
      return seller ? 'Waiting for the buyer’s payment.' : 'Waiting for your payment.';
    default:
      return '';
  }
}
