/**
 * Limits on listing photos, stated to sellers before they upload and enforced by the server. The client may check
 * size and count early for a quicker answer; the server judges every file by its content, whatever the browser says.
 */
export const PHOTO_LIMITS = {
  perListing: 12,
  /** Bytes of one uploaded file. */
  maxBytes: 10 * 1024 * 1024,
  /** Width × height of one uploaded image: larger ones are refused before they are decoded. */
  maxPixels: 40_000_000,
  /** The thumbnail fits a square of this many pixels; the display size one of `displayPx`. */
  thumbPx: 320,
  displayPx: 1600,
} as const;

/** The types accepted, as the file picker's `accept` list. */
export const PHOTO_ACCEPT = 'image/jpeg,image/png,image/webp';

/** The two sizes kept of every photo; the uploaded file itself is never kept. */
export const PHOTO_VARIANTS = ['thumb', 'display'] as const;
export type PhotoVariant = (typeof PHOTO_VARIANTS)[number];

/** What the server answers for each refused upload, so the client can show the same words beside the file. */
export const PHOTO_MESSAGES = {
  tooLarge: 'Photos must be 10 MB or smaller. Resize or compress this one and try again.',
  wrongType: 'Only JPEG, PNG or WebP photos are accepted. Save this one in one of those formats and try again.',
  unreadable:
    'This image is too large in pixels or damaged. Photos may be up to 40 megapixels; export it again and retry.',
  limit: 'A listing can have at most 12 photos. Delete one before adding another.',
  missing: 'Choose a photo to upload, sent as the form field "photo".',
  oneFile: 'Send one photo per upload, in the form field "photo", with no other fields.',
  storageDown: 'Photo storage is unavailable; nothing was saved — try again in a few minutes.',
  storageUnreadable: 'Photos cannot be shown just now. Try again in a few minutes.',
} as const;
