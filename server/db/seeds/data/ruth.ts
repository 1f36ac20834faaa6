import { COLLECT, TOWN, courier, deliver, module, type DemoListing } from './kit';

const RUTH = 'ruth@tenterby.test';

/** Ruth Tenterby's TT and S boards, near Lincoln. */
export const RUTH_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'tenterby-tt-station',
    seller: RUTH,
    state: 'listed',
    body: module({
      title: 'TT through station on a wolds line, two boards',
      description:
        'A two-platform through station in TT (1:120 on 12 mm) with a small goods yard and a chalk cutting ' +
        'at one end. DCC, with frog juicers on every point.',
      scaleId: 'tt',
      size: [1200, 450, 180],
      boards: 2,
      join: 'pattern-makers-dowels',
      ends: [
        [120, 155],
        [120, 155],
      ],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'Platform lamps are not wired; the rest is as shown.',
      priceMinor: 38_000,
      townId: TOWN.lincoln,
      handling: deliver(70, 3_500),
      weightKg: 9,
    }),
  },
  {
    slug: 'tenterby-tt-fiddle-yard',
    seller: RUTH,
    state: 'listed',
    body: module({
      title: 'TT fiddle yard, six roads, to suit the station',
      description:
        'Six-road fiddle yard from a double-track entry, wired to match the station boards. Frame in 2x1 ' +
        'softwood on 400 mm centres with a 9 mm ply top.',
      scaleId: 'tt',
      size: [1200, 450, 90],
      ends: [[120, 155], []],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'Track is slightly dusty; everything else clean.',
      priceMinor: 9_500,
      townId: TOWN.lincoln,
      handling: courier('parcel'),
      weightKg: 7,
    }),
  },
  {
    slug: 'tenterby-s-scale-plank',
    seller: RUTH,
    state: 'listed',
    body: module({
      title: 'S scale (1:64) plank with a loading dock',
      description:
        'A long plank in S scale, 1:64 on 22.5 mm: a run-round loop and a loading dock siding. Hand-built ' +
        'track on ply sleepers; DC.',
      scaleId: 's',
      size: [1800, 400, 120],
      frame: { frameDepthMm: 69 },
      control: 'dc',
      ends: [[150], [150]],
      finish: 'track-laid',
      condition: 'sound',
      notes: 'The loading dock is unpainted; wiring is only a pair of feeds.',
      priceMinor: 12_000,
      townId: TOWN.lincoln,
      handling: COLLECT,
      weightKg: 10,
    }),
  },
  {
    slug: 'tenterby-tt-two-level-junction',
    seller: RUTH,
    state: 'awaiting_review',
    body: module({
      title: 'TT junction over hidden storage, two-level',
      description:
        'A branch junction on the scenic deck with four storage roads 220 mm below, reached from the front. ' +
        '2x1 frame with 12 mm decks; DCC with a separate bus for each deck.',
      scaleId: 'tt',
      size: [1500, 500, 400],
      deckGapMm: 220,
      frame: { topThicknessMm: 12 },
      ends: [[120, 155], [120]],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'Lower deck lighting strip included but not fitted.',
      priceMinor: 24_000,
      townId: TOWN.lincoln,
      handling: COLLECT,
      weightKg: 18,
    }),
  },
];
