import type { EntityManager } from 'typeorm';
import { notFound } from '../../http/errors';
import type { User } from '../users/user.entity';
import { findUserById } from '../users/user.repository';
import { ListingDecision } from './listing-decision.entity';
import { Listing } from './listing.entity';

/** A listing with its seller, or 404. */
export async function findListingWithOwner(m: EntityManager, id: number): Promise<Listing & { owner: User }> {
  const listing = await m.getRepository(Listing).findOne({ where: { id }, relations: { owner: true } });
  if (!listing?.owner) throw notFound('That listing');
  return listing as Listing & { owner: User };
}

/** A listing held with a row lock until the transaction ends, with its seller, or 404. */
export async function lockListing(m: EntityManager, id: number): Promise<Listing & { owner: User }> {
  const listing = await m.getRepository(Listing).findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
  if (!listing) throw notFound('That listing');
  const owner = await findUserById(m, listing.ownerId);
  if (!owner) throw notFound('That listing');
  listing.owner = owner;
  return listing as Listing & { owner: User };
}

/** Listings in the order of `ids`, with their sellers. */
export async function listingsInOrder(m: EntityManager, ids: number[]): Promise<Listing[]> {
  if (ids.length === 0) return [];
  const rows = await m
    .getRepository(Listing)
    .createQueryBuilder('l')
    .innerJoinAndSelect('l.owner', 'owner')
    .where('l.id IN (:...ids)', { ids })
    .getMany();
  const byId = new Map(rows.map((l) => [l.id, l]));
  return ids.flatMap((id) => byId.get(id) ?? []);
}

/** The latest decision on each of `listingIds`, with its moderator. */
export async function latestDecisions(m: EntityManager, listingIds: number[]): Promise<Map<number, ListingDecision>> {
  if (listingIds.length === 0) return new Map();
  const rows = await m
    .getRepository(ListingDecision)
    .createQueryBuilder('d')
    .leftJoinAndSelect('d.moderator', 'moderator')
    .where('d.listing_id IN (:...ids)', { ids: listingIds })
    .orderBy('d.id', 'ASC')
    .getMany();
  return new Map(rows.map((d) => [d.listingId, d]));
}
