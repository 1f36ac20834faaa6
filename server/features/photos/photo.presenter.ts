import type { PhotoView } from '../../../shared/types/listings';
import type { PhotoVariant } from '../../../shared/listings/photo-limits';
import type { ListingPhoto } from './listing-photo.entity';

/** The address a photo size is served at; the key is unguessable, and the route still checks who may see it. */
export const photoUrl = (storageKey: string, variant: PhotoVariant) => `/api/photos/${storageKey}/${variant}.jpg`;

export function presentPhoto(p: ListingPhoto): PhotoView {
  return {
    id: p.id,
    position: p.position,
    isCover: p.isCover,
    thumbUrl: photoUrl(p.storageKey, 'thumb'),
    displayUrl: photoUrl(p.storageKey, 'display'),
    width: p.width,
    height: p.height,
  };
}

/** In the seller's order. */
export const presentPhotos = (photos: readonly ListingPhoto[]): PhotoView[] =>
  [...photos].sort((a, b) => a.position - b.position).map(presentPhoto);

/** For a listing's page and search results: the cover first, then the rest in the seller's order. */
export const presentGallery = (photos: readonly ListingPhoto[]): PhotoView[] =>
  [...photos].sort((a, b) => Number(b.isCover) - Number(a.isCover) || a.position - b.position).map(presentPhoto);
