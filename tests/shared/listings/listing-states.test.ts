import { describe, expect, it } from 'vitest';
import { LISTING_MOVES, LISTING_STATES, canMove, type ListingMove } from '../../../shared/listings/states';

/** The lifecycle as the product describes it, written out state by state. */
const ALLOWED: Record<ListingMove, string[]> = {
  submit: ['draft', 'sent_back'],
  revise: ['listed'],
  approve: ['awaiting_review'],
  sendBack: ['awaiting_review', 'listed'],
  reserve: ['listed'],
  release: ['reserved'],
  sell: ['reserved'],
  retire: ['reserved'],
  withdraw: ['draft', 'awaiting_review', 'listed', 'sent_back'],
  takeDown: ['draft', 'awaiting_review', 'listed', 'sent_back'],
};

describe('listing moves', () => {
  for (const move of Object.keys(LISTING_MOVES) as ListingMove[]) {
    it(`allows "${move}" only from ${ALLOWED[move].join(', ')}`, () => {
      for (const state of LISTING_STATES)
        expect(canMove(state, move), `${move} from ${state}`).toBe(ALLOWED[move].includes(state));
    });
  }

  it('lets nothing out of sold or withdrawn', () => {
    for (const move of Object.keys(LISTING_MOVES) as ListingMove[]) {
      expect(canMove('sold', move)).toBe(false);
      expect(canMove('withdrawn', move)).toBe(false);
    }
  });
});
