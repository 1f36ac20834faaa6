import { FRAME_3X1, TOWN, portfolioBoard, type DemoListing, type ServiceBody } from './kit';

const NELL = 'nell@ashgrove-benchworks.test';
const KESTREL = 'orders@kestrel-lane-joinery.test';
const BRACKENFOLD = 'bryn@brackenfold-baseboards.test';

const ASHGROVE_RATES: ServiceBody['rateCard'] = {
  perMetreFrameMinor: 4_200,
  perSquareMetreTopMinor: 2_800,
  perLegSetMinor: 5_500,
  perSecondLevelMinor: 8_500,
  deliveryPerKmMinor: 55,
  materialsMarkupBp: 1_200,
};

/** Boards drawn as the builders' portfolio pictures. */
const PORTABLE = portfolioBoard({
  title: 'Portable module frame',
  description: 'A portable module frame as delivered.',
  scaleId: 'oo',
  size: [1200, 600, 100],
  ends: [
    [180, 230],
    [180, 230],
  ],
  finish: 'topped',
  townId: TOWN.matlock,
});
const TWO_LEVEL = portfolioBoard({
  title: 'Two-level frame with a fiddle yard below',
  description: 'A two-level frame as delivered.',
  scaleId: 'oo',
  size: [1800, 600, 450],
  deckGapMm: 300,
  frame: { topThicknessMm: 12 },
  ends: [[180, 230], [180]],
  finish: 'topped',
  townId: TOWN.matlock,
});
const HEAVY = portfolioBoard({
  title: 'Deep frame for 7 mm scale',
  description: 'A deep 3x1 frame as delivered.',
  scaleId: '0',
  size: [1500, 600, 150],
  frame: FRAME_3X1,
  ends: [[200], [200]],
  finish: 'bare-frame',
  townId: TOWN.kilkenny,
});

/** Invented benchwork builders: Ashgrove Benchworks (Matlock), Kestrel Lane Joinery (Kilkenny), Brackenfold. */
export const BUILDER_LISTINGS: readonly DemoListing[] = [
  {
    slug: 'ashgrove-frames-to-order',
    seller: NELL,
    state: 'listed',
    portfolio: [PORTABLE, TWO_LEVEL],
    body: {
      kind: 'service',
      title: 'Ashgrove Benchworks: module frames and fiddle yards to order',
      description:
        'Portable modules and fixed benchwork built in planed softwood and birch ply, to your club’s end ' +
        'profile. Legs with levelling feet; two-level frames with a fiddle yard below.',
      builds: ['portable-modules', 'fixed-benchwork', 'two-level-benchwork', 'fiddle-yards', 'legs-and-trestles'],
      townId: TOWN.matlock,
      serviceAreaKm: 90,
      leadTimeWeeks: 5,
      materialsSupplied: ['timber', 'sheet', 'fixings', 'legs'],
      currency: 'GBP',
      rateCard: ASHGROVE_RATES,
    },
  },
  {
    slug: 'ashgrove-wiring',
    seller: NELL,
    state: 'listed',
    portfolio: [PORTABLE],
    body: {
      kind: 'service',
      title: 'Bus wiring and board connectors fitted to your boards',
      description:
        'Bring your boards to the workshop near Matlock: a DCC or DC bus run the length of each board, droppers ' +
        'soldered, and connectors fitted across every joint, all labelled and drawn up.',
      builds: ['wiring'],
      townId: TOWN.bakewell,
      serviceAreaKm: 60,
      leadTimeWeeks: 3,
      materialsSupplied: ['wiring', 'fixings'],
      currency: 'GBP',
      rateCard: { ...ASHGROVE_RATES, perLegSetMinor: 0, perSecondLevelMinor: 0, perSquareMetreTopMinor: 0 },
    },
  },
  {
    slug: 'kestrel-lane-module-frames',
    seller: KESTREL,
    state: 'listed',
    portfolio: [PORTABLE, HEAVY],
    body: {
      kind: 'service',
      title: 'Exhibition module frames and folding legs, Leinster and Munster',
      description:
        'A joinery workshop building light, square exhibition modules with folding legs, to any club standard. ' +
        'Frames in kiln-dried redwood, tops in birch ply; delivered or collected from Kilkenny.',
      builds: ['portable-modules', 'legs-and-trestles'],
      townId: TOWN.kilkenny,
      serviceAreaKm: 150,
      leadTimeWeeks: 6,
      materialsSupplied: ['timber', 'sheet', 'fixings', 'legs'],
      currency: 'EUR',
      rateCard: {
        perMetreFrameMinor: 5_000,
        perSquareMetreTopMinor: 3_500,
        perLegSetMinor: 7_000,
        perSecondLevelMinor: 10_000,
        deliveryPerKmMinor: 70,
        materialsMarkupBp: 1_000,
      },
    },
  },
  {
    slug: 'kestrel-lane-fiddle-yards',
    seller: KESTREL,
    state: 'listed',
    portfolio: [TWO_LEVEL],
    body: {
      kind: 'service',
      title: 'Fiddle yards, sector plates and two-level storage frames',
      description:
        'Storage for your layout built as its own board: fiddle yard frames, sector plate bases and two-level ' +
        'frames with the storage deck below the scene. Built to your drawing or ours.',
      builds: ['fiddle-yards', 'two-level-benchwork'],
      townId: TOWN.carlow,
      serviceAreaKm: 120,
      leadTimeWeeks: 8,
      materialsSupplied: ['timber', 'sheet', 'fixings'],
      currency: 'EUR',
      rateCard: {
        perMetreFrameMinor: 5_500,
        perSquareMetreTopMinor: 3_800,
        perLegSetMinor: 7_000,
        perSecondLevelMinor: 12_000,
        deliveryPerKmMinor: 70,
        materialsMarkupBp: 1_000,
      },
    },
  },
  {
    slug: 'brackenfold-room-benchwork',
    seller: BRACKENFOLD,
    state: 'listed',
    portfolio: [TWO_LEVEL, PORTABLE],
    body: {
      kind: 'service',
      title: 'Around-the-room benchwork for lofts, sheds and spare rooms',
      description:
        'Fixed benchwork fitted round your room: open-frame or solid-top, wall-bracketed or on legs, with ' +
        'lift-out sections across doorways. Measured and fitted on site around Shropshire and the Marches.',
      builds: ['fixed-benchwork', 'two-level-benchwork', 'legs-and-trestles'],
      townId: TOWN.shrewsbury,
      serviceAreaKm: 70,
      leadTimeWeeks: 10,
      materialsSupplied: ['timber', 'sheet', 'fixings', 'legs'],
      currency: 'GBP',
      rateCard: {
        perMetreFrameMinor: 3_800,
        perSquareMetreTopMinor: 2_500,
        perLegSetMinor: 4_500,
        perSecondLevelMinor: 7_500,
        deliveryPerKmMinor: 50,
        materialsMarkupBp: 1_500,
      },
    },
  },
  {
    slug: 'brackenfold-legs-trestles',
    seller: BRACKENFOLD,
    state: 'awaiting_review',
    portfolio: [PORTABLE],
    body: {
      kind: 'service',
      title: 'Folding legs and trestles for exhibition layouts',
      description:
        'Sets of folding legs with adjustable feet, made to bring your rail-top to the height your club shows ' +
        'at. Also trestles for fiddle yards and operating wells.',
      builds: ['legs-and-trestles'],
      townId: TOWN.ludlow,
      serviceAreaKm: 80,
      leadTimeWeeks: 4,
      materialsSupplied: ['timber', 'legs', 'fixings'],
      currency: 'GBP',
      rateCard: {
        perMetreFrameMinor: 0,
        perSquareMetreTopMinor: 0,
        perLegSetMinor: 4_800,
        perSecondLevelMinor: 0,
        deliveryPerKmMinor: 50,
        materialsMarkupBp: 1_500,
      },
    },
  },
];
