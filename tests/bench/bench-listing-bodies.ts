import type { ModuleBody, ServiceBody } from '../support/listing-bodies';
import {
  BUILD_KINDS,
  FINISHES,
  FINISH_LABELS,
  JOIN_METHODS,
  SUPPLIED_MATERIALS,
} from '../../shared/listings/vocabulary';
import { scaleById } from '../../shared/scales';

/** Invented listing bodies for the benchmark's 20,000 listings: a realistic spread, drawn from a seeded generator. */
export type Random = () => number;

const pick = <T>(rnd: Random, items: readonly T[]): T => items[Math.floor(rnd() * items.length)]!;
const between = (rnd: Random, low: number, high: number, step = 1) =>
  low + Math.floor((rnd() * (high - low)) / step) * step;

/** Scales weighted roughly as the trade sells them: OO and N most, narrow gauge and the large scales few. */
const SCALE_WEIGHTS: [string, number][] = [
  ['oo', 34],
  ['n', 20],
  ['h0', 11],
  ['0', 6],
  ['tt', 5],
  ['oo9', 5],
  ['nmra-ho', 3],
  ['h0-m', 3],
  ['0-e', 2],
  ['h0-e', 2],
  ['nmra-n', 2],
  ['s', 1],
  ['nmra-o', 1],
  ['z', 1],
  ['tt-m', 1],
  ['i', 1],
  ['ii', 1],
  ['ii-m', 1],
];
const SCALE_TOTAL = SCALE_WEIGHTS.reduce((sum, [, w]) => sum + w, 0);

function scaleOf(rnd: Random): string {
  let roll = rnd() * SCALE_TOTAL;
  for (const [id, weight] of SCALE_WEIGHTS) if ((roll -= weight) < 0) return id;
  return 'oo';
}

const FEATURES = [
  'through station',
  'branch terminus',
  'country halt',
  'fiddle yard',
  'goods yard',
  'junction',
  'viaduct',
  'harbour',
  'slate quarry',
  'engine shed',
  'level crossing',
  'canal wharf',
  'market town',
  'colliery sidings',
  'loco depot',
  'sawmill',
  'roadside tramway',
  'mountain pass',
  'coastal line',
  'cassette dock',
  'sector plate',
  'corner board',
  'double-track straight',
  'test plank',
  'industrial estate',
  'river bridge',
  'cutting',
  'embankment',
  'tunnel mouth',
  'signal box',
];
const OPENINGS = ['Compact', 'Exhibition', 'Portable', 'Club-built', 'Rural', 'Urban', 'Long', 'Weathered', 'Light'];
const EXTRAS = [
  'Ballast glued and weathered.',
  'Backscene included.',
  'Legs fold flat for transport.',
  'Point motors are mounted below the top.',
  'Buildings are card kits.',
  'Some scenery needs touching up.',
  'Stored in a dry loft.',
  'Has been to three exhibitions.',
  'Track cleaned and tested last month.',
  'Ideal for a first layout.',
  'Sold as the owner is downsizing.',
  'Fascia painted dark green.',
  'Lighting strip fitted under the pelmet.',
  'Uncoupling magnets under the sidings.',
];

/** Collection mostly, delivery or a courier sometimes; always at least one way. */
function handling(rnd: Random): ModuleBody['handling'] {
  const delivery =
    rnd() < 0.4 ? { withinKm: between(rnd, 20, 150, 10), priceMinor: between(rnd, 1000, 6000, 500) } : null;
  const courier = rnd() < 0.3 ? 'parcel' : rnd() < 0.3 ? 'pallet' : null;
  return { collection: rnd() < 0.8 || (!delivery && !courier), delivery, courier };
}

/** A module as a seller might list it: words, sizes, construction and price that go together. */
export function benchModule(rnd: Random, townId: number, currency: 'GBP' | 'EUR'): ModuleBody {
  const scaleId = scaleOf(rnd);
  const scale = scaleById(scaleId)!;
  const feature = pick(rnd, FEATURES);
  const finish = pick(rnd, FINISHES);
  const width = between(rnd, 250, 750, 50);
  const spacing = Math.max(20, Math.round(scale.gaugeMm * 3.2));
  const tracks = between(rnd, 1, Math.max(2, Math.min(5, Math.floor(width / spacing))));
  const first = between(rnd, Math.min(spacing, width / 2), Math.max(spacing + 1, width - tracks * spacing));
  const offsets = Array.from({ length: tracks }, (_, i) => first + i * spacing);
  const control = rnd() < 0.6 ? 'dcc' : rnd() < 0.7 ? 'dc' : null;
  const topped = finish !== 'bare-frame';
  const boards = between(rnd, 1, 4);
  const spacingMm = pick(rnd, [300, 350, 400, 450]);
  const wiring = control ? `Wired for ${control.toUpperCase()} with a 1.5 mm² bus.` : 'No wiring yet.';
  return {
    kind: 'module',
    title: `${pick(rnd, OPENINGS)} ${scale.label} ${feature}${boards > 1 ? `, ${boards} boards` : ''}`,
    description: [
      `A ${feature} in ${scale.label} on a planed softwood frame with cross members at ${spacingMm} mm centres.`,
      `${FINISH_LABELS[finish]}. ${wiring}`,
      `End profile: ${tracks} track${tracks > 1 ? 's' : ''} at ${offsets.join(', ')} mm from the front edge.`,
      pick(rnd, EXTRAS),
      pick(rnd, EXTRAS),
    ].join(' '),
    scaleId,
    lengthMm: between(rnd, 400, 2400, 50),
    widthMm: width,
    heightMm: between(rnd, 60, 400, 10),
    boardCount: boards,
    joinMethod: pick(rnd, JOIN_METHODS),
    levels: rnd() < 0.1 ? { type: 'two-level', deckGapMm: between(rnd, 200, 400, 10) } : { type: 'single' },
    construction: {
      frameDepthMm: pick(rnd, [44, 69]),
      frameThicknessMm: 18,
      crossMemberSpacingMm: spacingMm,
      topMaterial: topped ? pick(rnd, ['birch-plywood', 'poplar-plywood', 'insulation-foam', 'mdf'] as const) : 'none',
      topThicknessMm: topped ? pick(rnd, [6, 9, 12]) : null,
      supports: pick(rnd, ['legs', 'wall-brackets', 'none'] as const),
    },
    wiring: control ? { control, busWireMm2: 1.5, boardConnectors: '15-pin D connectors' } : null,
    endProfiles: {
      a: { trackOffsetsMm: offsets, railTopHeightMm: between(rnd, 900, 1250, 10), railTopFrom: 'floor' },
      b: { trackOffsetsMm: rnd() < 0.8 ? offsets : [], railTopHeightMm: 1060, railTopFrom: 'floor' },
    },
    finish,
    condition: pick(rnd, ['as-new', 'sound', 'sound', 'worn', 'needs-repair'] as const),
    conditionNotes: 'Honest wear for its age; see the photos for the details.',
    priceMinor: Math.round((Math.exp(3 + rnd() * 4) * 100) / 50) * 50 + 500,
    currency,
    townId,
    handling: handling(rnd),
    weightKg: between(rnd, 2, 30),
  };
}

/** A builder's service around their town. */
export function benchService(rnd: Random, townId: number, currency: 'GBP' | 'EUR'): ServiceBody {
  const builds = BUILD_KINDS.filter(() => rnd() < 0.5);
  return {
    kind: 'service',
    title: `${pick(rnd, ['Benchwork', 'Module frames', 'Fiddle yards', 'Baseboards'])} built to order, ${pick(rnd, FEATURES)}s a speciality`,
    description: `Frames in planed softwood with birch ply tops, to your drawing or your club's end profile. ${pick(rnd, EXTRAS)}`,
    builds: builds.length ? builds : ['portable-modules'],
    townId,
    serviceAreaKm: between(rnd, 20, 200, 10),
    leadTimeWeeks: between(rnd, 2, 16),
    materialsSupplied: SUPPLIED_MATERIALS.filter(() => rnd() < 0.5),
    currency,
    rateCard: {
      perMetreFrameMinor: between(rnd, 2000, 6000, 100),
      perSquareMetreTopMinor: between(rnd, 1500, 4000, 100),
      perLegSetMinor: between(rnd, 3000, 8000, 100),
      perSecondLevelMinor: between(rnd, 5000, 12000, 100),
      deliveryPerKmMinor: between(rnd, 30, 90),
      materialsMarkupBp: between(rnd, 500, 2000, 100),
    },
  };
}
