/**
 * Where an order is in its life, and the moves between states. The moves are written once, here; the server's
 * order lifecycle applies them and refuses anything else with 409, and the client uses them to choose buttons.
 *
 * A module order: awaiting_payment → paid_held → sent | ready_to_collect → received → paid_out.
 * A build order (an accepted quote) starts with a deposit: awaiting_deposit → in_build → awaiting_balance →
 * paid_held, then continues as a module order does.
 */
export const ORDER_STATES = [
  'awaiting_payment',
  'awaiting_deposit',
  'in_build',
  'awaiting_balance',
  'paid_held',
  'sent',
  'ready_to_collect',
  'received',
  'paid_out',
  'problem_raised',
  'cancelled',
  'refunded',
  'lapsed',
] as const;
export type OrderState = (typeof ORDER_STATES)[number];

export const ORDER_KINDS = ['module', 'build'] as const;
export type OrderKind = (typeof ORDER_KINDS)[number];

/** Words shown to people for each state. */
export const ORDER_STATE_LABELS: Record<OrderState, string> = {
  awaiting_payment: 'Waiting for payment',
  awaiting_deposit: 'Waiting for the deposit',
  in_build: 'Being built',
  awaiting_balance: 'Built: waiting for the balance',
  paid_held: 'Paid: money held by Benchwright',
  sent: 'On its way',
  ready_to_collect: 'Ready to collect',
  received: 'Received: payout due',
  paid_out: 'Paid out to the seller',
  problem_raised: 'Problem raised: with a moderator',
  cancelled: 'Cancelled and refunded',
  refunded: 'Refunded after a problem',
  lapsed: 'Lapsed: not paid in time',
};

/** States in which money is held by the platform for the order (counted as "held" on balances). */
export const HELD_STATES: readonly OrderState[] = [
  'in_build',
  'awaiting_balance',
  'paid_held',
  'sent',
  'ready_to_collect',
  'problem_raised',
];

/** States after which nothing more happens. */
export const FINAL_STATES: readonly OrderState[] = ['paid_out', 'cancelled', 'refunded', 'lapsed'];

/** Who makes a move: the buyer, the seller (or builder), a moderator, the payment provider's events, or a timer. */
export type OrderMover = 'buyer' | 'seller' | 'moderator' | 'payments' | 'system';

export interface OrderMoveRule {
  from: readonly OrderState[];
  to: OrderState;
  by: readonly OrderMover[];
  /** Completes "…cannot be <verb>", e.g. "marked as sent". */
  verb: string;
}

/** Before hand-over, while money is held: an order can still be cancelled with a full refund. */
const CANCELLABLE: readonly OrderState[] = ['in_build', 'awaiting_balance', 'paid_held'];

/** The allowed moves. Anything not here is refused with 409. */
export const ORDER_MOVES = {
  /** A verified payment event: the full price is paid and held. */
  pay: { from: ['awaiting_payment'], to: 'paid_held', by: ['payments'], verb: 'marked as paid' },
  /** A verified payment event for a build order's deposit. */
  payDeposit: { from: ['awaiting_deposit'], to: 'in_build', by: ['payments'], verb: 'marked as deposit paid' },
  /** The builder has finished; the buyer is asked for the balance. */
  finishBuild: { from: ['in_build'], to: 'awaiting_balance', by: ['seller'], verb: 'marked as built' },
  /** A verified payment event for a build order's balance. */
  payBalance: { from: ['awaiting_balance'], to: 'paid_held', by: ['payments'], verb: 'marked as balance paid' },
  /** Not paid before the reservation ran out, or the buyer gave up before paying. */
  lapse: {
    from: ['awaiting_payment', 'awaiting_deposit'],
    to: 'lapsed',
    by: ['system', 'buyer'],
    verb: 'closed as unpaid',
  },
  send: { from: ['paid_held'], to: 'sent', by: ['seller'], verb: 'marked as sent' },
  offerCollection: { from: ['paid_held'], to: 'ready_to_collect', by: ['seller'], verb: 'marked ready to collect' },
  /** The buyer confirms it arrived as described. */
  confirmReceipt: { from: ['sent', 'ready_to_collect'], to: 'received', by: ['buyer'], verb: 'confirmed as received' },
  /** No problem raised within the confirmation period after hand-over. */
  autoConfirm: { from: ['sent', 'ready_to_collect'], to: 'received', by: ['system'], verb: 'confirmed automatically' },
  /** The seller's share has been transferred to their payout account. */
  payOut: { from: ['received'], to: 'paid_out', by: ['system'], verb: 'paid out' },
  /** Before hand-over either side may cancel; the buyer gets everything back. */
  cancel: { from: CANCELLABLE, to: 'cancelled', by: ['buyer', 'seller'], verb: 'cancelled' },
  raiseProblem: {
    from: [...CANCELLABLE, 'sent', 'ready_to_collect'],
    to: 'problem_raised',
    by: ['buyer', 'seller'],
    verb: 'reported as a problem',
  },
  /** A moderator settles: the buyer gets everything back. */
  settleRefund: { from: ['problem_raised'], to: 'refunded', by: ['moderator'], verb: 'settled with a full refund' },
  /** A moderator settles: part goes back to the buyer, the rest is due to the seller. */
  settlePartRefund: {
    from: ['problem_raised'],
    to: 'received',
    by: ['moderator'],
    verb: 'settled with a part refund',
  },
  /** A moderator settles: the money is due to the seller. */
  settleRelease: {
    from: ['problem_raised'],
    to: 'received',
    by: ['moderator'],
    verb: 'settled in the seller’s favour',
  },
} as const satisfies Record<string, OrderMoveRule>;
export type OrderMove = keyof typeof ORDER_MOVES;

/** Whether `move` may start from `state`. */
export const canMoveOrder = (state: OrderState, move: OrderMove): boolean =>
  (ORDER_MOVES[move].from as readonly OrderState[]).includes(state);

/** The moves `mover` could make from `state` (for choosing which buttons to show). */
export const movesFrom = (state: OrderState, mover: OrderMover): OrderMove[] =>
  (Object.keys(ORDER_MOVES) as OrderMove[]).filter(
    (move) => canMoveOrder(state, move) && (ORDER_MOVES[move].by as readonly OrderMover[]).includes(mover),
  );

/** How a module reaches its buyer. Build orders use the same choices for the finished boards. */
export const HANDOVER_METHODS = ['collection', 'seller_delivery', 'parcel', 'pallet'] as const;
export type HandoverMethod = (typeof HANDOVER_METHODS)[number];

export const HANDOVER_LABELS: Record<HandoverMethod, string> = {
  collection: 'Collect it from the seller',
  seller_delivery: 'The seller delivers it',
  parcel: 'Parcel courier',
  pallet: 'Pallet courier',
};

/** Whether the buyer must give an address (everything but collection). */
export const needsAddress = (method: HandoverMethod): boolean => method !== 'collection';
