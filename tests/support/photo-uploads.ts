import type TestAgent from 'supertest/lib/agent';

/** Upload one file as the photo form would: field `photo`, with the name and type the browser would claim. */
export const uploadPhoto = (
  agent: TestAgent,
  listingId: number,
  bytes: Buffer,
  filename = 'board.jpg',
  contentType = 'image/jpeg',
) => agent.post(`/api/listings/${listingId}/photos`).attach('photo', bytes, { filename, contentType });
