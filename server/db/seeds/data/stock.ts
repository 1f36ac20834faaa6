import { FRAME_3X1, TOWN, courier, deliver, module, type DemoListing } from './kit';

/** New frames the builders made for stock and sell like any second-hand module. */
export const STOCK_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'ashgrove-stock-oo-frame',
    seller: 'nell@ashgrove-benchworks.test',
    state: 'listed',
    pictures: 2,
    body: module({
      title: 'New OO/H0 module frame with 9 mm birch top, 1200 × 450',
      description:
        'Built for stock at Ashgrove Benchworks: planed 2x1 softwood, cross members on 400 mm centres, glued ' +
        'and screwed, 9 mm birch ply top, pattern-makers’ dowels in both ends. Ready for track.',
      scaleId: 'oo',
      size: [1200, 450, 60],
      join: 'pattern-makers-dowels',
      frame: { supports: 'none' },
      control: null,
      ends: [[], []],
      finish: 'topped',
      condition: 'as-new',
      notes: '',
      priceMinor: 8_500,
      townId: TOWN.matlock,
      handling: deliver(90, 1_500),
      weightKg: 5.5,
    }),
  },
  {
    slug: 'ashgrove-stock-n-pair',
    seller: 'nell@ashgrove-benchworks.test',
    state: 'listed',
    pictures: 2,
    body: module({
      title: 'Pair of new N gauge module frames with foam tops',
      description:
        'Two light frames for N gauge modules, 900 × 350 each: 2x1 softwood sides, 6 mm ply sub-top with ' +
        '25 mm insulation foam bonded on for carving a landform. Joined by clamps.',
      scaleId: 'n',
      size: [900, 350, 75],
      boards: 2,
      join: 'clamps',
      frame: { crossMemberSpacingMm: 300, topMaterial: 'insulation-foam', topThicknessMm: 25, supports: 'none' },
      control: null,
      ends: [[], []],
      finish: 'topped',
      condition: 'as-new',
      notes: '',
      priceMinor: 9_000,
      townId: TOWN.matlock,
      handling: courier('parcel'),
      weightKg: 2.5,
    }),
  },
  {
    slug: 'kestrel-stock-deep-frame',
    seller: 'orders@kestrel-lane-joinery.test',
    state: 'listed',
    pictures: 2,
    body: module({
      title: 'New deep frame for 7 mm scale, 1500 × 600, no top',
      description:
        'A 3x1 redwood frame on 300 mm centres for 7 mm scale, built for stock and left without a top so the ' +
        'buyer can choose open-frame or solid. Corner blocks glued and screwed.',
      scaleId: '0',
      size: [1500, 600, 70],
      frame: { ...FRAME_3X1, topMaterial: 'none', topThicknessMm: null, supports: 'none' },
      control: null,
      ends: [[], []],
      finish: 'bare-frame',
      condition: 'as-new',
      notes: '',
      priceMinor: 12_000,
      currency: 'EUR',
      townId: TOWN.kilkenny,
      handling: courier('pallet'),
      weightKg: 9,
    }),
  },
];
