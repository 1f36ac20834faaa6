import type { EntityManager } from 'typeorm';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import type { Listing } from '../listings/listing.entity';
import { gazetteer } from '../towns/gazetteer';
import type { User } from '../users/user.entity';
import { SavedSearchHit } from './saved-search-hit.entity';
import { SavedSearch } from './saved-search.entity';
import { savedSearchMatches } from './saved-search-match';

/**
 * A listing has just been listed: e-mail each member whose saved search it matches, in the caller's transaction.
 * The seller's own searches are skipped, and a search announces a listing only once (the hit's key makes sure),
 * even when the listing is revised and approved again.
 */
export async function announceToSavedSearches(m: EntityManager, listing: Listing, appOrigin: string): Promise<void> {
  const searches = (await m
    .getRepository(SavedSearch)
    .createQueryBuilder('s')
    .innerJoinAndSelect('s.owner', 'owner')
    .where('s.owner_id <> :seller', { seller: listing.ownerId })
    .andWhere('owner.suspended_at IS NULL')
    .andWhere(
      'NOT EXISTS (SELECT 1 FROM saved_search_hits h WHERE h.saved_search_id = s.id AND h.listing_id = :listing)',
      { listing: listing.id },
    )
    .orderBy('s.id', 'ASC')
    .getMany()) as (SavedSearch & { owner: User })[];
  if (searches.length === 0) return;
  const towns = await gazetteer();
  const url = `${appOrigin}/listings/${listing.id}`;
  const now = new Date();
  for (const search of searches) {
    if (!(await savedSearchMatches(m, towns, search.query, listing.id))) continue;
    await m.insert(SavedSearchHit, { savedSearchId: search.id, listingId: listing.id });
    await m.update(SavedSearch, { id: search.id }, { lastNotifiedAt: now });
    const { owner } = search;
    await enqueueEmail(
      m,
      owner.email,
      mailTemplates.savedSearchMatch(owner.displayName, search.name, listing.title, url),
    );
  }
}
