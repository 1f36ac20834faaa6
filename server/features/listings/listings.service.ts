import type { AppContext } from '../../app-context';
import { EDITABLE_LISTING_STATES } from '../../../shared/listings/states';
import type { ListingInput, MyListingsQuery } from '../../../shared/schemas/listings';
import type { ListingView, OwnListingView } from '../../../shared/types/listings';
import type { Page } from '../../../shared/types/user';
import { validationFailed } from '../../http/errors';
import { recordAudit } from '../audit/audit.service';
import { photosByListing, photosOfListing } from '../photos/listing-photos.repository';
import { gazetteer } from '../towns/gazetteer';
import type { ListingActor } from './listing-actor';
import { moveListing, refusedEdit } from './listing-lifecycle';
import { resolveLocation } from './listing-location';
import { applyListingInput } from './listing-mapping';
import { assertCanOfferServices, assertCanSee, assertSeller, isModerator, isSeller } from './listing.policy';
import { presentListing, presentOwnListing } from './listing.presenter';
import { findListingWithOwner, latestDecisions, listingsInOrder, lockListing } from './listing.repository';
import { Listing } from './listing.entity';

/** What the seller and moderators see; everyone else gets the public view. */
async function viewFor(ctx: AppContext, viewer: ListingActor | null, listing: Listing): Promise<ListingView> {
  const towns = await gazetteer();
  const photos = await photosOfListing(ctx.dataSource.manager, listing.id);
  if (!isSeller(viewer, listing) && !isModerator(viewer)) return presentListing(listing, towns, photos);
  const decisions = await latestDecisions(ctx.dataSource.manager, [listing.id]);
  return presentOwnListing(listing, towns, photos, decisions.get(listing.id), isModerator(viewer));
}

/** A new listing starts as a draft that only its seller (and moderators) can see. */
export async function createListing(ctx: AppContext, actor: ListingActor, input: ListingInput): Promise<ListingView> {
  if (input.kind === 'service') assertCanOfferServices(actor);
  const { position } = await resolveLocation(input.townId, input.position);
  const id = await ctx.transaction(async (m) => {
    const listing = m.create(Listing, { ownerId: actor.id, state: 'draft', stateChangedAt: new Date() });
    applyListingInput(listing, input, position);
    await m.save(listing);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'listing.created',
      targetType: 'listing',
      targetId: listing.id,
      detail: { kind: listing.kind },
      ip: actor.ip,
    });
    return listing.id;
  });
  return viewFor(ctx, actor, await findListingWithOwner(ctx.dataSource.manager, id));
}

/**
 * Replace a listing's fields. A listed listing whose title, description or price changes goes back to review, so
 * what buyers see has always been checked.
 */
export async function updateListing(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  input: ListingInput,
): Promise<ListingView> {
  const { position } = await resolveLocation(input.townId, input.position);
  await ctx.transaction(async (m) => {
    const listing = await lockListing(m, id);
    assertSeller(actor, listing, listing.owner);
    if (!EDITABLE_LISTING_STATES.includes(listing.state)) throw refusedEdit(listing.state);
    if (input.kind !== listing.kind)
      throw validationFailed({ kind: 'A listing’s kind cannot change; start a new listing instead.' });
    if (input.kind === 'service') assertCanOfferServices(actor);
    const checkedChanged =
      input.title !== listing.title ||
      input.description !== listing.description ||
      (input.kind === 'module' && input.priceMinor !== listing.priceMinor);
    applyListingInput(listing, input, position);
    await m.save(listing);
    if (listing.state === 'listed' && checkedChanged)
      await moveListing(m, listing, 'revise', { id: actor.id, ip: actor.ip, as: 'seller' });
  });
  return viewFor(ctx, actor, await findListingWithOwner(ctx.dataSource.manager, id));
}

/** The seller's own moves: submit for review, or withdraw. */
export async function sellerMove(
  ctx: AppContext,
  actor: ListingActor,
  id: number,
  move: 'submit' | 'withdraw',
): Promise<ListingView> {
  await ctx.transaction(async (m) => {
    const listing = await lockListing(m, id);
    assertSeller(actor, listing, listing.owner);
    if (move === 'submit' && listing.kind === 'service') assertCanOfferServices(actor);
    await moveListing(m, listing, move, { id: actor.id, ip: actor.ip, as: 'seller' });
  });
  return viewFor(ctx, actor, await findListingWithOwner(ctx.dataSource.manager, id));
}

/** One listing, if the viewer may see it (404 otherwise, so hidden listings do not leak). */
export async function getListing(ctx: AppContext, viewer: ListingActor | null, id: number): Promise<ListingView> {
  const listing = await findListingWithOwner(ctx.dataSource.manager, id);
  assertCanSee(viewer, listing, listing.owner);
  return viewFor(ctx, viewer, listing);
}

/** The seller's own listings in every state, most recently changed first. */
export async function myListings(
  ctx: AppContext,
  actor: ListingActor,
  query: MyListingsQuery,
): Promise<Page<OwnListingView>> {
  const m = ctx.dataSource.manager;
  const [rows, total] = await m.getRepository(Listing).findAndCount({
    select: { id: true },
    where: { ownerId: actor.id, ...(query.state ? { state: query.state } : {}) },
    order: { updatedAt: 'DESC', id: 'DESC' },
    skip: (query.page - 1) * query.pageSize,
    take: query.pageSize,
  });
  const listings = await listingsInOrder(
    m,
    rows.map((r) => r.id),
  );
  const ids = listings.map((l) => l.id);
  const [towns, decisions, photos] = await Promise.all([gazetteer(), latestDecisions(m, ids), photosByListing(m, ids)]);
  return {
    items: listings.map((l) => presentOwnListing(l, towns, photos.get(l.id) ?? [], decisions.get(l.id))),
    total,
    page: query.page,
    pageSize: query.pageSize,
  };
}
