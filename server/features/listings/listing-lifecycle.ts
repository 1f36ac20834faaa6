import type { EntityManager } from 'typeorm';
import {
  LISTING_MOVES,
  canMove,
  type ListingMove,
  type ListingMover,
  type ListingState,
} from '../../../shared/listings/states';
import { conflict } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { announceToSavedSearches } from '../saved-searches/saved-search-alerts';
import type { Listing } from './listing.entity';

/** How a state reads after "This listing is …". */
const STATE_PHRASES: Record<ListingState, string> = {
  draft: 'a draft',
  awaiting_review: 'awaiting review',
  listed: 'listed',
  sent_back: 'sent back for changes',
  reserved: 'reserved',
  sold: 'sold',
  withdrawn: 'withdrawn',
};

export interface MoveActor {
  id: number | null;
  ip: string | null;
  as: ListingMover;
  /** The site's address, for links in e-mail; needed by the moves that announce a listing ('approve'). */
  appOrigin?: string;
}

/** The 409 answer for a move the table does not allow from the listing's state. */
export function refusedMove(state: ListingState, move: ListingMove) {
  const rule = LISTING_MOVES[move];
  const from = rule.from.map((s) => STATE_PHRASES[s]).join(' or ');
  return conflict(
    'listing_state',
    `This listing is ${STATE_PHRASES[state]}, so it cannot be ${rule.verb}. That is possible only when it is ${from}.`,
  );
}

/** The 409 answer for an edit of a listing that is reserved, sold or withdrawn. */
export const refusedEdit = (state: ListingState) =>
  conflict('listing_state', `This listing is ${STATE_PHRASES[state]}, so it can no longer be changed.`);

/**
 * Apply one move of the transition table to a listing held with a row lock: refuse it with 409 if the table does
 * not allow it, else change the state, stamp the dates and record who made the move and when in the audit log.
 * Approval is the one move that puts a listing in front of buyers, so it also tells matching saved searches.
 */
export async function moveListing(
  m: EntityManager,
  listing: Listing,
  move: ListingMove,
  actor: MoveActor,
  detail: Record<string, unknown> = {},
): Promise<void> {
  const rule = LISTING_MOVES[move];
  if (rule.by !== actor.as) throw new Error(`listing move ${move} is made by the ${rule.by}, not the ${actor.as}`);
  if (!canMove(listing.state, move)) throw refusedMove(listing.state, move);
  const from = listing.state;
  const now = new Date();
  listing.state = rule.to;
  listing.stateChangedAt = now;
  if (rule.to === 'awaiting_review') listing.submittedAt = now;
  if (rule.to === 'listed') listing.publishedAt ??= now;
  await m.save(listing);
  await recordAudit(m, {
    actorId: actor.id,
    action: `listing.${move}`,
    targetType: 'listing',
    targetId: listing.id,
    detail: { from, to: rule.to, ...detail },
    ip: actor.ip,
  });
  if (move === 'approve') {
    if (!actor.appOrigin) throw new Error('listing move approve needs the site address for its e-mail');
    await announceToSavedSearches(m, listing, actor.appOrigin);
  }
}
