/**
 * The words a listing is described in: each list is stored by its keys, and shown by its labels. The names are the
 * trade's (cross member, fiddle yard, pattern-makers' dowels) or our own.
 */

/** Module or build service. */
export const LISTING_KINDS = ['module', 'service'] as const;
export type ListingKind = (typeof LISTING_KINDS)[number];

/** How far a module has got, from the bare timber to a finished scene, in order. */
export const FINISHES = [
  'bare-frame',
  'topped',
  'track-laid',
  'wired-running',
  'part-sceniced',
  'fully-sceniced',
] as const;
export type Finish = (typeof FINISHES)[number];
export const FINISH_LABELS: Record<Finish, string> = {
  'bare-frame': 'Bare frame (no top)',
  topped: 'Frame and top, ready for track',
  'track-laid': 'Track laid, not wired',
  'wired-running': 'Wired and running',
  'part-sceniced': 'Landform and some scenery',
  'fully-sceniced': 'Fully sceniced',
};

/** How the boards of a module fasten to each other and to their neighbours. */
export const JOIN_METHODS = ['bolts', 'dowels', 'pattern-makers-dowels', 'clamps', 'other'] as const;
export type JoinMethod = (typeof JOIN_METHODS)[number];
export const JOIN_METHOD_LABELS: Record<JoinMethod, string> = {
  bolts: 'Bolts (coach or carriage bolts with wing nuts)',
  dowels: 'Dowels',
  'pattern-makers-dowels': "Pattern-makers' dowels",
  clamps: 'Clamps',
  other: 'Other (see description)',
};

export const TOP_MATERIALS = [
  'birch-plywood',
  'softwood-plywood',
  'poplar-plywood',
  'mdf',
  'insulation-foam',
  'softboard',
  'other',
  'none',
] as const;
export type TopMaterial = (typeof TOP_MATERIALS)[number];
export const TOP_MATERIAL_LABELS: Record<TopMaterial, string> = {
  'birch-plywood': 'Birch plywood',
  'softwood-plywood': 'Softwood (spruce) plywood',
  'poplar-plywood': 'Poplar or pine plywood',
  mdf: 'MDF',
  'insulation-foam': 'Insulation foam board',
  softboard: 'Fibre softboard',
  other: 'Other (see description)',
  none: 'No top',
};

/** What holds the board up. */
export const SUPPORTS = ['legs', 'wall-brackets', 'none'] as const;
export type Support = (typeof SUPPORTS)[number];
export const SUPPORT_LABELS: Record<Support, string> = {
  legs: 'Legs',
  'wall-brackets': 'Wall brackets',
  none: 'None (stands on trestles or a table)',
};

export const CONDITIONS = ['as-new', 'sound', 'worn', 'needs-repair'] as const;
export type Condition = (typeof CONDITIONS)[number];
export const CONDITION_LABELS: Record<Condition, string> = {
  'as-new': 'As new',
  sound: 'Sound, signs of use',
  worn: 'Worn but usable',
  'needs-repair': 'Needs repair',
};

/** How the track is powered: analogue DC or digital command control. */
export const CONTROL_SYSTEMS = ['dc', 'dcc'] as const;
export type ControlSystem = (typeof CONTROL_SYSTEMS)[number];

/** Where a rail-top height is measured from. */
export const HEIGHT_REFERENCES = ['floor', 'frame'] as const;
export type HeightReference = (typeof HEIGHT_REFERENCES)[number];

/** Courier services a module fits. */
export const COURIER_SERVICES = ['parcel', 'pallet'] as const;
export type CourierService = (typeof COURIER_SERVICES)[number];

/** The handling options a buyer can filter by. */
export const HANDLING_OPTIONS = ['collection', 'delivery', 'parcel', 'pallet'] as const;
export type HandlingOption = (typeof HANDLING_OPTIONS)[number];
export const HANDLING_LABELS: Record<HandlingOption, string> = {
  collection: 'Collection',
  delivery: 'Seller delivers',
  parcel: 'Parcel courier',
  pallet: 'Pallet courier',
};

export const CURRENCIES = ['GBP', 'EUR'] as const;
export type Currency = (typeof CURRENCIES)[number];

/** What a builder offers to build. */
export const BUILD_KINDS = [
  'portable-modules',
  'fixed-benchwork',
  'two-level-benchwork',
  'fiddle-yards',
  'legs-and-trestles',
  'wiring',
] as const;
export type BuildKind = (typeof BUILD_KINDS)[number];
export const BUILD_KIND_LABELS: Record<BuildKind, string> = {
  'portable-modules': 'Portable modules',
  'fixed-benchwork': 'Fixed benchwork',
  'two-level-benchwork': 'Two-level benchwork',
  'fiddle-yards': 'Fiddle yards',
  'legs-and-trestles': 'Legs and trestles',
  wiring: 'Bus wiring and board connectors',
};

/** Materials a builder can supply as part of a job. */
export const SUPPLIED_MATERIALS = ['timber', 'sheet', 'fixings', 'legs', 'wiring'] as const;
export type SuppliedMaterial = (typeof SUPPLIED_MATERIALS)[number];
export const SUPPLIED_MATERIAL_LABELS: Record<SuppliedMaterial, string> = {
  timber: 'Frame timber',
  sheet: 'Sheet for tops',
  fixings: 'Screws, glue and bolts',
  legs: 'Legs',
  wiring: 'Wire and connectors',
};
