import { COLLECT, TOWN, courier, deliver, module, type DemoListing } from './kit';

const GWEN = 'gwen@llewerth.test';

/** Gwen Llewerth's narrow-gauge boards (OO9, 0-16.5, H0e), near Porthmadog. */
export const GWEN_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'llewerth-oo9-quarry',
    seller: GWEN,
    state: 'listed',
    body: module({
      title: 'OO9 slate quarry incline and village, fully sceniced',
      description:
        'A slate quarry in OO9: a winding drum house at the top of an incline, waste tips, a row of cottages ' +
        'and the exchange sidings. Light frame with a foam landform, DC with section switches.',
      scaleId: 'oo9',
      size: [1000, 450, 300],
      frame: { topMaterial: 'insulation-foam', topThicknessMm: 25, crossMemberSpacingMm: 300 },
      control: 'dc',
      ends: [[70], []],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'The incline wagons are not included; the drum house roof lifts off.',
      priceMinor: 35_000,
      townId: TOWN.porthmadog,
      handling: courier('parcel'),
      weightKg: 5,
    }),
  },
  {
    slug: 'llewerth-0-16-5-wharf',
    seller: GWEN,
    state: 'listed',
    body: module({
      title: '0-16.5 harbour wharf, narrow gauge in 7 mm scale',
      description:
        'Narrow gauge in 1:45 on 16.5 mm track: a slate wharf with a weighbridge, a loop and two sidings onto ' +
        'the quay. Sturdy 3x1 frame, DCC.',
      scaleId: '0-e',
      size: [1400, 500, 200],
      frame: { frameDepthMm: 69, topThicknessMm: 12, crossMemberSpacingMm: 350 },
      ends: [[160], [160]],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Quay wall done; the water and boats are not started.',
      priceMinor: 29_000,
      townId: TOWN.porthmadog,
      handling: deliver(50, 3_000),
      weightKg: 11,
    }),
  },
  {
    slug: 'llewerth-h0e-loop',
    seller: GWEN,
    state: 'listed',
    pictures: 2,
    body: module({
      title: 'H0e forest loop on a tiny board, wired DC',
      description:
        'A continuous run in H0e (1:87 on 9 mm) through a forest clearing with a halt. A board small enough ' +
        'for a bookshelf; track and wiring complete.',
      scaleId: 'h0-e',
      size: [700, 400, 90],
      frame: { crossMemberSpacingMm: 300 },
      control: 'dc',
      ends: [[], []],
      finish: 'wired-running',
      condition: 'as-new',
      notes: '',
      priceMinor: 6_500,
      townId: TOWN.machynlleth,
      handling: courier('parcel'),
      weightKg: 2.5,
    }),
  },
  {
    slug: 'llewerth-oo9-sector-plate',
    seller: GWEN,
    state: 'listed',
    body: module({
      title: 'OO9 sector plate fiddle yard, five roads',
      description:
        'A pivoting sector plate serving five roads, locked by a brass bolt that also feeds the track. ' +
        'Fits the quarry board above, or any single-track OO9 line.',
      scaleId: 'oo9',
      size: [700, 450, 90],
      frame: { crossMemberSpacingMm: 300 },
      control: 'dc',
      ends: [[70], []],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'The pivot has a little play; it still lines up well.',
      priceMinor: 5_500,
      townId: TOWN.porthmadog,
      handling: courier('parcel'),
      weightKg: 3,
    }),
  },
  {
    slug: 'llewerth-oo9-sawmill',
    seller: GWEN,
    state: 'draft',
    pictures: 1,
    body: module({
      title: 'OO9 sawmill siding board',
      description: 'A sawmill with a timber siding and a loading crane. Draft while I finish the photographs.',
      scaleId: 'oo9',
      size: [600, 300, 90],
      control: null,
      ends: [[70], [70]],
      finish: 'topped',
      condition: 'sound',
      notes: 'The mill building is only a card mock-up so far.',
      priceMinor: 3_000,
      townId: TOWN.porthmadog,
      handling: COLLECT,
      weightKg: 2,
    }),
  },
];
