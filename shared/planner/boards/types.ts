/*
 * Room coordinates: x to the right and y down, as on a screen, in mm; the first wall runs along the top from the
 * origin. A board's own coordinates: x along its length from its start end, y across its width from its back edge
 * (the wall side in a room). Draw a board's own shapes with `translate(x, y) rotate(rotationDeg)` (SVG's rotation,
 * clockwise on screen).
 */

/** An axis-aligned rectangle, mm. */
export interface PlanRect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Where a board's own coordinates sit in the room: its start-back corner, and the way its length runs. */
export interface Placement {
  x: number;
  y: number;
  /** 0: length runs to the right; 90: down; 180: left; 270: up. */
  rotationDeg: number;
}

/** The level a board is on; a one-level plan uses only the lower. */
export type Level = 'lower' | 'upper';

/** What a level is for. */
export type LevelRole = 'scenic' | 'storage';

/** Where a board came from. */
export type BoardSource = 'explicit' | 'room' | 'lift-out';

/** One board of the layout, placed. */
export interface LayoutBoard {
  /** Unique in the plan: the given id, "wall-2-1" (wall 2's first board), "wall-4-lift-out", or "…-upper". */
  id: string;
  name: string;
  level: Level;
  role: LevelRole;
  source: BoardSource;
  /** The wall it runs along, counting from 0, for boards of a room. */
  wallIndex?: number;
  lengthMm: number;
  widthMm: number;
  /** Height of its top above the lower level's top, mm (0 on the lower level). */
  elevationMm: number;
  placement: Placement;
  /** The board's outline in room coordinates. */
  outline: PlanRect;
  /** On the upper level: the lower board under it, whose legs run up to carry it too. */
  carriedBy?: string;
  /** On the lower level: the upper board its legs carry. */
  carries?: string;
}

/** How two neighbouring boards meet. */
export type JoinKind = 'end-to-end' | 'corner' | 'lift-out';

/** Two boards fixed together. */
export interface BoardJoin {
  /** The two boards, in the order the run goes. */
  boardIds: [string, string];
  kind: JoinKind;
  level: Level;
}

/** The boards of a plan, how they join, and the runs of joined boards a bus wire follows. */
export interface BoardLayout {
  boards: LayoutBoard[];
  joins: BoardJoin[];
  /** Boards joined one to the next, in order, one list per run; every board is in exactly one. */
  runs: string[][];
}
