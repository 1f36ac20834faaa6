import type { z } from 'zod';
import type { moduleListingSchema, serviceListingSchema } from '../../shared/schemas/listings';

/** Gazetteer ids (GeoNames) of towns the tests use. */
export const TOWNS = {
  crewe: 2652002,
  nantwich: 2641892,
  stoke: 2636841,
  chester: 2653228,
  manchester: 2643123,
  derby: 2651347,
  york: 2633352,
  london: 2643743,
  dublin: 2964574,
} as const;

export type ModuleBody = z.input<typeof moduleListingSchema>;
export type ServiceBody = z.input<typeof serviceListingSchema>;

/** A complete module listing body, as the form would send it. */
export function moduleBody(overrides: Partial<ModuleBody> = {}): ModuleBody {
  return {
    kind: 'module',
    title: 'OO branch terminus module, two boards',
    description: 'Two boards of 44 × 18 mm planed timber with a 9 mm birch ply top, track laid and wired for DCC.',
    scaleId: 'oo',
    lengthMm: 1200,
    widthMm: 450,
    heightMm: 120,
    boardCount: 2,
    joinMethod: 'pattern-makers-dowels',
    levels: { type: 'single' },
    construction: {
      frameDepthMm: 44,
      frameThicknessMm: 18,
      crossMemberSpacingMm: 400,
      topMaterial: 'birch-plywood',
      topThicknessMm: 9,
      supports: 'legs',
    },
    wiring: { control: 'dcc', busWireMm2: 1.5, boardConnectors: '15-pin D connectors' },
    endProfiles: {
      a: { trackOffsetsMm: [150, 196], railTopHeightMm: 1050, railTopFrom: 'floor' },
      b: { trackOffsetsMm: [150], railTopHeightMm: 1050, railTopFrom: 'floor' },
    },
    finish: 'wired-running',
    condition: 'sound',
    conditionNotes: 'Some ballast loose near the points; frame square and true.',
    priceMinor: 18_000,
    currency: 'GBP',
    townId: TOWNS.crewe,
    handling: { collection: true, delivery: null, courier: null },
    weightKg: 9.5,
    ...overrides,
  };
}

/** A complete build-service listing body. */
export function serviceBody(overrides: Partial<ServiceBody> = {}): ServiceBody {
  return {
    kind: 'service',
    title: 'Portable module frames built to order',
    description: 'Light, square module frames in planed softwood with ply tops, built to your club standard.',
    builds: ['portable-modules', 'legs-and-trestles'],
    townId: TOWNS.derby,
    serviceAreaKm: 80,
    leadTimeWeeks: 6,
    materialsSupplied: ['timber', 'sheet', 'fixings'],
    currency: 'GBP',
    rateCard: {
      perMetreFrameMinor: 4_500,
      perSquareMetreTopMinor: 3_000,
      perLegSetMinor: 6_000,
      perSecondLevelMinor: 9_000,
      deliveryPerKmMinor: 60,
      materialsMarkupBp: 1_500,
    },
    ...overrides,
  };
}
