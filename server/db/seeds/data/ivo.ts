import { COLLECT, TOWN, courier, module, type DemoListing } from './kit';

const IVO = 'ivo@stannard-home.test';

/** Ivo Stannard's spare-room boards, near Truro. */
export const IVO_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'stannard-oo-shelf',
    seller: IVO,
    state: 'listed',
    body: module({
      title: 'OO shelf layout board on wall brackets, 1.8 m',
      description:
        'A long narrow shelf board for a spare-room layout: a short platform and two sidings, on steel wall ' +
        'brackets (included). The frame is 3x1 for stiffness over the bracket spacing.',
      scaleId: 'oo',
      size: [1800, 300, 100],
      frame: { frameDepthMm: 69, supports: 'wall-brackets' },
      control: 'dc',
      ends: [[150], []],
      railTopMm: 1300,
      finish: 'part-sceniced',
      condition: 'worn',
      notes: 'Bracket holes in the back rail; the top has a few paint marks.',
      priceMinor: 7_500,
      townId: TOWN.truro,
      handling: COLLECT,
      weightKg: 8,
    }),
  },
  {
    slug: 'stannard-oo-shunting-puzzle',
    seller: IVO,
    state: 'draft',
    pictures: 1,
    body: module({
      title: 'OO three-siding shunting puzzle board',
      description:
        'A shunting puzzle of three sidings off a headshunt, on a single short board. Draft: photos of the ' +
        'real board to follow.',
      scaleId: 'oo',
      size: [1200, 300, 90],
      control: 'dc',
      ends: [[150], []],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'Uncoupling magnets fitted under two sidings.',
      priceMinor: 6_000,
      townId: TOWN.truro,
      handling: courier('parcel'),
      weightKg: 5,
    }),
  },
  {
    slug: 'stannard-h0-plank',
    seller: IVO,
    state: 'withdrawn',
    body: module({
      title: 'H0 plank with a small industrial siding',
      description: 'A single-board H0 plank: run-round loop and one industrial siding, DC, partly sceniced.',
      scaleId: 'h0',
      size: [1200, 350, 100],
      control: 'dc',
      ends: [[140], [140]],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Withdrawn while I decide whether to keep it.',
      priceMinor: 9_500,
      townId: TOWN.truro,
      handling: COLLECT,
      weightKg: 6,
    }),
  },
];
