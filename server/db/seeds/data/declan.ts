import { COLLECT, TOWN, courier, deliver, module, type DemoListing } from './kit';

const DECLAN = 'declan@moylett-mail.test';

/** Declan Moylett's west-of-Ireland boards (OO, H0m, OO9), priced in euro. */
export const DECLAN_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'moylett-oo-harbour',
    seller: DECLAN,
    state: 'listed',
    body: module({
      title: 'OO harbour branch terminus, west coast, fully sceniced',
      description:
        'A fishing harbour terminus: quay, fish dock siding, small engine shed and a modelled sea wall. ' +
        'Two boards on a 3x1 frame, wired for DC with a mimic panel.',
      scaleId: 'oo',
      size: [1400, 550, 250],
      boards: 2,
      frame: { frameDepthMm: 69, topThicknessMm: 12, crossMemberSpacingMm: 350 },
      control: 'dc',
      ends: [[180], []],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'Water resin has a couple of small bubbles near the quay.',
      priceMinor: 65_000,
      currency: 'EUR',
      townId: TOWN.westport,
      handling: deliver(80, 4_000),
      weightKg: 13,
    }),
  },
  {
    slug: 'moylett-h0m-mountain',
    seller: DECLAN,
    state: 'listed',
    body: module({
      title: 'H0m metre-gauge mountain module with a passing loop',
      description:
        'Metre-gauge line in 1:87 on 12 mm track: a passing loop on a shelf cut into a rock face, ' +
        'hand-built track, DCC.',
      scaleId: 'h0-m',
      size: [1000, 400, 350],
      frame: { crossMemberSpacingMm: 300, topMaterial: 'poplar-plywood' },
      ends: [[140], [140]],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Rock face needs painting on the right-hand third.',
      priceMinor: 28_000,
      currency: 'EUR',
      townId: TOWN.sligo,
      handling: courier('parcel'),
      weightKg: 6,
    }),
  },
  {
    slug: 'moylett-oo-country-station',
    seller: DECLAN,
    state: 'awaiting_review',
    body: module({
      title: 'OO country station with goods loop, two boards',
      description:
        'Passing station with a goods loop and a loading bank, from a layout now dismantled. ' +
        'Track and wiring complete (DC), scenery not started.',
      scaleId: 'oo',
      size: [1200, 450, 120],
      boards: 2,
      join: 'pattern-makers-dowels',
      control: 'dc',
      ends: [[150], [150]],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'Some droppers are taped rather than soldered at the bus.',
      priceMinor: 16_000,
      currency: 'EUR',
      townId: TOWN.sligo,
      handling: COLLECT,
      weightKg: 9,
    }),
  },
  {
    slug: 'moylett-oo9-tramway',
    seller: DECLAN,
    state: 'withdrawn',
    body: module({
      title: 'OO9 roadside tramway board',
      description: 'A roadside narrow-gauge tramway along a country lane; track laid on a light softwood frame.',
      scaleId: 'oo9',
      size: [800, 300, 90],
      control: null,
      ends: [[60], [60]],
      finish: 'track-laid',
      condition: 'sound',
      notes: 'Withdrawn: a club member bought it at the open day.',
      priceMinor: 4_000,
      currency: 'EUR',
      townId: TOWN.westport,
      handling: COLLECT,
      weightKg: 3,
    }),
  },
];
