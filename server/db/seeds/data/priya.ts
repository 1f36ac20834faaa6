import { TOWN, courier, deliver, module, type DemoListing } from './kit';

const PRIYA = 'priya.castellane@lansdown-sidings.test';

/** Priya Castellane's N gauge boards, near Bath. */
export const PRIYA_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'lansdown-n-city-terminus',
    seller: PRIYA,
    state: 'listed',
    body: module({
      title: 'N gauge city terminus, two boards, fully sceniced',
      description:
        'A four-platform city terminus in N with an overall roof, station throat and carriage sidings. Built on ' +
        'a light 2x1 frame with a foam top over ply; DCC with every point on a stationary decoder.',
      scaleId: 'n',
      size: [1100, 400, 160],
      boards: 2,
      join: 'dowels',
      frame: { topMaterial: 'insulation-foam', topThicknessMm: 25, crossMemberSpacingMm: 350 },
      ends: [
        [95, 120, 145, 170],
        [95, 120],
      ],
      finish: 'fully-sceniced',
      condition: 'sound',
      notes: 'Roof glazing has one cracked pane; otherwise as built.',
      priceMinor: 42_000,
      townId: TOWN.bath,
      handling: deliver(60, 3_000),
      weightKg: 6.5,
    }),
  },
  {
    slug: 'lansdown-n-viaduct',
    seller: PRIYA,
    state: 'listed',
    body: module({
      title: 'N gauge curved viaduct module',
      description:
        'Curved brick viaduct carrying double track over a valley road. Part sceniced: landform, road and ' +
        'viaduct done, trees and fences not started.',
      scaleId: 'n',
      size: [900, 350, 200],
      frame: { crossMemberSpacingMm: 300 },
      ends: [
        [95, 120],
        [95, 120],
      ],
      finish: 'part-sceniced',
      condition: 'sound',
      notes: 'Parapet coping missing on one arch; the pieces are included.',
      priceMinor: 12_500,
      townId: TOWN.bath,
      handling: courier('parcel'),
      weightKg: 4,
    }),
  },
  {
    slug: 'lansdown-n-fiddle-yard',
    seller: PRIYA,
    state: 'listed',
    body: module({
      title: 'N gauge six-road fiddle yard, DCC',
      description:
        'Six-road fan of sidings from a double-track entry, electrofrog points, each road switched off ' +
        'when its point is set against it. Frame on 300 mm centres with a 9 mm ply top.',
      scaleId: 'n',
      size: [1200, 400, 90],
      frame: { crossMemberSpacingMm: 300 },
      ends: [[95, 120], []],
      finish: 'wired-running',
      condition: 'sound',
      notes: 'Wiring labelled throughout; one siding needs its rail joiner soldering.',
      priceMinor: 8_500,
      townId: TOWN.bath,
      handling: courier('parcel'),
      weightKg: 5.5,
    }),
  },
  {
    slug: 'lansdown-n-cassette-dock',
    seller: PRIYA,
    state: 'sent_back',
    sendBack: {
      reasons: ['details-missing'],
      note: 'Please give the track offsets at end B (where the cassettes dock) so buyers can check the fit.',
    },
    body: module({
      title: 'N gauge cassette dock board',
      description:
        'Short board that takes aluminium-angle cassettes at one end and joins a scenic board at the other. ' +
        'Track laid, wiring to follow.',
      scaleId: 'n',
      size: [600, 350, 80],
      control: null,
      ends: [[120], []],
      finish: 'track-laid',
      condition: 'sound',
      notes: 'Four cassettes included, one with a bent end plate.',
      priceMinor: 4_500,
      townId: TOWN.bath,
      handling: courier('parcel'),
      weightKg: 2.5,
    }),
  },
  {
    slug: 'lansdown-n-straight-pair',
    seller: PRIYA,
    state: 'listed',
    body: module({
      title: 'N gauge double-track straight modules, pair',
      description:
        'Two plain double-track straights to the club end standard, for filling out a modular layout. ' +
        'Grass, hedges and a farm track; feeds on both tracks.',
      scaleId: 'n',
      size: [900, 300, 100],
      boards: 2,
      join: 'clamps',
      frame: { crossMemberSpacingMm: 300 },
      ends: [
        [95, 120],
        [95, 120],
      ],
      finish: 'fully-sceniced',
      condition: 'as-new',
      notes: '',
      priceMinor: 9_000,
      townId: TOWN.bath,
      handling: courier('parcel'),
      weightKg: 3,
    }),
  },
];
