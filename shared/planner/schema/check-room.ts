import { PLAN_LIMITS } from '../limits';
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
    const message = `Shelf depth must be at most ${ctx.sheetShortMm} mm, the sheet’s width, so each top is one piece.`;
    problems.push({ path: ['room', 'shelfDepthMm'], message });
  }
  if (room.shelfDepthMm < narrowestBoardMm(ctx)) {
    const message = `Shelf depth must be at least ${narrowestBoardMm(ctx)} mm to fit the frame and legs across it.`;
    problems.push({ path: ['room', 'shelfDepthMm'], message });
  }
  if (room.maxBoardLengthMm > ctx.sheetLongMm) {
    const message = `Longest board must be at most ${ctx.sheetLongMm} mm, the sheet’s length, so each top is one piece.`;
    problems.push({ path: ['room', 'maxBoardLengthMm'], message });
  }
  for (const i of shape.useWalls) {
    const { fromMm, toMm } = wallRun(shape, i);
    if (toMm - fromMm < minBoardLengthMm) {
      problems.push({
        path: ['room', 'walls', i, 'lengthMm'],
        message:
          `Wall "${room.walls[i]!.name}" leaves ${toMm - fromMm} mm of shelf past the corner; it needs at least ` +
          `${minBoardLengthMm} mm. Make the shelf shallower or leave the wall out.`,
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
      const message = `Wall ${wall} is not in the room: its walls are numbered 0 to ${count - 1}.`;
      problems.push({ path: ['room', 'useWalls', k], message });
    } else if (seen.has(wall)) {
      problems.push({ path: ['room', 'useWalls', k], message: `Wall ${wall} is listed twice; list it once.` });
    }
    seen.add(wall);
  });
  if (room.closed === true && count < 4) {
    const message =
      'A closed room needs at least four walls with square corners; list them all, or set closed to false.';
    problems.push({ path: ['room', 'closed'], message });
  }
  return problems;
}

function openingProblems(shape: RoomShape, ctx: CheckContext): FieldProblem[] {
  const opening = shape.opening;
  if (opening === undefined) return [];
  const at = (field: string, message: string): FieldProblem[] => [{ path: ['room', 'opening', field], message }];
  if (!shape.useWalls.includes(opening.wallIndex)) {
    return at(
      'wallIndex',
      `The opening is in wall ${opening.wallIndex}, which has no shelf; add it to useWalls or move it.`,
    );
  }
  const wall = shape.walls[opening.wallIndex]!;
  const { fromMm, toMm } = wallRun(shape, opening.wallIndex);
  const end = opening.offsetMm + opening.widthMm;
  if (end > toMm) {
    return at(
      'offsetMm',
      `The opening runs past the end of wall "${wall.name}" (${toMm} mm); move it or make it narrower.`,
    );
  }
  if (opening.offsetMm < fromMm) {
    return at(
      'offsetMm',
      `The opening starts inside the corner shelf; start it at least ${fromMm} mm from the corner.`,
    );
  }
  for (const left of [opening.offsetMm - fromMm, toMm - end]) {
    if (left > 0 && left < minBoardLengthMm) {
      return at(
        'offsetMm',
        `The opening leaves ${left} mm of shelf beside it; move it up to the corner or at least ${minBoardLengthMm} mm from it.`,
      );
    }
  }
  if (opening.kind === 'lift-out' && opening.widthMm > ctx.sheetLongMm) {
    return at('widthMm', `A lift-out must be at most ${ctx.sheetLongMm} mm long, the sheet’s length; make it a gap.`);
  }
  return [];
}
