import { MIN_LEVEL_CLEARANCE_MM, MIN_ROOM_BETWEEN_LEGS_MM } from '../defaults';
import { lengthText as len } from '../text/lengths';
import type { CheckContext, FieldProblem } from './check-context';

/** The narrowest board whose frame and legs fit across it, mm. */
export function narrowestBoardMm(ctx: CheckContext): number {
  const legs = ctx.legs === undefined ? 0 : 2 * ctx.legs.thicknessMm;
  return Math.ceil(2 * ctx.frame.thicknessMm + legs + MIN_ROOM_BETWEEN_LEGS_MM);
}

/** Problems with boards given by size: too big for one sheet, ids used twice, upper boards with no height. */
export function explicitBoardProblems(ctx: CheckContext): FieldProblem[] {
  const { input } = ctx;
  const problems: FieldProblem[] = [];
  if (input.boards.length === 0 && input.room === undefined) {
    problems.push({ path: ['boards'], message: 'Add at least one board, or describe a room to plan boards round.' });
  }
  const seen = new Set<string>();
  input.boards.forEach((board, i) => {
    problems.push(...boardSizeProblems(board, i, ctx));
    if (board.id !== undefined && seen.has(board.id)) {
      problems.push({
        path: ['boards', i, 'id'],
        message: `Two boards have the id "${board.id}"; give each board its own.`,
      });
    }
    if (board.id !== undefined) seen.add(board.id);
    if (board.level === 'upper' && input.secondLevel === undefined) {
      problems.push({
        path: ['boards', i, 'level'],
        message:
          'An upper-level board needs a second level, to say how far above the lower level it is; add one, or put ' +
          'the board on the lower level.',
      });
    }
  });
  return problems;
}

function boardSizeProblems(board: { lengthMm: number; widthMm: number }, i: number, ctx: CheckContext): FieldProblem[] {
  const problems: FieldProblem[] = [];
  if (board.lengthMm > ctx.sheetLongMm) {
    problems.push({
      path: ['boards', i, 'lengthMm'],
      message: `Board length must be at most ${len(ctx.sheetLongMm)}, the sheet’s length, so its top is one piece; split it in two.`,
    });
  }
  if (board.widthMm > ctx.sheetShortMm) {
    problems.push({
      path: ['boards', i, 'widthMm'],
      message: `Board width must be at most ${len(ctx.sheetShortMm)}, the sheet’s width, so its top is one piece.`,
    });
  }
  const narrowest = narrowestBoardMm(ctx);
  if (Math.min(board.lengthMm, board.widthMm) < narrowest) {
    problems.push({
      path: ['boards', i, 'widthMm'],
      message: `Board width must be at least ${len(narrowest)} to fit the frame and legs across it.`,
    });
  }
  return problems;
}

/** Problems with the second level: too close above the first, or no boards chosen. */
export function secondLevelProblems(ctx: CheckContext): FieldProblem[] {
  const second = ctx.input.secondLevel;
  if (second === undefined) return [];
  const problems: FieldProblem[] = [];
  const least = ctx.boardDepthMm + MIN_LEVEL_CLEARANCE_MM;
  if (second.heightAboveMm < least) {
    problems.push({
      path: ['secondLevel', 'heightAboveMm'],
      message:
        `Height between levels must be at least ${len(least)}: the upper frame and top take ${len(ctx.boardDepthMm)} ` +
        'and trains need room beneath.',
    });
  }
  if (second.which === 'selected' && (second.boardIds ?? []).length === 0) {
    problems.push({
      path: ['secondLevel', 'boardIds'],
      message: 'Choose the boards to build the second level over, or build it over every board.',
    });
  }
  return problems;
}

/** Problems with what hangs under the boards: a lower shelf or kickboards without legs, or too tall to fit. */
export function underBoardProblems(ctx: CheckContext): FieldProblem[] {
  const { input, boardDepthMm } = ctx;
  const supports = input.construction.supports;
  if (supports.kind !== 'legs') {
    const parts = [
      ['lowerShelf', 'A lower shelf needs'],
      ['kickboards', 'Kickboards need'],
    ] as const;
    return parts
      .filter(([key]) => input[key] !== undefined)
      .map(([key, label]) => ({
        path: [key],
        message: `${label} legs to fix to; stand the boards on legs, or remove it.`,
      }));
  }
  const problems: FieldProblem[] = [];
  const underFrameMm = supports.heightMm - boardDepthMm;
  const shelf = input.lowerShelf;
  if (shelf !== undefined && shelf.heightMm + shelf.sheetThicknessMm > underFrameMm) {
    problems.push({
      path: ['lowerShelf', 'heightMm'],
      message: `Lower shelf height must be at most ${len(Math.floor(underFrameMm - shelf.sheetThicknessMm))}, below the frame.`,
    });
  }
  const kick = input.kickboards;
  if (kick !== undefined && kick.heightMm + kick.floorFallMm > underFrameMm) {
    problems.push({
      path: ['kickboards', 'heightMm'],
      message: `Kickboard height and floor fall together must be at most ${len(underFrameMm)}, the space under the frame.`,
    });
  }
  return problems;
}

/** Problems with measured sections: a thickness larger than the width would stand a rail on its side. */
export function sectionProblems(ctx: CheckContext): FieldProblem[] {
  const sections = [
    [['construction', 'frameSection', 'thicknessMm'], ctx.frame],
    [['construction', 'supports', 'thicknessMm'], ctx.legs],
  ] as const;
  return sections
    .filter(([, section]) => section !== undefined && section.thicknessMm > section.widthMm)
    .map(([path]) => ({
      path: [...path],
      message: 'Section thickness must not be more than its width; swap the two sizes.',
    }));
}
