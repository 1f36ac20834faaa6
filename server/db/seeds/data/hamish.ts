import { COLLECT, FRAME_3X1, TOWN, courier, module, type DemoListing } from './kit';

const HAMISH = 'hamish@corrie-workshop.test';

/** Hamish Corrie's big 7 mm boards, near Perth: heavy, mostly collection or pallet. */
export const HAMISH_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'corrie-0-goods-shed',
    seller: HAMISH,
    state: 'listed',
    body: module({
      title: '0 gauge goods shed and yard, two boards',
      description:
        'A stone goods shed with a through road, a loading bank and a yard crane, in 7 mm scale. Two 3x1 ' +
        'frames on 300 mm centres with 12 mm birch tops, bolted with dowels to line up. DCC.',
      scaleId: '0',
      size: [1500, 600, 350],
      boards: 2,
      join: 'pattern-makers-dowels',
      frame: FRAME_3X1,
      ends: [[200], [200, 300]],
      railTopMm: 1100,
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Yard surface is done; the shed interior is bare.',
      priceMinor: 55_000,
      townId: TOWN.perth,
      handling: courier('pallet'),
      weightKg: 19,
    }),
  },
  {
    slug: 'corrie-0-fiddle-yard',
    seller: HAMISH,
    state: 'listed',
    pictures: 2,
    body: module({
      title: '0 gauge fiddle yard, 2.4 m, four roads',
      description:
        'A long 7 mm fiddle yard: four roads from a single-track entry, each able to hold a tank engine and ' +
        'four coaches. Deep 3x1 frame, collection only as it will not fit a car.',
      scaleId: '0',
      size: [2400, 600, 150],
      frame: FRAME_3X1,
      ends: [[200], []],
      railTopMm: 1100,
      finish: 'wired-running',
      condition: 'sound',
      notes: 'Heavy: needs two people and a van.',
      priceMinor: 22_000,
      townId: TOWN.perth,
      handling: COLLECT,
      weightKg: 28,
    }),
  },
  {
    slug: 'corrie-o48-switching-shelf',
    seller: HAMISH,
    state: 'listed',
    body: module({
      title: 'O scale 1:48 switching shelf on wall brackets',
      description:
        'An industrial switching shelf in American O scale (1:48 on 31.75 mm): a warehouse spur and a team ' +
        'track along a 2 m shelf on wall brackets. DCC with sound-friendly 2.5 mm² bus.',
      scaleId: 'nmra-o',
      size: [2000, 400, 120],
      frame: { frameDepthMm: 69, supports: 'wall-brackets' },
      ends: [[150], []],
      railTopMm: 1250,
      finish: 'track-laid',
      condition: 'sound',
      notes: 'Brackets included; the warehouse flats are bare card.',
      priceMinor: 17_500,
      townId: TOWN.stirling,
      handling: COLLECT,
      weightKg: 12,
    }),
  },
  {
    slug: 'corrie-0-loco-shed',
    seller: HAMISH,
    state: 'sent_back',
    sendBack: {
      reasons: ['price-implausible'],
      note: '£15 for a 7 mm loco shed board with its pit looks like a typing slip. Did you mean £150?',
    },
    body: module({
      title: '0 gauge two-road loco shed with inspection pit',
      description:
        'Two-road engine shed with a working inspection pit, coaling stage and water tower, on a single ' +
        'deep board. Wired for DCC; the shed lights work.',
      scaleId: '0',
      size: [1200, 500, 300],
      frame: FRAME_3X1,
      ends: [[200], []],
      railTopMm: 1100,
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'The water tower tank has a dent on the back.',
      priceMinor: 1_500,
      townId: TOWN.perth,
      handling: COLLECT,
      weightKg: 14,
    }),
  },
];
