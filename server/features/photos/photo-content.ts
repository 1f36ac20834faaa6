/**
 * What an uploaded file is, judged by its first bytes only. The name and the Content-Type the browser sent are
 * chosen by the sender and never consulted (OWASP File Upload Cheat Sheet: validate the file type, don't trust
 * the Content-Type header).
 */
export type PhotoFormat = 'jpeg' | 'png' | 'webp';

/** JPEG: the start-of-image marker FF D8, then FF opening the next marker (ITU-T T.81). */
const JPEG = [0xff, 0xd8, 0xff];
/** PNG: the 8-byte signature (PNG specification, 5.2). */
const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** WebP: a RIFF container whose form type, after the 4-byte size, is WEBP (RFC 9649). */
const RIFF = [0x52, 0x49, 0x46, 0x46];
const WEBP = [0x57, 0x45, 0x42, 0x50];

const startsWith = (bytes: Uint8Array, signature: readonly number[], at = 0) =>
  bytes.length >= at + signature.length && signature.every((b, i) => bytes[at + i] === b);

/** The photo format `bytes` begin with, or null for anything else (text, SVG, GIF, an empty file). */
export function sniffPhotoFormat(bytes: Uint8Array): PhotoFormat | null {
  if (startsWith(bytes, JPEG)) return 'jpeg';
  if (startsWith(bytes, PNG)) return 'png';
  if (startsWith(bytes, RIFF) && startsWith(bytes, WEBP, 8)) return 'webp';
  return null;
}
