import { COLLECT, TOWN, courier, deliver, module, type DemoListing } from './kit';

const CLUB = 'secretary@thornholme-wexby-mrg.test';

/** Thornholme & Wexby Model Railway Group, near Ely: a club selling surplus modules to fund new ones. */
export const THORNHOLME_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'thornholme-h0-fen-station',
    seller: CLUB,
    state: 'listed',
    body: module({
      title: 'H0 fenland station with a level crossing, two boards',
      description:
        'Flat-country H0 station: two platforms, a gated level crossing and a grain siding, modelled on the ' +
        'fens around the club room. DCC, with the crossing gates worked by servos.',
      scaleId: 'h0',
      size: [1300, 500, 150],
      boards: 2,
      join: 'pattern-makers-dowels',
      ends: [
        [200, 250],
        [200, 250],
      ],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'One crossing gate servo chatters; a spare servo is included.',
      priceMinor: 48_000,
      townId: TOWN.ely,
      handling: deliver(60, 3_000),
      weightKg: 10,
    }),
  },
  {
    slug: 'thornholme-n-pair',
    seller: CLUB,
    state: 'listed',
    body: module({
      title: 'N gauge drain-side modules, pair, double track',
      description:
        'Two double-track N modules running beside a fenland drain with a pumping station. Light frames on ' +
        '300 mm centres; plain feeds on both tracks.',
      scaleId: 'n',
      size: [1000, 350, 100],
      boards: 2,
      join: 'clamps',
      frame: { crossMemberSpacingMm: 300 },
      control: 'dc',
      ends: [
        [95, 120],
        [95, 120],
      ],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'Water surface has some dust that a soft brush will lift.',
      priceMinor: 14_000,
      townId: TOWN.ely,
      handling: courier('parcel'),
      weightKg: 4,
    }),
  },
  {
    slug: 'thornholme-oo-test-plank',
    seller: CLUB,
    state: 'listed',
    pictures: 2,
    body: module({
      title: 'OO test plank, plain double track, 1.2 m',
      description:
        'A plain double-track plank used for testing stock at club nights. Track laid and wired; the top is ' +
        'painted but not sceniced. Cheap to a good home.',
      scaleId: 'oo',
      size: [1200, 300, 80],
      ends: [
        [100, 150],
        [100, 150],
      ],
      finish: 'wired-running',
      condition: 'worn',
      notes: 'Paint is scuffed; rails cleaned and tested last month.',
      priceMinor: 2_500,
      townId: TOWN.ely,
      handling: COLLECT,
      weightKg: 5,
    }),
  },
  {
    slug: 'thornholme-h0-hidden-sidings',
    seller: CLUB,
    state: 'sent_back',
    sendBack: {
      reasons: ['details-missing'],
      note: 'Say in the description whether the legs come with the board, and how long the hidden sidings are.',
    },
    body: module({
      title: 'H0 two-level board: scenic loop above, hidden sidings below',
      description:
        'A two-level H0 board with a passing loop on the scenic deck and four hidden storage sidings 280 mm ' +
        'below. Frame in 2x1 softwood with 12 mm decks; DCC throughout.',
      scaleId: 'h0',
      size: [1500, 550, 450],
      deckGapMm: 280,
      frame: { topThicknessMm: 12 },
      ends: [[200, 250], [200]],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'The lower deck is reached from the front; mind the light fitting under the top deck.',
      priceMinor: 22_000,
      townId: TOWN.ely,
      handling: COLLECT,
      weightKg: 21,
    }),
  },
];
