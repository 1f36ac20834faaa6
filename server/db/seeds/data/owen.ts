import { COLLECT, TOWN, courier, deliver, module, type DemoListing } from './kit';

const OWEN = 'owen@cattersby-post.test';

/** Owen Pellby's Cattersby branch (OO), near Nantwich, being sold as he moves house. */
export const OWEN_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'cattersby-road-station',
    seller: OWEN,
    state: 'listed',
    body: module({
      title: 'Cattersby Road station, OO, two boards',
      description:
        'The station boards of the Cattersby branch: a single platform, goods shed and run-round loop. ' +
        'Built in 2x1 planed softwood on 400 mm centres with a 9 mm birch ply top. DCC bus in 1.5 mm², ' +
        'boards joined with pattern-makers’ dowels and two bolts each side.',
      scaleId: 'oo',
      size: [1200, 500, 140],
      boards: 2,
      join: 'pattern-makers-dowels',
      ends: [[160], [160, 210]],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Platform edging needs regluing in one place; everything runs.',
      priceMinor: 22_500,
      townId: TOWN.nantwich,
      handling: deliver(40, 2_500),
      weightKg: 11.5,
    }),
  },
  {
    slug: 'cattersby-fiddle-yard',
    seller: OWEN,
    state: 'listed',
    body: module({
      title: 'Cattersby fiddle yard, five roads, bare frame',
      description:
        'The hidden fiddle yard from the same layout, stripped back to the frame: 2x1 softwood sides, ' +
        'cross members on 400 mm centres, no top. Sound and square; ready for a new top and track.',
      scaleId: 'oo',
      size: [1500, 450, 70],
      frame: { topMaterial: 'none', topThicknessMm: null, supports: 'none' },
      control: null,
      ends: [[], []],
      finish: 'bare-frame',
      condition: 'sound',
      notes: 'Old screw holes from the removed top; otherwise clean.',
      priceMinor: 4_000,
      townId: TOWN.nantwich,
      handling: courier('pallet'),
      weightKg: 6,
    }),
  },
  {
    slug: 'cattersby-junction',
    seller: OWEN,
    state: 'awaiting_review',
    body: module({
      title: 'Cattersby Junction, OO, two-level with storage below',
      description:
        'A two-level board: the junction on the upper deck, three storage roads 250 mm below. Frame in ' +
        '2x1 softwood, 12 mm birch ply decks, wired for DC with two cab sections.',
      scaleId: 'oo',
      size: [1800, 550, 420],
      deckGapMm: 250,
      frame: { topThicknessMm: 12 },
      control: 'dc',
      ends: [[160, 210], [160]],
      finish: 'wired-running',
      condition: 'worn',
      notes: 'The lower deck has some water marks; the upper deck is clean.',
      priceMinor: 15_000,
      townId: TOWN.nantwich,
      handling: COLLECT,
      weightKg: 24,
    }),
  },
  {
    slug: 'cattersby-goods-yard',
    seller: OWEN,
    state: 'listed',
    body: module({
      title: 'Cattersby goods yard, OO, three sidings and a kickback',
      description:
        'Goods yard board with three sidings, a cattle dock and a kickback siding. Code 75 flat-bottom track, ' +
        'slow-action point motors under the top, DCC bus with droppers to every rail.',
      scaleId: 'oo',
      size: [1200, 450, 130],
      join: 'pattern-makers-dowels',
      ends: [[160], [160, 210]],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'One point motor is slow to throw; it still throws.',
      priceMinor: 14_000,
      townId: TOWN.nantwich,
      handling: deliver(40, 2_500),
      weightKg: 9.5,
    }),
  },
  {
    slug: 'cattersby-viaduct',
    seller: OWEN,
    state: 'listed',
    body: module({
      title: 'Cattersby viaduct scenic board, OO, fully sceniced',
      description:
        'A three-arch stone viaduct over a shallow river, on a narrow scenic board with the backscene fixed. ' +
        'Double track across the viaduct; plain wiring, two feeds per track.',
      scaleId: 'oo',
      size: [900, 450, 300],
      join: 'pattern-makers-dowels',
      ends: [
        [160, 210],
        [160, 210],
      ],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'Some static grass has worn thin along the front edge.',
      priceMinor: 19_500,
      townId: TOWN.nantwich,
      handling: deliver(40, 2_500),
      weightKg: 7,
    }),
  },
  {
    slug: 'cattersby-corner',
    seller: OWEN,
    state: 'listed',
    body: module({
      title: 'OO corner board, 600 mm square, curved double track',
      description:
        'Quarter-circle corner board to take the Cattersby line round a room corner. Track laid on cork, ' +
        'not yet wired. Light enough for one person to carry.',
      scaleId: 'oo',
      size: [600, 600, 80],
      control: null,
      ends: [
        [160, 210],
        [160, 210],
      ],
      finish: 'track-laid',
      condition: 'as-new',
      notes: '',
      priceMinor: 6_500,
      townId: TOWN.nantwich,
      handling: courier('parcel'),
      weightKg: 4.5,
    }),
  },
  {
    slug: 'cattersby-halt',
    seller: OWEN,
    state: 'draft',
    pictures: 1,
    body: module({
      title: 'Cattersby Halt, OO, single board',
      description:
        'The little halt board from the end of the branch. Still measuring up: sizes and the end profile ' +
        'below are from memory and will be checked before this goes for review.',
      scaleId: 'oo',
      size: [900, 400, 120],
      ends: [[160], [160]],
      finish: 'track-laid',
      condition: 'sound',
      notes: 'To check: the fence along the back needs a few posts.',
      priceMinor: 5_000,
      townId: TOWN.nantwich,
      handling: COLLECT,
      weightKg: 5,
    }),
  },
];
