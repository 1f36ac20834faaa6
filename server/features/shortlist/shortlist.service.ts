import type { AppContext } from '../../app-context';
import type { ShortlistItemView } from '../../../shared/types/saved-searches';
import type { ListingActor } from '../listings/listing-actor';
import { assertCanSee, canSee } from '../listings/listing.policy';
import { presentSearchItem } from '../listings/listing.presenter';
import { findListingWithOwner } from '../listings/listing.repository';
import { photosByListing } from '../photos/listing-photos.repository';
import { gazetteer } from '../towns/gazetteer';
import type { User } from '../users/user.entity';
import { ShortlistEntry } from './shortlist-entry.entity';

type Entry = ShortlistEntry & { listing: NonNullable<ShortlistEntry['listing']> & { owner: User } };

/**
 * The member's shortlist, most recently kept first. A listing that has since been hidden from them (withdrawn, sent
 * back, its seller suspended) stays in the table but is left out, and comes back if it is listed again.
 */
export async function listShortlist(ctx: AppContext, actor: ListingActor): Promise<ShortlistItemView[]> {
  const m = ctx.dataSource.manager;
  const entries = (await m
    .getRepository(ShortlistEntry)
    .createQueryBuilder('e')
    .innerJoinAndSelect('e.listing', 'l')
    .innerJoinAndSelect('l.owner', 'owner')
    .where('e.user_id = :user', { user: actor.id })
    .orderBy('e.created_at', 'DESC')
    .addOrderBy('e.id', 'DESC')
    .getMany()) as Entry[];
  const visible = entries.filter((e) => canSee(actor, e.listing, e.listing.owner));
  const [towns, photos] = await Promise.all([
    gazetteer(),
    photosByListing(
      m,
      visible.map((e) => e.listingId),
    ),
  ]);
  return visible.map((e) => ({
    listing: presentSearchItem(e.listing, towns, photos.get(e.listingId) ?? []),
    addedAt: e.createdAt.toISOString(),
  }));
}

/** Keep a listing on the shortlist; keeping it again changes nothing. 404 for a listing hidden from the member. */
export async function addToShortlist(ctx: AppContext, actor: ListingActor, listingId: number): Promise<void> {
  const m = ctx.dataSource.manager;
  const listing = await findListingWithOwner(m, listingId);
  assertCanSee(actor, listing, listing.owner);
  await m
    .createQueryBuilder()
    .insert()
    .into(ShortlistEntry)
    .values({ userId: actor.id, listingId })
    .orIgnore()
    .execute();
}

/** Take a listing off the shortlist; taking off one that is not there changes nothing. */
export async function removeFromShortlist(ctx: AppContext, actor: ListingActor, listingId: number): Promise<void> {
  await ctx.dataSource.getRepository(ShortlistEntry).delete({ userId: actor.id, listingId });
}
