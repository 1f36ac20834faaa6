import sharp, { type Sharp } from 'sharp';
import { PHOTO_LIMITS } from '../../../shared/listings/photo-limits';
import { AppError } from '../../http/errors';
import { photoErrors } from './photo-errors';
import { sniffPhotoFormat } from './photo-content';

/** One re-encoded size of a photo. */
export interface PhotoVariantImage {
  bytes: Buffer;
  width: number;
  height: number;
  contentType: 'image/jpeg';
}

export interface PhotoVariants {
  thumb: PhotoVariantImage;
  display: PhotoVariantImage;
}

/**
 * Decoding limits for untrusted images: refuse more than `maxPixels` before decoding (a small file can declare
 * 20 000 × 20 000 pixels and expand to gigabytes: a decompression bomb), abort on invalid or truncated pixel data,
 * and give up on a file that takes too long.
 */
const DECODE = { limitInputPixels: PHOTO_LIMITS.maxPixels, failOn: 'error' } as const;
const TIMEOUT = { seconds: 20 };

/**
 * Re-encode into a fresh JPEG: turned upright by its EXIF orientation, transparency on white, fitted inside
 * `box` × `box` without enlarging. Nothing of the original file is copied: sharp writes no EXIF, XMP or IPTC
 * (so no GPS position, camera serial or embedded thumbnail) unless asked to, and colour is converted to sRGB.
 */
async function encode(source: Sharp, box: number, quality: number): Promise<PhotoVariantImage> {
  const { data, info } = await source
    .rotate()
    .flatten({ background: '#ffffff' })
    .resize({ width: box, height: box, fit: 'inside', withoutEnlargement: true })
    .jpeg({ quality, progressive: true })
    .timeout(TIMEOUT)
    .toBuffer({ resolveWithObject: true });
  return { bytes: data, width: info.width, height: info.height, contentType: 'image/jpeg' };
}

/**
 * Check an uploaded file and make the two sizes Benchwright keeps (OWASP File Upload Cheat Sheet: validate the
 * type by content, then rewrite the image so nothing the sender hid in it survives).
 * 415 unless the bytes begin as JPEG, PNG or WebP; 422 when the image is too many pixels or does not decode.
 */
export async function makePhotoVariants(upload: Buffer): Promise<PhotoVariants> {
  const format = sniffPhotoFormat(upload);
  if (!format) throw photoErrors.wrongType();
  const source = sharp(upload, DECODE);
  try {
    const meta = await source.metadata();
    if (meta.format !== format) throw photoErrors.wrongType();
    if (!meta.width || !meta.height || meta.width * meta.height > PHOTO_LIMITS.maxPixels)
      throw photoErrors.unreadable();
    // The original is decoded once; the thumbnail is made from the display size, which is far smaller.
    const display = await encode(source, PHOTO_LIMITS.displayPx, 82);
    const thumb = await encode(sharp(display.bytes, DECODE), PHOTO_LIMITS.thumbPx, 75);
    return { thumb, display };
  } catch (error) {
    if (error instanceof AppError) throw error;
    throw photoErrors.unreadable();
  }
}
