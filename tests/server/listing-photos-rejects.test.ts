import sharp from 'sharp';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { PHOTO_MESSAGES } from '../../shared/listings/photo-limits';
import { buildUser } from '../support/factories';
import { addPhoto, buildListing } from '../support/listing-factories';
import { badFiles, elevenMegabytes, gifImage, jpegPhoto, pixelBomb } from '../support/photo-fixtures';
import { photoState } from '../support/photo-storage';
import { uploadPhoto } from '../support/photo-uploads';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

let app: AppInstance;
let seller: User;
let agent: TestAgent;
let listing: Listing;
beforeAll(async () => {
  app = await startTestApp();
  seller = await buildUser(app.ctx.dataSource);
  agent = await signedInAs(app, seller);
  listing = await buildListing(app.ctx.dataSource, seller);
});
afterAll(() => app.close());

const WRONG_TYPE = { status: 415, code: 'photo_type', message: PHOTO_MESSAGES.wrongType };
const UNREADABLE = { status: 422, code: 'photo_unreadable', message: PHOTO_MESSAGES.unreadable };

interface RefusedFile {
  label: string;
  make: () => Buffer | Promise<Buffer>;
  filename: string;
  contentType: string;
  expected: { status: number; code: string; message: string };
  /** The OWASP File Upload Cheat Sheet requirement the case checks. */
  requirement: string;
}

const sent = (file: { bytes: Buffer; filename: string; contentType: string }) => ({
  make: () => file.bytes,
  filename: file.filename,
  contentType: file.contentType,
});

/** The name and declared type of each file are chosen to pass for a photo: only the content may decide. */
const CASES: RefusedFile[] = [
  {
    label: 'a text file renamed .jpg',
    ...sent(badFiles.textRenamedJpg),
    expected: WRONG_TYPE,
    requirement: 'validate the type by content',
  },
  { label: 'a 0-byte file', ...sent(badFiles.emptyFile), expected: WRONG_TYPE, requirement: 'validate the type' },
  {
    label: 'an SVG with a script inside',
    ...sent(badFiles.svg),
    expected: WRONG_TYPE,
    requirement: 'allow-list the accepted types',
  },
  {
    label: 'a script sent as image/jpeg',
    ...sent(badFiles.scriptAsJpeg),
    expected: WRONG_TYPE,
    requirement: "don't trust the Content-Type header",
  },
  {
    label: 'a GIF',
    make: gifImage,
    filename: 'board.gif',
    contentType: 'image/gif',
    expected: WRONG_TYPE,
    requirement: 'allow-list the accepted types',
  },
  {
    label: 'a file that begins as a JPEG but is not one',
    ...sent(badFiles.damagedJpeg),
    expected: UNREADABLE,
    requirement: 'image rewriting',
  },
  {
    label: 'a 50 KB PNG declaring 20 000 × 20 000 pixels',
    make: () => pixelBomb(),
    filename: 'bomb.png',
    contentType: 'image/png',
    expected: UNREADABLE,
    requirement: 'protect against decompression bombs',
  },
  {
    label: 'an 11 MB file',
    make: elevenMegabytes,
    filename: 'huge.jpg',
    contentType: 'image/jpeg',
    expected: { status: 413, code: 'photo_too_large', message: PHOTO_MESSAGES.tooLarge },
    requirement: 'set a file size limit',
  },
];

describe('POST /api/listings/:id/photos refuses', () => {
  for (const { label, make, filename, contentType, expected, requirement } of CASES) {
    it(`${label} with ${expected.status}, storing nothing (${requirement})`, async () => {
      const before = await photoState(app);

      const res = await uploadPhoto(agent, listing.id, await make(), filename, contentType);

      expect(res.status).toBe(expected.status);
      expect(res.body.error).toEqual({ code: expected.code, message: expected.message });
      expect(await photoState(app)).toEqual(before);
    });
  }

  it('a 13th photo with 409, storing nothing', async () => {
    const full = await buildListing(app.ctx.dataSource, seller);
    for (let i = 0; i < 12; i += 1) await addPhoto(app.ctx, full, seller);
    const before = await photoState(app);

    const res = await uploadPhoto(agent, full.id, await jpegPhoto());

    expect(res.status).toBe(409);
    expect(res.body.error).toEqual({ code: 'photo_limit', message: PHOTO_MESSAGES.limit });
    expect(await photoState(app)).toEqual(before);
  });

  it('an upload without a photo, in another field, with extra fields or with two files, with 400', async () => {
    const before = await photoState(app);
    const photo = await jpegPhoto();
    const url = `/api/listings/${listing.id}/photos`;

    const none = await agent.post(url).send({});
    const otherField = await agent.post(url).attach('image', photo, 'board.jpg');
    const extraField = await agent.post(url).field('caption', 'Front view').attach('photo', photo, 'board.jpg');
    const twoFiles = await agent.post(url).attach('photo', photo, 'a.jpg').attach('photo', photo, 'b.jpg');

    expect(none.body.error).toEqual({ code: 'photo_missing', message: PHOTO_MESSAGES.missing });
    for (const res of [otherField, extraField, twoFiles])
      expect([res.status, res.body.error]).toEqual([
        400,
        { code: 'photo_upload_shape', message: PHOTO_MESSAGES.oneFile },
      ]);
    expect(none.status).toBe(400);
    expect(await photoState(app)).toEqual(before);
  });
});

describe('the pixel-bomb fixture', () => {
  it('is a well-formed PNG declaring 400 megapixels in under 60 KB', async () => {
    const bomb = pixelBomb();
    const meta = await sharp(bomb, { limitInputPixels: false }).metadata();
    expect([meta.format, meta.width, meta.height]).toEqual(['png', 20_000, 20_000]);
    expect(bomb.length).toBeLessThan(60_000);
  });
});
