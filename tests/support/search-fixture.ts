import { randomBytes } from 'node:crypto';
import type { AppInstance } from '../../server/app';
import type { Listing } from '../../server/features/listings/listing.entity';
import type { User } from '../../server/features/users/user.entity';
import { buildUser } from './factories';
import { TOWNS, buildListedListing, buildListing, moduleBody } from './listing-factories';

const end = (offsets: number[]) => ({ trackOffsetsMm: offsets, railTopHeightMm: 1000, railTopFrom: 'floor' as const });
const noHandling = { collection: false, delivery: null, courier: null };

/** The search tests' listings, by name, all carrying `mark` (a word no other test uses). */
export interface SearchFixture {
  mark: string;
  listings: Record<'terminus' | 'station' | 'halt' | 'frame' | 'service' | 'euro', Listing>;
}

/**
 * Six listed listings that differ in one filter or another (kind, scale, gauge, finish, sizes, price, currency,
 * handling, control, end profiles), published in this order, plus a draft that no search may return.
 */
export async function buildSearchFixture(app: AppInstance): Promise<SearchFixture> {
  const mark = `bwz${randomBytes(4).toString('hex')}`;
  const about = (text: string) => `${text} Reference ${mark}, viewing welcome by arrangement.`;
  const seller = await buildUser(app.ctx.dataSource);
  const builder = await buildUser(app.ctx.dataSource, { role: 'builder' });
  const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  const list = (owner: User, overrides: Parameters<typeof buildListedListing>[3]) =>
    buildListedListing(app.ctx, owner, moderator, overrides);
  const terminus = await list(seller, {
    title: 'OO branch terminus module, two boards',
    description: about('Terminus with a run-round loop, DCC bus in 1.5 mm² wire.'),
    scaleId: 'oo',
    lengthMm: 1200,
    widthMm: 450,
    priceMinor: 18_000,
    finish: 'wired-running',
    handling: { collection: true, delivery: null, courier: null },
    endProfiles: { a: end([150, 196]), b: end([150]) },
  });
  const station = await list(seller, {
    title: 'H0 through station, single board',
    description: about('Softwood frame, ply top, double track through a small station.'),
    scaleId: 'h0',
    lengthMm: 900,
    widthMm: 400,
    priceMinor: 9_000,
    finish: 'track-laid',
    wiring: { control: 'dc', busWireMm2: 1, boardConnectors: 'Terminal strips' },
    handling: { ...noHandling, courier: 'parcel', courierPriceMinor: 1_500 },
    townId: TOWNS.manchester,
    endProfiles: { a: end([100]), b: end([100]) },
  });
  const halt = await list(seller, {
    title: 'N gauge sceniced country halt',
    description: about('Fully sceniced halt on a light frame.'),
    scaleId: 'n',
    lengthMm: 600,
    widthMm: 300,
    priceMinor: 4_500,
    finish: 'fully-sceniced',
    wiring: { control: 'dc', busWireMm2: 0.5, boardConnectors: '' },
    handling: { ...noHandling, delivery: { withinKm: 40, priceMinor: 2_000 } },
    townId: TOWNS.derby,
    endProfiles: { a: end([80, 105]), b: end([80, 105]) },
  });
  const frame = await list(seller, {
    title: 'OO fiddle yard frame, unfinished',
    description: about('Bare frame for a six-road fiddle yard, cross members at 400 centres.'),
    scaleId: 'oo',
    lengthMm: 2400,
    widthMm: 600,
    priceMinor: 30_000,
    finish: 'bare-frame',
    wiring: null,
    construction: { ...moduleBody().construction, topMaterial: 'none', topThicknessMm: null },
    handling: { ...noHandling, courier: 'pallet', courierPriceMinor: 6_000 },
    townId: TOWNS.york,
    endProfiles: { a: end([]), b: end([]) },
  });
  const service = await list(builder, {
    kind: 'service',
    title: 'Benchwork built to order',
    description: about('Frames and legs built in the workshop and delivered.'),
  });
  const euro = await list(seller, {
    title: 'Suburban OO module priced in euro',
    description: about('A suburban scene on a single board.'),
    scaleId: 'oo',
    priceMinor: 10_000,
    currency: 'EUR',
    townId: TOWNS.dublin,
    endProfiles: { a: end([120]), b: end([120]) },
  });
  await buildListing(app.ctx.dataSource, seller, { description: about('A draft nobody else may find.') });
  return { mark, listings: { terminus, station, halt, frame, service, euro } };
}
