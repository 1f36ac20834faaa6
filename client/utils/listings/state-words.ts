import type { ListingState } from '@shared/listings/states';

/** How each state is said to sellers and moderators, with the badge colour that goes with it. */
export const STATE_WORDS: Record<ListingState, { label: string; tone: 'ok' | 'warn' | 'danger' | 'plain' }> = {
  draft: { label: 'Draft: only you can see it', tone: 'plain' },
  awaiting_review: { label: 'With a moderator', tone: 'warn' },
  listed: { label: 'On show to buyers', tone: 'ok' },
  sent_back: { label: 'Needs changes', tone: 'danger' },
  reserved: { label: 'Held for a buyer', tone: 'warn' },
  sold: { label: 'Sold', tone: 'plain' },
  withdrawn: { label: 'Taken off', tone: 'plain' },
};
