import type { PlanRect } from '../boards/types';

/** What holds a board up. */
export type SupportKind =
  /** Its own legs, one inside each corner and pairs along the sides as needed. */
  | 'legs'
  /** The legs of the lower board beneath it, run up through both levels. */
  | 'carried'
  /** A batten on the wall under its back edge, brackets under its front. */
  | 'brackets'
  /** Its ends rest on its neighbours (a lift-out). */
  | 'ends';

/**
 * A board's ladder frame: two side rails along its longer side, an end rail across each end between them, and cross
 * members between them at no more than the spacing. "Along" distances are measured on the longer side from the
 * board's start end (its own x when it is longer than wide, its own y otherwise).
 */
export interface FrameLayout {
  /** True when the side rails run along the board's length (the usual case); false for a board wider than long. */
  railsAlongLength: boolean;
  longMm: number;
  shortMm: number;
  /** The frame section's narrower face, mm: the thickness of each rail seen from above. */
  railThicknessMm: number;
  /** The frame section's wider face, mm: the depth of each rail on edge. */
  railDepthMm: number;
  /** Length of the end rails and cross members, which fit between the side rails, mm. */
  innerLengthMm: number;
  /**
   * Centres of the cross members along the board, mm. Count rule: the distance between the end rails' centres is
   * split into the fewest equal bays no wider than the spacing; a cross member stands between each pair of bays.
   */
  crossMemberCentresMm: number[];
  /** Centre-to-centre width of each bay the top spans, mm. */
  bayMm: number;
  support: SupportKind;
  /** Centres along the board of each pair of legs (own or carried), mm; empty otherwise. */
  legPairCentresMm: number[];
  /** Centres along the board of each bracket, mm; empty unless on brackets. */
  bracketCentresMm: number[];
  /** Longest length of side rail between supports, mm: the span its sag is checked over. */
  railSpanMm: number;
  /** Members in the board's own coordinates, for drawing. */
  drawing: { sideRails: PlanRect[]; endRails: PlanRect[]; crossMembers: PlanRect[]; legs: PlanRect[] };
}
