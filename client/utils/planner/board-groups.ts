import type { BoardWiring, Plan, PlannedBoard } from '@shared/planner';

/** Boards built alike: one drawing stands for all of them. */
export interface BoardGroup {
  key: string;
  board: PlannedBoard;
  wiring: BoardWiring | undefined;
  names: string[];
}

/**
 * Groups boards whose frame and wiring are the same (a room's shelves give many alike), in the plan's order, so the
 * page draws each design once and names every board built to it.
 */
export function boardGroups(plan: Pick<Plan, 'boards' | 'wiring'>): BoardGroup[] {
  const wiringById = new Map(plan.wiring.boards.map((w) => [w.boardId, w]));
  const groups = new Map<string, BoardGroup>();
  for (const board of plan.boards) {
    const wiring = wiringById.get(board.id);
    const key = JSON.stringify([
      board.lengthMm,
      board.widthMm,
      board.frame,
      wiring?.runs,
      wiring?.holes,
      wiring?.droppers.alongMm,
    ]);
    const group = groups.get(key);
    if (group) group.names.push(board.name);
    else groups.set(key, { key, board, wiring, names: [board.name] });
  }
  return [...groups.values()];
}
