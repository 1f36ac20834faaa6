import { PLAN_LIMITS } from '../limits';
import { lengthText as len } from '../text/lengths';
import { wallRun, type RoomShape } from '../boards/room-runs';
import { narrowestBoardMm } from './check-boards';
import type { CheckContext, FieldProblem } from './check-context';
import type { PlanInputFields } from './object';

type Room = NonNullable<PlanInputFields['room']>;

const { minBoardLengthMm } = PLAN_LIMITS;

/** The room as the generator sees it, with the defaults that depend on other fields filled in. */
export function roomShape(room: Room): RoomShape {
  return {
    walls: room.walls,
    shelfDepthMm: room.shelfDepthMm,
    useWalls: [...new Set(room.useWalls ?? room.walls.map((_, i) => i))].sort((a, b) => a - b),
    closed: room.closed ?? room.walls.length >= 4,
    opening: room.opening,
  };
}

/** Problems with the room: walls not in it, shelves too short past a corner, an opening that does not fit. */
export function roomProblems(ctx: CheckContext): FieldProblem[] {
  const room = ctx.input.room;
  if (room === undefined) return [];
  const problems = wallChoiceProblems(room);
  if (problems.length > 0) return problems;
  const shape = roomShape(room);
  if (room.shelfDepthMm > ctx.sheetShortMm) {
    const message = `Shelf depth must be at most ${len(ctx.sheetShortMm)}, the sheet’s width, so each top is one piece.`;
    problems.push({ path: ['room', 'shelfDepthMm'], message });
  }
  if (room.shelfDepthMm < narrowestBoardMm(ctx)) {
    const message = `Shelf depth must be at least ${len(narrowestBoardMm(ctx))} to fit the frame and legs across it.`;
    problems.push({ path: ['room', 'shelfDepthMm'], message });
  }
  if (room.maxBoardLengthMm > ctx.sheetLongMm) {
    const message = `Longest board must be at most ${len(ctx.sheetLongMm)}, the sheet’s length, so each top is one piece.`;
    problems.push({ path: ['room', 'maxBoardLengthMm'], message });
  }
  for (const i of shape.useWalls) {
    const { fromMm, toMm } = wallRun(shape, i);
    if (toMm - fromMm < minBoardLengthMm) {
      problems.push({
        path: ['room', 'walls', i, 'lengthMm'],
        message:
          `Wall "${room.walls[i]!.name}" leaves ${len(toMm - fromMm)} of shelf past the corner; it needs at least ` +
          `${len(minBoardLengthMm)}. Make the shelf shallower or leave the wall out.`,
      });
    }
  }
  return [...problems, ...openingProblems(shape, ctx)];
}

function wallChoiceProblems(room: Room): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const count = room.walls.length;
  const seen = new Set<number>();
  (room.useWalls ?? []).forEach((wall, k) => {
    if (wall >= count) {
      const message = `The room has ${count} wall${count === 1 ? '' : 's'}; put shelves only along those.`;
      problems.push({ path: ['room', 'useWalls', k], message });
    } else if (seen.has(wall)) {
      const message = `Wall "${room.walls[wall]!.name}" is chosen twice for a shelf; choose it once.`;
      problems.push({ path: ['room', 'useWalls', k], message });
    }
    seen.add(wall);
  });
  if (room.closed === true && count < 4) {
    const message =
      'A room whose last wall meets the first needs at least four walls with square corners; add them all, or ' +
      'leave the room open.';
    problems.push({ path: ['room', 'closed'], message });
  }
  return problems;
}

function openingProblems(shape: RoomShape, ctx: CheckContext): FieldProblem[] {
  const opening = shape.opening;
  if (opening === undefined) return [];
  const at = (field: string, message: string): FieldProblem[] => [{ path: ['room', 'opening', field], message }];
  if (!shape.useWalls.includes(opening.wallIndex)) {
    const name = shape.walls[opening.wallIndex]?.name ?? 'a wall';
    return at(
      'wallIndex',
      `The doorway is in "${name}", which has no shelf; put a shelf along it or move the doorway.`,
    );
  }
  const wall = shape.walls[opening.wallIndex]!;
  const { fromMm, toMm } = wallRun(shape, opening.wallIndex);
  const end = opening.offsetMm + opening.widthMm;
  if (end > toMm) {
    return at(
      'offsetMm',
      `The doorway runs past the end of wall "${wall.name}" (${len(toMm)}); move it or make it narrower.`,
    );
  }
  if (opening.offsetMm < fromMm) {
    return at(
      'offsetMm',
      `The doorway starts inside the corner shelf; start it at least ${len(fromMm)} from the corner.`,
    );
  }
  for (const left of [opening.offsetMm - fromMm, toMm - end]) {
    if (left > 0 && left < minBoardLengthMm) {
      return at(
        'offsetMm',
        `The doorway leaves ${len(left)} of shelf beside it; move it up to the corner or at least ` +
          `${len(minBoardLengthMm)} from it.`,
      );
    }
  }
  if (opening.kind === 'lift-out' && opening.widthMm > ctx.sheetLongMm) {
    return at('widthMm', `A lift-out must be at most ${len(ctx.sheetLongMm)} long, the sheet’s length; make it a gap.`);
  }
  return [];
}
