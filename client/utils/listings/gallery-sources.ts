import type { PhotoView } from '@shared/types/listings';
import { thumbSize } from './photo-size';

/**
 * The gallery's large photo box: the page's width on a phone, and from 60rem the left column (the page, at most
 * 72rem, less the 22rem side column, the gap and the margins).
 */
export const GALLERY_SIZES = '(min-width: 60rem) calc(min(100vw, 72rem) - 27rem), calc(100vw - 2rem)';

/**
 * Both sizes of a photo as a `srcset`, so a small screen at 1x takes the thumbnail; undefined when the photo is no
 * larger than its thumbnail.
 */
export function gallerySrcset(photo: PhotoView): string | undefined {
  const thumb = thumbSize(photo.width, photo.height);
  if (thumb.width >= photo.width) return undefined;
  return `${photo.thumbUrl} ${thumb.width}w, ${photo.displayUrl} ${photo.width}w`;
}
