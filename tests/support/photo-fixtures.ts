import { crc32, deflateSync } from 'node:zlib';
import sharp from 'sharp';

/**
 * Images for the photo tests, drawn by sharp at run time (no binary files in the repository), and the files an
 * upload must refuse.
 */

interface Drawn {
  width?: number;
  height?: number;
  colour?: string;
}

const canvas = ({ width = 640, height = 480, colour = '#6b8e23' }: Drawn, channels: 3 | 4 = 3) =>
  sharp({ create: { width, height, channels, background: colour } });

/** Latitude and longitude of a spot near Crewe, as EXIF rationals, so a test can prove they are gone. */
const GPS = {
  GPSLatitudeRef: 'N',
  GPSLatitude: '53/1 5/1 42/1',
  GPSLongitudeRef: 'W',
  GPSLongitude: '2/1 26/1 24/1',
};

/** A JPEG as a phone writes it: with a camera make, a GPS position and (optionally) an orientation tag. */
export const jpegPhoto = (drawn: Drawn & { orientation?: number } = {}) =>
  canvas(drawn)
    .jpeg({ quality: 90 })
    .withExif({ IFD0: { Make: 'Benchwright test camera' }, IFD3: GPS })
    .withMetadata(drawn.orientation ? { orientation: drawn.orientation } : {})
    .toBuffer();

/** A PNG with transparency. */
export const pngPhoto = (drawn: Drawn = {}) => canvas(drawn, 4).png().toBuffer();

export const webpPhoto = (drawn: Drawn = {}) => canvas(drawn).webp().toBuffer();

/** A GIF: a real image, but not a format Benchwright accepts. */
export const gifImage = () => canvas({ width: 40, height: 40 }).gif().toBuffer();

/**
 * Whether EXIF data holds a GPS sub-directory: the GPS Info IFD Pointer, tag 0x8825 (EXIF 2.32), written in the
 * byte order the TIFF header names ("II" little-endian, "MM" big-endian).
 */
export function hasGpsTag(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  const littleEndian = exif.includes(Buffer.from('II*\0', 'latin1'));
  return exif.includes(Buffer.from(littleEndian ? [0x25, 0x88] : [0x88, 0x25]));
}

function pngChunk(type: string, data: Buffer): Buffer {
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/**
 * A decompression bomb: a valid PNG of about 50 KB that declares 20 000 × 20 000 pixels (400 megapixels). Built by
 * hand (PNG specification, 11.2.2 IHDR) as a 1-bit greyscale image whose rows are all zero, so the compressed data
 * stays tiny while a decoder would need hundreds of megabytes to expand it. sharp cannot draw it quickly itself:
 * creating a 400-megapixel canvas means encoding every pixel.
 */
export function pixelBomb(side = 20_000): Buffer {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(side, 0);
  header.writeUInt32BE(side, 4);
  header[8] = 1; // bit depth
  header[9] = 0; // greyscale; compression, filter and interlace stay 0
  const rows = Buffer.alloc(side * (1 + Math.ceil(side / 8))); // each row: filter byte 0, then the pixels
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk('IHDR', header),
    pngChunk('IDAT', deflateSync(rows, { level: 9 })),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Files an upload must refuse, each with how it is sent (a name and a type chosen to look like a photo). */
export const badFiles = {
  textRenamedJpg: {
    bytes: Buffer.from('Baseboard cutting list: 2 × 44 × 18 mm PAR, 9 mm birch ply.\n'),
    filename: 'board.jpg',
    contentType: 'image/jpeg',
  },
  emptyFile: { bytes: Buffer.alloc(0), filename: 'empty.jpg', contentType: 'image/jpeg' },
  svg: {
    bytes: Buffer.from(
      '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>',
    ),
    filename: 'board.svg',
    contentType: 'image/svg+xml',
  },
  scriptAsJpeg: {
    bytes: Buffer.from('<script>fetch("/api/account").then(r => r.text()).then(alert)</script>'),
    filename: 'board.jpg',
    contentType: 'image/jpeg',
  },
  /** Begins like a JPEG, then is not one. */
  damagedJpeg: {
    bytes: Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from('not really a photo'.repeat(20))]),
    filename: 'board.jpg',
    contentType: 'image/jpeg',
  },
} as const;

/** 11 MB that begins like a JPEG, so only its size is wrong. */
export const elevenMegabytes = () =>
  Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(11 * 1024 * 1024 - 4)]);
