import { outlineOf, splitEvenly, toRoom, wallCorners } from './geometry';
import type { BoardSequence } from './links';
import { runPieces, type RoomShape, type RunPiece, wallAfter, wallRun } from './room-runs';
import type { LayoutBoard } from './types';

/** The room and how its shelves are split and joined. */
export interface RoomPlan extends RoomShape {
  maxBoardLengthMm: number;
  cornersJoined: boolean;
}

interface Stretch {
  board: LayoutBoard;
  wallIndex: number;
  fromMm: number;
  toMm: number;
}

/**
 * The lower-level boards round a room, in order clockwise, with which neighbours are fixed together. Each wall's
 * shelf (see {@link runPieces} for the corner convention) is split into the fewest equal boards no longer than the
 * longest allowed; a lift-out across the opening is a board of its own, and a gap is left clear.
 */
export function roomSequence(room: RoomPlan): BoardSequence {
  const corners = wallCorners(room.walls.map((w) => w.lengthMm));
  const stretches: Stretch[] = [];
  const countOnWall = new Map<number, number>();
  for (const piece of runPieces(room)) {
    if (piece.kind === 'gap') continue;
    const lengths =
      piece.kind === 'lift-out'
        ? [piece.toMm - piece.fromMm]
        : splitEvenly(piece.toMm - piece.fromMm, room.maxBoardLengthMm);
    let fromMm = piece.fromMm;
    for (const lengthMm of lengths) {
      const number = (countOnWall.get(piece.wallIndex) ?? 0) + (piece.kind === 'shelf' ? 1 : 0);
      countOnWall.set(piece.wallIndex, number);
      const board = makeBoard(room, piece, fromMm, lengthMm, number, corners[piece.wallIndex]!);
      stretches.push({ board, wallIndex: piece.wallIndex, fromMm, toMm: fromMm + lengthMm });
      fromMm += lengthMm;
    }
  }
  const linked = stretches.map((a, i) => {
    const b = stretches[(i + 1) % stretches.length]!;
    return stretches.length > 1 && isFixedTo(room, a, b);
  });
  return { boards: stretches.map((s) => s.board), linked };
}

function makeBoard(
  room: RoomPlan,
  piece: RunPiece,
  fromMm: number,
  lengthMm: number,
  number: number,
  corner: { x: number; y: number },
): LayoutBoard {
  const wall = room.walls[piece.wallIndex]!;
  const rotationDeg = 90 * piece.wallIndex;
  const placement = { ...toRoom({ ...corner, rotationDeg }, fromMm, 0), rotationDeg };
  const liftOut = piece.kind === 'lift-out';
  return {
    id: liftOut ? `wall-${piece.wallIndex + 1}-lift-out` : `wall-${piece.wallIndex + 1}-${number}`,
    name: liftOut ? `${wall.name} lift-out` : `${wall.name} ${number}`,
    level: 'lower',
    role: 'scenic',
    source: liftOut ? 'lift-out' : 'room',
    wallIndex: piece.wallIndex,
    lengthMm,
    widthMm: room.shelfDepthMm,
    elevationMm: 0,
    placement,
    outline: outlineOf(placement, lengthMm, room.shelfDepthMm),
  };
}

/** Whether board `b` follows straight on from board `a`: along one wall with no gap, or round a joined corner. */
function isFixedTo(room: RoomPlan, a: Stretch, b: Stretch): boolean {
  if (a.wallIndex === b.wallIndex) return a.toMm === b.fromMm;
  const intoCorner = a.toMm === room.walls[a.wallIndex]!.lengthMm;
  const fromCorner = b.fromMm === wallRun(room, b.wallIndex).fromMm;
  return room.cornersJoined && wallAfter(room, a.wallIndex) === b.wallIndex && intoCorner && fromCorner;
}
