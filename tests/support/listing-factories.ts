import type { DataSource } from 'typeorm';
import type { AppContext } from '../../server/app-context';
import { Listing } from '../../server/features/listings/listing.entity';
import type { ListingActor } from '../../server/features/listings/listing-actor';
import { resolveLocation } from '../../server/features/listings/listing-location';
import { applyListingInput } from '../../server/features/listings/listing-mapping';
import { sellerMove } from '../../server/features/listings/listings.service';
import { addListingPhoto } from '../../server/features/photos/listing-photos.service';
import { approveListing } from '../../server/features/listings/moderation.service';
import type { User } from '../../server/features/users/user.entity';
import { listingInputSchema, type ListingInput } from '../../shared/schemas/listings';
import { moduleBody, serviceBody, type ModuleBody, type ServiceBody } from './listing-bodies';
import { jpegPhoto } from './photo-fixtures';

export { TOWNS, moduleBody, serviceBody } from './listing-bodies';

/**
 * Insert a draft listing for `owner` directly (arrange step). The body is checked by the shared schema, so a
 * factory listing is always one the API would accept.
 */
export async function buildListing(
  dataSource: DataSource,
  owner: User,
  overrides: Partial<ModuleBody> | Partial<ServiceBody> = {},
): Promise<Listing> {
  const body =
    (overrides as Partial<ServiceBody>).kind === 'service'
      ? serviceBody(overrides as Partial<ServiceBody>)
      : moduleBody(overrides as Partial<ModuleBody>);
  const input: ListingInput = listingInputSchema.parse(body);
  const { position } = await resolveLocation(input.townId, input.position);
  const repo = dataSource.getRepository(Listing);
  const listing = repo.create({ ownerId: owner.id, state: 'draft', stateChangedAt: new Date() });
  applyListingInput(listing, input, position);
  return repo.save(listing);
}

const actorFor = (user: User): ListingActor => ({ id: user.id, role: user.role, ip: '127.0.0.1' });

let smallPhoto: Promise<Buffer> | null = null;

/** Upload a small photo to a listing as its seller, through the service (so it is stored like any other). */
export async function addPhoto(ctx: AppContext, listing: Listing, owner: User) {
  smallPhoto ??= jpegPhoto({ width: 160, height: 120 });
  return addListingPhoto(ctx, actorFor(owner), listing.id, await smallPhoto);
}

/** Give a listing a photo, submit it as its seller, then approve it as `moderator`, through the services. */
export async function publishListing(ctx: AppContext, listing: Listing, owner: User, moderator: User): Promise<void> {
  await addPhoto(ctx, listing, owner);
  await sellerMove(ctx, actorFor(owner), listing.id, 'submit');
  await approveListing(ctx, actorFor(moderator), listing.id, {
    checklist: { photosShowItem: true, plausiblePrice: true, nothingProhibited: true, noContactDetails: true },
  });
}

/** Build and publish in one step. */
export async function buildListedListing(
  ctx: AppContext,
  owner: User,
  moderator: User,
  overrides: Partial<ModuleBody> | Partial<ServiceBody> = {},
): Promise<Listing> {
  const listing = await buildListing(ctx.dataSource, owner, overrides);
  await publishListing(ctx, listing, owner, moderator);
  return listing;
}
