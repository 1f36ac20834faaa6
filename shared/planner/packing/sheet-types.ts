/**
 * Sheet coordinates: x runs along the sheet's `width` (the long side of a standard sheet, the way its face grain
 * runs), y along its `height`, from one corner; all values whole mm.
 */

/** 'along': the part's width must run along the sheet's width (the face grain), so it is never turned. */
export type Grain = 'along' | 'any';

/** A rectangular part cut from sheet material: a top, shelf, kickboard… */
export interface SheetPart {
  /** Unique within the plan. */
  id: string;
  width: number;
  height: number;
  quantity: number;
  label?: string;
  grain?: Grain;
}

/** A sheet size on sale, with its price when known. */
export interface SheetStock {
  width: number;
  height: number;
  /** Price of one sheet in minor units. Price every size or none. */
  priceMinor?: number;
}

/** What the sheet planner needs. */
export interface SheetCuttingInput {
  parts: readonly SheetPart[];
  /** Sizes on sale (one material); a standard 2440 × 1220 mm sheet when left out. */
  sheets?: readonly SheetStock[];
  /** Width of one saw cut, mm (default 3). */
  kerf?: number;
  /** Whether parts may be turned a quarter turn; parts with grain 'along' never are (default true). */
  allowRotation?: boolean;
}

/** An axis-aligned rectangle on a sheet. */
export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Where one piece of a part lies on its sheet (width and height as placed). */
export interface Placement extends Rect {
  partId: string;
  label?: string;
  /** True when the part's width runs along the sheet's height. */
  rotated: boolean;
}

/** 'vertical': a line of constant x; 'horizontal': a line of constant y. */
export type CutOrientation = 'vertical' | 'horizontal';

/**
 * One straight saw cut through a piece, from one edge to the other. The kerf lies on the far side of `position`:
 * a vertical cut at x = p keeps [piece.x, p) on one side and starts the other at p + kerf.
 */
export interface GuillotineCut {
  orientation: CutOrientation;
  /** x of a vertical cut, y of a horizontal one. */
  position: number;
  /** Where the cut starts and ends along its line: the piece's edges. */
  from: number;
  to: number;
  /** 1 for the first cut on the sheet. */
  order: number;
  /** The piece being cut, as it lies on the sheet. */
  piece: Rect;
}

/** One sheet and how to cut it. */
export interface SheetLayout {
  sheet: { width: number; height: number };
  priceMinor?: number;
  placements: Placement[];
  /** In the order to make them: every cut on the whole sheet first, then on the strips, and so on. */
  cuts: GuillotineCut[];
  /** Area of the placed parts, mm². */
  usedArea: number;
  /** Sheet area less the parts: offcuts and saw dust, mm². */
  wasteArea: number;
  /** Pieces left over once every cut is made. */
  offcuts: Rect[];
}

/** A cutting plan for one sheet material. */
export interface SheetCuttingPlan {
  sheets: SheetLayout[];
  sheetCount: number;
  totalSheetArea: number;
  usedArea: number;
  wasteArea: number;
  /** wasteArea as a percentage of totalSheetArea (0 when there are no sheets). */
  wastePercent: number;
  /** Fewest sheets of the largest size that can hold the parts' area, and that area (mm²). */
  lowerBound: { sheets: number; area: number };
  /** The heuristic and settings that produced this plan, for people. */
  algorithm: string;
  /** The saw kerf the plan allows for, mm. */
  kerf: number;
  costMinor?: number;
}
