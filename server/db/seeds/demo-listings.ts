import type { DataSource } from 'typeorm';
import type { z } from 'zod';
import type { ListingState } from '../../../shared/listings/states';
import { listingInputSchema } from '../../../shared/schemas/listings';
import { BuilderProfile } from '../../features/builders/builder-profile.entity';
import { resolveLocation } from '../../features/listings/listing-location';
import { applyListingInput } from '../../features/listings/listing-mapping';
import { Listing } from '../../features/listings/listing.entity';
import { User } from '../../features/users/user.entity';

/** Towns (gazetteer ids) the demo's invented people live near. */
const NANTWICH = 2641892;
const MATLOCK = 2642910;

const end = (offsets: number[], railTopHeightMm = 1060) => ({
  trackOffsetsMm: offsets,
  railTopHeightMm,
  railTopFrom: 'floor' as const,
});

const frame2x1 = {
  frameDepthMm: 44,
  frameThicknessMm: 18,
  crossMemberSpacingMm: 400,
  topMaterial: 'birch-plywood' as const,
  topThicknessMm: 9,
  supports: 'legs' as const,
};

interface DemoListing {
  sellerEmail: string;
  state: ListingState;
  body: z.input<typeof listingInputSchema>;
}

/** A few invented listings; the next change adds many more, with pictures drawn by code. */
const DEMO_LISTINGS: readonly DemoListing[] = [
  {
    sellerEmail: 'owen@cattersby-post.test',
    state: 'listed',
    body: {
      kind: 'module',
      title: 'Cattersby Road station, OO, two boards',
      description:
        'The station boards of the Cattersby branch: a single platform, goods shed and run-round loop. ' +
        'Built in 2x1 planed softwood on 400 mm centres with a 9 mm birch ply top. DCC bus in 1.5 mm², ' +
        'boards joined with pattern-makers’ dowels and two bolts each side.',
      scaleId: 'oo',
      lengthMm: 1200,
      widthMm: 500,
      heightMm: 140,
      boardCount: 2,
      joinMethod: 'pattern-makers-dowels',
      levels: { type: 'single' },
      construction: frame2x1,
      wiring: { control: 'dcc', busWireMm2: 1.5, boardConnectors: '15-pin D connectors between boards' },
      endProfiles: { a: end([160]), b: end([160, 210]) },
      finish: 'part-sceniced',
      condition: 'sound',
      conditionNotes: 'Platform edging needs regluing in one place; everything runs.',
      priceMinor: 22_500,
      currency: 'GBP',
      townId: NANTWICH,
      handling: { collection: true, delivery: { withinKm: 40, priceMinor: 2_500 }, courier: null },
      weightKg: 11.5,
    },
  },
  {
    sellerEmail: 'owen@cattersby-post.test',
    state: 'listed',
    body: {
      kind: 'module',
      title: 'Cattersby fiddle yard, five roads, bare frame',
      description:
        'The hidden fiddle yard from the same layout, stripped back to the frame: 2x1 softwood sides, ' +
        'cross members on 400 mm centres, no top. Sound and square; ready for a new top and track.',
      scaleId: 'oo',
      lengthMm: 1500,
      widthMm: 450,
      heightMm: 70,
      boardCount: 1,
      joinMethod: 'bolts',
      levels: { type: 'single' },
      construction: { ...frame2x1, topMaterial: 'none', topThicknessMm: null, supports: 'none' },
      wiring: null,
      endProfiles: { a: end([]), b: end([]) },
      finish: 'bare-frame',
      condition: 'sound',
      conditionNotes: 'Old screw holes from the removed top; otherwise clean.',
      priceMinor: 4_000,
      currency: 'GBP',
      townId: NANTWICH,
      handling: { collection: true, delivery: null, courier: 'pallet' },
      weightKg: 6,
    },
  },
  {
    sellerEmail: 'owen@cattersby-post.test',
    state: 'awaiting_review',
    body: {
      kind: 'module',
      title: 'Cattersby Junction, OO, two-level with storage below',
      description:
        'A two-level board: the junction on the upper deck, three storage roads 250 mm below. Frame in ' +
        '2x1 softwood, 12 mm birch ply decks, wired for DC with two cab sections.',
      scaleId: 'oo',
      lengthMm: 1800,
      widthMm: 550,
      heightMm: 420,
      boardCount: 1,
      joinMethod: 'bolts',
      levels: { type: 'two-level', deckGapMm: 250 },
      construction: { ...frame2x1, topThicknessMm: 12 },
      wiring: { control: 'dc', busWireMm2: 1, boardConnectors: 'Terminal strips' },
      endProfiles: { a: end([160, 210]), b: end([160]) },
      finish: 'wired-running',
      condition: 'worn',
      conditionNotes: 'The lower deck has some water marks; the upper deck is clean.',
      priceMinor: 15_000,
      currency: 'GBP',
      townId: NANTWICH,
      handling: { collection: true, delivery: null, courier: null },
      weightKg: 24,
    },
  },
  {
    sellerEmail: 'nell@ashgrove-benchworks.test',
    state: 'listed',
    body: {
      kind: 'service',
      title: 'Ashgrove Benchworks: module frames and fiddle yards to order',
      description:
        'Portable modules and fixed benchwork built in planed softwood and birch ply, to your club’s end ' +
        'profile. Legs with levelling feet; two-level frames with a fiddle yard below.',
      builds: ['portable-modules', 'fixed-benchwork', 'two-level-benchwork', 'fiddle-yards', 'legs-and-trestles'],
      townId: MATLOCK,
      serviceAreaKm: 90,
      leadTimeWeeks: 5,
      materialsSupplied: ['timber', 'sheet', 'fixings', 'legs'],
      currency: 'GBP',
      rateCard: {
        perMetreFrameMinor: 4_200,
        perSquareMetreTopMinor: 2_800,
        perLegSetMinor: 5_500,
        perSecondLevelMinor: 8_500,
        deliveryPerKmMinor: 55,
        materialsMarkupBp: 1_200,
      },
    },
  },
];

/** Add (or reset) the demo's listings and the builder's approved profile. Safe to run again: matched by title. */
export async function seedDemoListings(dataSource: DataSource): Promise<number> {
  const users = dataSource.getRepository(User);
  const repo = dataSource.getRepository(Listing);
  for (const demo of DEMO_LISTINGS) {
    const owner = await users.findOneByOrFail({ email: demo.sellerEmail });
    const input = listingInputSchema.parse(demo.body);
    const { position } = await resolveLocation(input.townId, input.position);
    const listing = (await repo.findOneBy({ ownerId: owner.id, title: input.title })) ?? repo.create();
    applyListingInput(listing, input, position);
    const now = new Date();
    Object.assign(listing, {
      ownerId: owner.id,
      state: demo.state,
      stateChangedAt: now,
      submittedAt: demo.state === 'draft' ? null : (listing.submittedAt ?? now),
      publishedAt: demo.state === 'listed' ? (listing.publishedAt ?? now) : null,
    });
    await repo.save(listing);
  }
  const builder = await users.findOneByOrFail({ email: 'nell@ashgrove-benchworks.test' });
  const profiles = dataSource.getRepository(BuilderProfile);
  const profile = (await profiles.findOneBy({ userId: builder.id })) ?? profiles.create({ userId: builder.id });
  Object.assign(profile, {
    businessName: 'Ashgrove Benchworks',
    about: 'Benchwork built to order in a small workshop: portable modules, fixed frames and fiddle yards.',
    townId: MATLOCK,
    builds: ['portable-modules', 'fixed-benchwork', 'fiddle-yards'],
    state: 'approved',
    decidedAt: profile.decidedAt ?? new Date(),
  });
  await profiles.save(profile);
  return DEMO_LISTINGS.length;
}
