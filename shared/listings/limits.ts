/** Limits on listings, stated to sellers up front and enforced by the shared schemas. */
export const LISTING_LIMITS = {
  titleMin: 8,
  titleMax: 100,
  descriptionMin: 30,
  descriptionMax: 5000,
  notesMax: 1000,
  /** Sizes of one board, mm. */
  lengthMm: { min: 150, max: 3000 },
  widthMm: { min: 100, max: 1500 },
  heightMm: { min: 20, max: 1500 },
  boardCount: { min: 1, max: 20 },
  deckGapMm: { min: 100, max: 800 },
  frameMemberMm: { min: 6, max: 150 },
  crossMemberSpacingMm: { min: 100, max: 1000 },
  topThicknessMm: { min: 3, max: 30 },
  busWireMm2: { min: 0.1, max: 6 },
  tracksPerEnd: 8,
  railTopHeightMm: { min: 0, max: 2000 },
  /** Whole minor units (pence, cent): up to 100 000.00. */
  priceMinor: { min: 1, max: 10_000_000 },
  deliveryKm: { min: 1, max: 800 },
  weightKg: { min: 0.1, max: 500 },
  serviceAreaKm: { min: 1, max: 1000 },
  leadTimeWeeks: { min: 1, max: 104 },
  rateMinor: { max: 10_000_000 },
  /** Basis points: 10 000 is 100 %. */
  markupBp: { max: 10_000 },
  /** How far a seller's approximate position may lie from the chosen town. */
  positionFromTownKm: 30,
  reasonMin: 3,
  reasonMax: 500,
  searchTextMax: 200,
  searchPageSizeMax: 48,
  withinKmMax: 1000,
  profileToleranceMmMax: 50,
} as const;
