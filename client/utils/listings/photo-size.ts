import { PHOTO_LIMITS } from '@shared/listings/photo-limits';

/**
 * A thumbnail's size from its display size: both are fitted inside a square (320 and 1600 px) from the same
 * original, so they share its shape. Used for `width`/`height` attributes, so the page does not shift as it loads.
 */
export function thumbSize(displayWidth: number, displayHeight: number): { width: number; height: number } {
  const longest = Math.max(displayWidth, displayHeight, 1);
  const scale = Math.min(1, PHOTO_LIMITS.thumbPx / longest);
  return { width: Math.round(displayWidth * scale), height: Math.round(displayHeight * scale) };
}
