import type { RouteLocation } from 'vue-router';
import { getListing, searchListings } from '@/api/listings';
import { listingKey, searchKey, startEarly } from '@/api/early';
import { GALLERY_SIZES, gallerySrcset } from '@/utils/listings/gallery-sources';
import { apiQueryFromFilters, filtersFromQuery } from '@/utils/listings/search-filters';

/**
 * Fetch the photo the page will show largest as soon as its address is known, first among the images, rather than
 * once the page's code has loaded and drawn it. The `srcset` and `sizes` are the ones the page's <img> uses, so the
 * browser reuses this download instead of choosing again.
 */
function preloadImage(href: string, srcset?: string, sizes?: string): void {
  const link = document.createElement('link');
  link.rel = 'preload';
  link.as = 'image';
  link.fetchPriority = 'high';
  if (srcset && sizes) {
    link.imageSrcset = srcset;
    link.imageSizes = sizes;
  }
  link.href = href;
  document.head.append(link);
}

/**
 * Ask for the data of the page the visitor opened (the search, a listing) at once, while the page's own code is
 * still loading; the page takes the answer from `takeEarly`. When it arrives, the first photo the page will show is
 * fetched too. Pages not named here load their data themselves.
 */
export function startFirstPageData(to: Pick<RouteLocation, 'name' | 'params' | 'query'>): void {
  if (to.name === 'search') {
    const query = apiQueryFromFilters(filtersFromQuery(to.query));
    startEarly(searchKey(query), async () => {
      const found = await searchListings(query);
      const cover = found.items[0]?.coverThumbUrl;
      if (cover) preloadImage(cover);
      return found;
    });
  } else if (to.name === 'listing') {
    const id = Number(to.params.id);
    if (!Number.isInteger(id) || id <= 0) return;
    startEarly(listingKey(id), async () => {
      const found = await getListing(id);
      const photo = found.photos[0];
      if (photo) preloadImage(photo.displayUrl, gallerySrcset(photo), GALLERY_SIZES);
      return found;
    });
  }
}
