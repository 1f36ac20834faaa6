import type { BoardLayout } from './boards/types';
import { PlanInputError } from './errors';
import { PLAN_LIMITS } from './limits';
import type { ParsedPlanInput } from './schema';

/**
 * Checks that need the boards generated: the board count (a room's shelves may split into more boards than a browser
 * should plan as the user types), ids given that clash with generated ones, and second-level boards that do not exist.
 * Throws a {@link PlanInputError} naming the field to change.
 */
export function checkLayout(layout: BoardLayout, input: ParsedPlanInput): void {
  const fields: Record<string, string> = {};
  const count = layout.boards.length;
  if (count > PLAN_LIMITS.maxBoards) {
    const field = input.room === undefined ? 'boards' : 'room.maxBoardLengthMm';
    fields[field] =
      `This plan makes ${count} boards; at most ${PLAN_LIMITS.maxBoards} can be planned at once. ` +
      'Make the boards longer, use fewer walls or levels, or plan the layout in parts.';
  }
  const counts = new Map<string, number>();
  for (const board of layout.boards) counts.set(board.id, (counts.get(board.id) ?? 0) + 1);
  input.boards.forEach((board, i) => {
    if ((counts.get(board.id) ?? 0) > 1) {
      fields[`boards.${i}.id`] = `Board id "${board.id}" is also the id of a board the plan makes; choose another.`;
    }
  });
  const lowerIds = new Set(layout.boards.filter((b) => b.level === 'lower').map((b) => b.id));
  (input.secondLevel?.boardIds ?? []).forEach((id, k) => {
    if (!lowerIds.has(id)) {
      const some = [...lowerIds].slice(0, 5).join(', ');
      fields[`secondLevel.boardIds.${k}`] =
        `No lower board has id "${id}"; choose from ${some}${lowerIds.size > 5 ? ', …' : ''}.`;
    }
  });
  if (Object.keys(fields).length > 0) throw new PlanInputError(fields);
}
