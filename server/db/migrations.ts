import { Foundation1764626400000 } from './migrations/1764626400000-foundation';
import { SavedPlans1764713000000 } from './migrations/1764713000000-saved-plans';
import { Listings1764800000000 } from './migrations/1764800000000-listings';
import { ListingPhotos1764900000000 } from './migrations/1764900000000-listing-photos';
import { ListingsDistanceIndex1765000000000 } from './migrations/1765000000000-listings-distance-index';
import { Shortlist1765100000000 } from './migrations/1765100000000-shortlist';
import { SavedSearches1765200000000 } from './migrations/1765200000000-saved-searches';
import { Orders1765800000000 } from './migrations/1765800000000-orders';
import { Conversations1766000000000 } from './migrations/1766000000000-conversations';
import { Quotes1766100000000 } from './migrations/1766100000000-quotes';
import { Reviews1766200000000 } from './migrations/1766200000000-reviews';

/** Every migration in order; listed explicitly so they run the same under tsx, Vitest and a build. */
export const migrations = [
  Foundation1764626400000,
  SavedPlans1764713000000,
  Listings1764800000000,
  ListingPhotos1764900000000,
  ListingsDistanceIndex1765000000000,
  Shortlist1765100000000,
  SavedSearches1765200000000,
  Orders1765800000000,
  Conversations1766000000000,
  Quotes1766100000000,
  Reviews1766200000000,
];
