/*
 * The shelf along each used wall of a room, as stretches measured along the wall from its starting corner (walls go
 * clockwise round the room). Corner convention: each wall's shelf runs right into the corner at its end; when the
 * wall before it also has a shelf, its own shelf starts one shelf depth from its starting corner, at the front edge
 * of the shelf already there. So every corner square belongs to exactly one wall and nothing overlaps.
 */

/** What the room generator needs to know about the room. */
export interface RoomShape {
  walls: readonly { name: string; lengthMm: number }[];
  shelfDepthMm: number;
  /** Indexes of walls with a shelf, ascending, each once. */
  useWalls: readonly number[];
  /** Whether the last wall meets the first. */
  closed: boolean;
  opening?: { wallIndex: number; offsetMm: number; widthMm: number; kind: 'gap' | 'lift-out' };
}

/** A stretch along one wall, mm from its starting corner: shelf, lift-out section, or a clear gap. */
export interface RunPiece {
  wallIndex: number;
  fromMm: number;
  toMm: number;
  kind: 'shelf' | 'lift-out' | 'gap';
}

/** The wall before `index` going clockwise, if it meets it at a corner. */
export function wallBefore(room: RoomShape, index: number): number | undefined {
  if (index > 0) return index - 1;
  return room.closed && room.walls.length > 1 ? room.walls.length - 1 : undefined;
}

/** The wall after `index` going clockwise, if it meets it at a corner. */
export function wallAfter(room: RoomShape, index: number): number | undefined {
  if (index < room.walls.length - 1) return index + 1;
  return room.closed && room.walls.length > 1 ? 0 : undefined;
}

/** The shelf along one used wall, before any opening: clear of the corner shelf before it, into the corner after. */
export function wallRun(room: RoomShape, index: number): { fromMm: number; toMm: number } {
  const before = wallBefore(room, index);
  const fromMm = before !== undefined && room.useWalls.includes(before) ? room.shelfDepthMm : 0;
  return { fromMm, toMm: room.walls[index]!.lengthMm };
}

/** Every stretch of every used wall in order, the opening (if any) splitting its wall's shelf. */
export function runPieces(room: RoomShape): RunPiece[] {
  const pieces: RunPiece[] = [];
  for (const wallIndex of room.useWalls) {
    const { fromMm, toMm } = wallRun(room, wallIndex);
    const opening = room.opening?.wallIndex === wallIndex ? room.opening : undefined;
    if (opening === undefined) {
      pieces.push({ wallIndex, fromMm, toMm, kind: 'shelf' });
      continue;
    }
    const openFrom = Math.max(opening.offsetMm, fromMm);
    const openTo = Math.min(opening.offsetMm + opening.widthMm, toMm);
    const stretches: RunPiece[] = [
      { wallIndex, fromMm, toMm: openFrom, kind: 'shelf' },
      { wallIndex, fromMm: openFrom, toMm: openTo, kind: opening.kind },
      { wallIndex, fromMm: openTo, toMm, kind: 'shelf' },
    ];
    pieces.push(...stretches.filter((s) => s.toMm > s.fromMm));
  }
  return pieces;
}
