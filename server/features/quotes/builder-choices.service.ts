import type { EntityManager } from 'typeorm';
import { haversineKm } from '../../../shared/geo';
import type { BuilderChoice } from '../../../shared/types/quotes';
import type { AppContext } from '../../app-context';
import { validationFailed } from '../../http/errors';
import { Listing } from '../listings/listing.entity';
import { gazetteer, type Town } from '../towns/gazetteer';
import { builderNames, depositRates } from './quote-records';
import { deliveryKmFor } from '../../../shared/quotes/quote-pricing';

/** How many builders the choice offers, nearest first: more than reach any one town in practice. */
const MAX_CHOICES = 200;

/** The town the boards are for, or a 422 on `field`. */
export async function townFor(townId: number, field = 'townId'): Promise<Town> {
  const town = (await gazetteer()).find(townId);
  if (!town) throw validationFailed({ [field]: 'Choose the town the boards are for from the list.' });
  return town;
}

/** Listed build services of unsuspended builders (not `exceptOwner`) whose service area reaches `town`. */
export async function servicesReaching(
  m: EntityManager,
  town: Town,
  exceptOwner: number | null,
  onlyIds?: readonly number[],
): Promise<{ listing: Listing; distanceKm: number }[]> {
  const query = m
    .getRepository(Listing)
    .createQueryBuilder('l')
    .innerJoin('l.owner', 'u')
    .where("l.kind = 'service' AND l.state = 'listed' AND u.suspended_at IS NULL");
  if (exceptOwner !== null) query.andWhere('l.owner_id <> :exceptOwner', { exceptOwner });
  if (onlyIds) query.andWhere('l.id IN (:...onlyIds)', { onlyIds: onlyIds.length ? onlyIds : [0] });
  const listings = await query.getMany();
  return listings
    .map((listing) => ({
      listing,
      distanceKm: deliveryKmFor(haversineKm(town, { lat: listing.latitude, lon: listing.longitude })),
    }))
    .filter((s) => s.distanceKm <= (s.listing.serviceAreaKm ?? 0))
    .sort((a, b) => a.distanceKm - b.distanceKm || a.listing.id - b.listing.id);
}

/** GET /api/quotes/builders?town=…: builders a buyer in `townId` can ask, nearest first. */
export async function builderChoices(ctx: AppContext, actorId: number, townId: number): Promise<BuilderChoice[]> {
  const m = ctx.dataSource.manager;
  const town = await townFor(townId, 'town');
  const found = (await servicesReaching(m, town, actorId)).slice(0, MAX_CHOICES);
  const owners = found.map((s) => s.listing.ownerId);
  const [names, deposits, towns] = await Promise.all([builderNames(m, owners), depositRates(m, owners), gazetteer()]);
  return found.map(({ listing, distanceKm }) => ({
    listingId: listing.id,
    title: listing.title,
    builder: names.get(listing.ownerId)!,
    townName: towns.find(listing.townId)?.name ?? 'Unknown town',
    distanceKm,
    serviceAreaKm: listing.serviceAreaKm ?? 0,
    leadTimeWeeks: listing.leadTimeWeeks ?? 0,
    depositBps: deposits.get(listing.ownerId)!,
  }));
}
