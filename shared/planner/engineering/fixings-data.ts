/** Screw length as a multiple of the thickness of the piece being fixed. */
export const SCREW_LENGTH_FACTOR = 2.5; // published (trade guides)

/** The least share of a screw's length that must sit in the base piece. */
export const MIN_SHARE_IN_BASE = 2 / 3; // published (trade guides)

/** Screw lengths commonly stocked, mm, shortest first. */
export const STOCK_SCREW_LENGTHS_MM: readonly number[] = [16, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80]; // from memory

/** Wood left between a screw's tip and the far face of the base piece, mm, so the point never shows. */
export const FAR_FACE_COVER_MM = 2; // common practice, no source

/** Drill sizes for a wood screw gauge in softwood, mm. */
export interface ScrewGauge {
  nominalMm: number;
  /** Pilot hole in the base piece: a range where the charts give one; `pilotMm` is the size advised. */
  pilotRangeMm: { min: number; max: number };
  pilotMm: number;
  /** Clearance hole through the piece being fixed. */
  clearanceMm: number;
}

/** Screw gauges offered, thinnest first. */
export const SCREW_GAUGES: readonly ScrewGauge[] = [
  {
    nominalMm: 3,
    pilotRangeMm: { min: 2, max: 2 }, // published (woodworking charts)
    pilotMm: 2, // published (woodworking charts)
    clearanceMm: 3.2, // published (woodworking charts)
  },
  {
    nominalMm: 3.5,
    pilotRangeMm: { min: 2, max: 2.5 }, // not in the woodworking charts: between their 3 mm and 4 mm rows
    pilotMm: 2, // not in the woodworking charts: between their 3 mm and 4 mm rows
    clearanceMm: 3.7, // not in the woodworking charts: nominal + 0.2 mm, as their rows are
  },
  {
    nominalMm: 4,
    pilotRangeMm: { min: 2.5, max: 3 }, // published (woodworking charts)
    pilotMm: 3, // common practice, no source
    clearanceMm: 4.2, // published (woodworking charts)
  },
  {
    nominalMm: 5,
    pilotRangeMm: { min: 3, max: 3 }, // published (woodworking charts)
    pilotMm: 3, // published (woodworking charts)
    clearanceMm: 5.2, // published (woodworking charts)
  },
];

/** Countersink (head) diameter as a multiple of the screw's nominal diameter; the head sits flush. */
export const COUNTERSINK_FACTOR = 2; // from memory / common practice, no source

/** The gauge chosen for a screw length when none is asked for: thicker screws for longer lengths. */
export const GAUGE_BY_LENGTH: readonly { upToLengthMm: number; gaugeMm: number }[] = [
  { upToLengthMm: 30, gaugeMm: 3.5 }, // common practice, no source
  { upToLengthMm: 50, gaugeMm: 4 }, // common practice, no source
  { upToLengthMm: Infinity, gaugeMm: 5 }, // common practice, no source
];

/** Screws in each butt joint of the frame (each end of a rail or cross member). */
export const SCREWS_PER_BUTT_JOINT = 2; // common practice, no source

/** Screws per leg: two through each of the two rails meeting at the corner. */
export const SCREWS_PER_LEG = 4; // common practice, no source

/** Spacing of the screws holding the top sheet down, around its edge and along each cross member, mm. */
export const TOP_SCREW_SPACING_MM = 150; // common practice, no source

/** Bolts or dowels at each join between two boards. */
export const JOIN_FIXINGS_PER_END = 2; // common practice, no source

/** Coach bolts joining boards: M8 with wing nuts so they undo by hand. */
export const JOIN_BOLT = {
  diameterMm: 8, // common practice, no source
  clearanceHoleMm: 9, // from memory (medium clearance hole for M8)
  /** Thread left for washer and wing nut past the timber, as a multiple of the diameter. */
  nutAllowanceDiameters: 1.5, // common practice, no source
};

/** Coach bolt lengths commonly stocked, mm, shortest first. */
export const STOCK_BOLT_LENGTHS_MM: readonly number[] = [40, 50, 60, 70, 80, 90, 100, 120, 150]; // from memory

/** PVA spread on one face of a glued joint, g/m². */
export const PVA_SPREAD_G_PER_M2 = 180; // from memory (makers give about 150–200 g/m²)
