import type { BoardWiring, PlannedBoard, PlanRect } from '@shared/planner';

/** A point in the board's own coordinates: x along its length from the start end, y across from the back edge. */
export interface Point {
  x: number;
  y: number;
}

/** One bus pair along the board. */
export interface WireLine {
  name: string;
  accessory: boolean;
  from: Point;
  to: Point;
}

/** One interval of a chain of dimensions, measured along the board's longer side. */
export interface ChainDimension {
  from: Point;
  to: Point;
  lengthMm: number;
}

/** Everything drawn on one board's plan view, in its own coordinates (mm). */
export interface BoardDrawingModel {
  lengthMm: number;
  widthMm: number;
  /** Whether the side rails (and the chain of cross-member centres) run along x. */
  alongX: boolean;
  sideRails: PlanRect[];
  endRails: PlanRect[];
  crossMembers: PlanRect[];
  legs: PlanRect[];
  wires: WireLine[];
  /** The drilling template: the same holes through every cross member. */
  holes: (Point & { r: number })[];
  droppers: Point[];
  /** End-rail centre to cross member to … to end-rail centre. */
  chain: ChainDimension[];
}

/**
 * The legs drawn under a board: only its own. An upper board carried by the legs of the board below stands on them,
 * so its frame has their positions (for its rail span) but no legs of its own to draw.
 */
export function ownLegs(board: PlannedBoard): PlanRect[] {
  return board.frame.support === 'legs' ? board.frame.drawing.legs : [];
}

/**
 * Lays a board's frame, wiring and drilling template out for drawing. The frame already gives its members in the
 * board's own coordinates; the wiring is measured along the longer side and across from the front edge, so it is
 * turned into the same coordinates here.
 */
export function boardDrawingModel(board: PlannedBoard, wiring: BoardWiring | undefined): BoardDrawingModel {
  const { frame } = board;
  const { shortMm, longMm, railThicknessMm: t } = frame;
  const at = (along: number, fromFront: number): Point => {
    const across = shortMm - fromFront;
    return frame.railsAlongLength ? { x: along, y: across } : { x: across, y: along };
  };
  const wires: WireLine[] = (wiring?.runs ?? []).map((run) => ({
    name: run.name,
    accessory: run.name !== 'track feed',
    from: at(0, run.acrossMm),
    to: at(longMm, run.acrossMm),
  }));
  const r = (wiring?.holes.diameterMm ?? 0) / 2;
  const holes = frame.crossMemberCentresMm.flatMap((c) =>
    (wiring?.holes.acrossMm ?? []).map((across) => ({ ...at(c, across), r })),
  );
  const feed = wiring?.runs.find((run) => !run.name.startsWith('accessory'))?.acrossMm ?? shortMm / 2;
  const droppers = (wiring?.droppers.alongMm ?? []).map((along) => at(along, feed));
  const stops = [t / 2, ...frame.crossMemberCentresMm, longMm - t / 2];
  const chain = stops.slice(1).map((stop, i) => ({
    from: at(stops[i]!, 0),
    to: at(stop, 0),
    lengthMm: Math.round((stop - stops[i]!) * 10) / 10,
  }));
  return {
    lengthMm: board.lengthMm,
    widthMm: board.widthMm,
    alongX: frame.railsAlongLength,
    ...frame.drawing,
    legs: ownLegs(board),
    wires,
    holes,
    droppers,
    chain,
  };
}

/**
 * How to write a chain's lengths: each bay's own when every label fits its bay at `fontMm` (an estimate of 0.6 em a
 * character), otherwise one line that sums them up ("4 bays of 275.7 mm").
 */
export function labelChain(
  chain: readonly ChainDimension[],
  fontMm: number,
  format: (mm: number) => string,
): { each: boolean; summary: string } {
  const each = chain.every((c) => format(c.lengthMm).length * fontMm * 0.6 <= c.lengthMm * 0.95);
  const lengths = chain.map((c) => c.lengthMm);
  const [min, max] = [Math.min(...lengths), Math.max(...lengths)];
  const size = max - min < 1 ? format(min) : `${format(min)} to ${format(max)}`;
  return { each, summary: `${lengths.length} bays of ${size}` };
}
