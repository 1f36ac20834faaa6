/**
 * Limits on one plan. Every plan is worked out again as the user types, in the browser; these keep that to a
 * fraction of a second and stop a mistyped number (a 300 m wall, 5000 boards) from freezing the tab.
 */
export const PLAN_LIMITS = {
  /** Boards in the whole plan, every level and lift-out included. */
  maxBoards: 60,
  /** Walls in one room. */
  maxWalls: 12,
  /** Length of one wall, mm (30 m). */
  maxWallLengthMm: 30_000,
  /** A board shorter than this is not worth a frame of its own, mm. */
  minBoardLengthMm: 300,
  /** A board narrower than this leaves no room for track between its rails, mm. */
  minBoardWidthMm: 150,
  /** Stock lengths offered at once. */
  maxStockLengths: 12,
  /** Suppliers compared at once. */
  maxSuppliers: 10,
  /** Priced items in one supplier's list. */
  maxItemsPerSupplier: 200,
  /** Accessory wire pairs run alongside the track feed. */
  maxAccessoryPairs: 6,
  /** Characters in a name (board, wall, supplier). */
  maxNameLength: 60,
} as const;
