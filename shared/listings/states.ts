/**
 * Where a listing is in its life, and the moves between states. The moves are written once, here; the server's
 * lifecycle applies them and refuses anything else, and the client uses them to decide which buttons to show.
 */
export const LISTING_STATES = [
  'draft',
  'awaiting_review',
  'listed',
  'sent_back',
  'reserved',
  'sold',
  'withdrawn',
] as const;
export type ListingState = (typeof LISTING_STATES)[number];

/** Words shown to people for each state. */
export const LISTING_STATE_LABELS: Record<ListingState, string> = {
  draft: 'Draft',
  awaiting_review: 'Awaiting review',
  listed: 'Listed',
  sent_back: 'Sent back for changes',
  reserved: 'Reserved',
  sold: 'Sold',
  withdrawn: 'Withdrawn',
};

/** States anyone may see. The others are shown only to the seller and moderators (everyone else gets 404). */
export const PUBLIC_LISTING_STATES: readonly ListingState[] = ['listed', 'reserved', 'sold'];

/** States in which the seller may still change the listing's fields. */
export const EDITABLE_LISTING_STATES: readonly ListingState[] = ['draft', 'sent_back', 'awaiting_review', 'listed'];

/** Who makes a move: the seller, a moderator, or the orders feature when a buyer pays or an order ends. */
export type ListingMover = 'seller' | 'moderator' | 'orders';

export interface ListingMoveRule {
  from: readonly ListingState[];
  to: ListingState;
  by: ListingMover;
  /** Completes "…cannot be <verb>", e.g. "submitted for review". */
  verb: string;
}

/** The allowed moves. Anything not here is refused with 409. */
export const LISTING_MOVES = {
  /** The seller asks for review. */
  submit: { from: ['draft', 'sent_back'], to: 'awaiting_review', by: 'seller', verb: 'submitted for review' },
  /** The seller changed the title, description or price of a listed listing: it is checked again. */
  revise: { from: ['listed'], to: 'awaiting_review', by: 'seller', verb: 'sent for review again' },
  approve: { from: ['awaiting_review'], to: 'listed', by: 'moderator', verb: 'approved' },
  sendBack: { from: ['awaiting_review', 'listed'], to: 'sent_back', by: 'moderator', verb: 'sent back' },
  /** A buyer has started an order; the board is held for them while they pay and until the order ends. */
  reserve: { from: ['listed'], to: 'reserved', by: 'orders', verb: 'reserved' },
  /** The order was cancelled or refunded before hand-over. */
  release: { from: ['reserved'], to: 'listed', by: 'orders', verb: 'released' },
  sell: { from: ['reserved'], to: 'sold', by: 'orders', verb: 'marked sold' },
  /** Refunded after hand-over: the board is with the buyer or on its way back, so it is not offered again as it was. */
  retire: { from: ['reserved'], to: 'withdrawn', by: 'orders', verb: 'withdrawn after a refund' },
  withdraw: {
    from: ['draft', 'awaiting_review', 'listed', 'sent_back'],
    to: 'withdrawn',
    by: 'seller',
    verb: 'withdrawn',
  },
  /** A moderator withdraws a listing that breaks the rules. */
  takeDown: {
    from: ['draft', 'awaiting_review', 'listed', 'sent_back'],
    to: 'withdrawn',
    by: 'moderator',
    verb: 'withdrawn by a moderator',
  },
} as const satisfies Record<string, ListingMoveRule>;
export type ListingMove = keyof typeof LISTING_MOVES;

/** Whether `move` may start from `state`. */
export const canMove = (state: ListingState, move: ListingMove): boolean =>
  (LISTING_MOVES[move].from as readonly ListingState[]).includes(state);
