/** A part cut from a length of timber; every part in one plan comes from the same section (e.g. 2x1 planed). */
export interface LinearPart {
  /** Unique within the plan; reported back on every cut. */
  id: string;
  /** Finished length, whole mm. */
  length: number;
  /** How many to cut (0 is allowed and cuts none). */
  quantity: number;
  /** What the part is for, e.g. "cross member"; carried through to the cut list. */
  label?: string;
}

/** A length the merchant sells, with its price when known. */
export interface StockLength {
  /** Whole mm. */
  length: number;
  /** Price of one length in minor units (e.g. pence). Price every stock length or none. */
  priceMinor?: number;
}

/** What the linear planner needs. */
export interface StockCuttingInput {
  parts: readonly LinearPart[];
  /** Lengths on sale; the UK merchants' lengths when left out. */
  stock?: readonly StockLength[];
  /** Width of one saw cut, mm (default 3). */
  kerf?: number;
  /** Length lost squaring one end of each bar before cutting, saw cut included, mm (default 0). */
  trimPerStock?: number;
}

/** One piece on a bar, in the order it is cut from the squared end. */
export interface BarCut {
  partId: string;
  length: number;
  label?: string;
}

/**
 * One bar of stock and what is cut from it.
 *
 * Kerf convention: every piece is followed by one saw cut, except that the last piece needs none when it runs
 * to the end of the bar — that is, when less than one kerf would be left after it (a sliver thinner than the
 * blade is waste, not a piece). So `used = trimPerStock + Σ piece lengths + kerf × sawCuts` and
 * `waste = stockLength − used`, never negative.
 */
export interface CutBar {
  stockLength: number;
  /** Price of this bar in minor units, when the stock is priced. */
  priceMinor?: number;
  cuts: BarCut[];
  /** Saw cuts made after the end trim: the number of pieces, or one fewer when the last runs to the bar's end. */
  sawCuts: number;
  used: number;
  waste: number;
}

/** The method that produced the returned plan. */
export type StockAlgorithm =
  | 'first-fit-decreasing'
  | 'best-fit-decreasing'
  | 'bar-fill-ratio'
  | 'bar-fill-longest'
  | 'bar-fill-anchored-ratio'
  | 'bar-fill-anchored-longest';

/** Nothing can do better than these. */
export interface StockLowerBound {
  /** Fewest bars of the longest stock that can hold every piece with its saw cuts. */
  bars: number;
  /** Total length of the parts, mm: the stock needed with no saw cuts and no offcuts. */
  length: number;
}

/** A cutting plan for one timber section. */
export interface StockCuttingPlan {
  /** Longest stock first. */
  bars: CutBar[];
  stockCount: number;
  totalStockLength: number;
  /** Sum of the bars' offcuts (saw cuts and end trims are not counted as waste). */
  totalWaste: number;
  /** totalWaste as a percentage of totalStockLength (0 when there are no bars). */
  wastePercent: number;
  lowerBound: StockLowerBound;
  algorithm: StockAlgorithm;
  /** The saw kerf and end trim the plan allows for, mm. */
  kerf: number;
  trimPerStock: number;
  /** Total price in minor units, when the stock is priced. */
  costMinor?: number;
}
