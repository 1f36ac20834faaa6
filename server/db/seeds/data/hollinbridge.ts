import { COLLECT, FRAME_3X1, TOWN, courier, deliver, module, type DemoListing } from './kit';

const CLUB = 'sales@hollinbridge-modellers.test';

/** Hollinbridge & District Railway Modellers, near Skipton, clearing boards from retired exhibition layouts. */
export const HOLLINBRIDGE_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'hollinbridge-low-level-station',
    seller: CLUB,
    state: 'listed',
    body: module({
      title: 'Hollinbridge Low Level: OO exhibition station, four boards',
      description:
        'The club’s retired exhibition layout: a two-platform through station in a cutting, goods yard and ' +
        'signal box, on four boards with exhibition legs. Frames are 3x1 softwood on 300 mm centres with 12 mm ' +
        'birch ply. DCC bus in 2.5 mm², boards joined by pattern-makers’ dowels and coach bolts.',
      scaleId: 'oo',
      size: [1200, 600, 350],
      boards: 4,
      join: 'pattern-makers-dowels',
      frame: FRAME_3X1,
      connectors: 'Multi-pole connectors across each joint',
      ends: [
        [180, 230],
        [180, 230],
      ],
      railTopMm: 1150,
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'Shown at twenty exhibitions; some scuffs on the fascia, all running.',
      priceMinor: 95_000,
      townId: TOWN.skipton,
      handling: courier('pallet'),
      weightKg: 16,
    }),
  },
  {
    slug: 'hollinbridge-traverser-yard',
    seller: CLUB,
    state: 'listed',
    body: module({
      title: 'OO eight-road fiddle yard to suit Hollinbridge Low Level',
      description:
        'The fiddle yard that served the station above: eight roads fanned from a double-track entry, each road ' +
        'long enough for a six-coach train. Frame and legs to match the scenic boards.',
      scaleId: 'oo',
      size: [1500, 600, 150],
      frame: FRAME_3X1,
      connectors: 'Multi-pole connectors across each joint',
      ends: [[180, 230], []],
      railTopMm: 1150,
      finish: 'wired-running',
      condition: 'worn',
      notes: 'Top is stained where tea met ply; track and points all good.',
      priceMinor: 18_000,
      townId: TOWN.skipton,
      handling: COLLECT,
      weightKg: 15,
    }),
  },
  {
    slug: 'hollinbridge-h0-straights',
    seller: CLUB,
    state: 'listed',
    body: module({
      title: 'H0 single-track modules, set of three straights',
      description:
        'Three plain single-track H0 modules in an alpine-foothills style, built to the club’s own end ' +
        'standard (track on the centre line). Pine-ply tops, bolt-together ends.',
      scaleId: 'h0',
      size: [1000, 500, 150],
      boards: 3,
      frame: { topMaterial: 'poplar-plywood', topThicknessMm: 12 },
      ends: [[250], [250]],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Fences and telegraph poles still to fit; ballast complete.',
      priceMinor: 21_000,
      townId: TOWN.skipton,
      handling: deliver(50, 3_500),
      weightKg: 8,
    }),
  },
  {
    slug: 'hollinbridge-n-test-track',
    seller: CLUB,
    state: 'listed',
    body: module({
      title: 'N gauge test track board, oval with a siding',
      description:
        'The club’s N gauge running-in board: a plain oval and one siding, wired for DC and DCC through a ' +
        'changeover switch. Useful for a workbench or a first layout.',
      scaleId: 'n',
      size: [1200, 500, 90],
      ends: [[], []],
      finish: 'wired-running',
      condition: 'worn',
      notes: 'Well used; the ballast has been patched in places.',
      priceMinor: 3_500,
      townId: TOWN.skipton,
      handling: COLLECT,
      weightKg: 7,
    }),
  },
  {
    slug: 'hollinbridge-tt-terminus',
    seller: CLUB,
    state: 'awaiting_review',
    body: module({
      title: 'TT branch terminus in a market town, two boards',
      description:
        'A compact TT terminus from a member’s estate, offered by the club on behalf of the family: platform, ' +
        'run-round, goods shed and coal drops. Wired for DCC.',
      scaleId: 'tt',
      size: [1100, 400, 140],
      boards: 2,
      join: 'dowels',
      ends: [[], [130]],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Buildings are card kits; two chimneys need regluing.',
      priceMinor: 26_000,
      townId: TOWN.skipton,
      handling: deliver(60, 3_000),
      weightKg: 7.5,
    }),
  },
  {
    slug: 'hollinbridge-bare-frames',
    seller: CLUB,
    state: 'withdrawn',
    pictures: 2,
    body: module({
      title: 'Job lot of six bare module frames, 1200 × 500',
      description:
        'Six identical bare frames from a layout that never got built: 2x1 softwood, cross members on 400 mm ' +
        'centres, no tops. Withdrawn: taken by a club member.',
      scaleId: 'oo',
      size: [1200, 500, 50],
      boards: 6,
      frame: { topMaterial: 'none', topThicknessMm: null, supports: 'none' },
      control: null,
      ends: [[], []],
      finish: 'bare-frame',
      condition: 'as-new',
      notes: '',
      priceMinor: 9_000,
      townId: TOWN.skipton,
      handling: COLLECT,
      weightKg: 4,
    }),
  },
];
