import type { EntityManager } from 'typeorm';
import { ListingPhoto } from './listing-photo.entity';

/** A listing's photos in the seller's order. */
export const photosOfListing = (m: EntityManager, listingId: number): Promise<ListingPhoto[]> =>
  m.getRepository(ListingPhoto).find({ where: { listingId }, order: { position: 'ASC', id: 'ASC' } });

/** The photos of each of `listingIds` (one query), in the seller's order; listings without photos are absent. */
export async function photosByListing(m: EntityManager, listingIds: number[]): Promise<Map<number, ListingPhoto[]>> {
  const byListing = new Map<number, ListingPhoto[]>();
  if (listingIds.length === 0) return byListing;
  const rows = await m
    .getRepository(ListingPhoto)
    .createQueryBuilder('p')
    .where('p.listing_id IN (:...ids)', { ids: listingIds })
    .orderBy('p.listing_id', 'ASC')
    .addOrderBy('p.position', 'ASC')
    .addOrderBy('p.id', 'ASC')
    .getMany();
  for (const row of rows) byListing.set(row.listingId, [...(byListing.get(row.listingId) ?? []), row]);
  return byListing;
}

/** The photo stored under `storageKey`, with its listing and the listing's seller (to decide who may see it). */
export const findPhotoByKey = (m: EntityManager, storageKey: string) =>
  m.getRepository(ListingPhoto).findOne({
    where: { storageKey },
    relations: { listing: { owner: true } },
  });

/**
 * Number the photos 1, 2, 3… in the given order, and keep exactly one cover: the one marked, else the first.
 * Runs in the caller's transaction, under the listing's row lock.
 */
export async function arrangePhotos(m: EntityManager, ordered: ListingPhoto[]): Promise<ListingPhoto[]> {
  const cover = ordered.find((p) => p.isCover) ?? ordered[0];
  ordered.forEach((p, i) => {
    p.position = i + 1;
    p.isCover = p === cover;
  });
  return ordered.length ? m.getRepository(ListingPhoto).save(ordered) : ordered;
}
