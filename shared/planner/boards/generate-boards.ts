import { explicitSequence, type ExplicitBoard } from './explicit-boards';
import { levelRoles, type SecondLevel, upperSequence } from './levels';
import { type BoardSequence, linkSequence } from './links';
import { type RoomPlan, roomSequence } from './room-boards';
import type { BoardLayout, LayoutBoard } from './types';

/** What the generator needs: boards given by size, a room, a second level. */
export interface LayoutInput {
  boards: readonly ExplicitBoard[];
  room?: RoomPlan;
  secondLevel?: SecondLevel;
}

/** Space left between a room's shelves and the row of boards given by size, on drawings, mm. */
export const ROW_GAP_MM = 500;

/**
 * Every board of the plan, placed, with its joins and its runs of joined boards: the room's shelves split into
 * boards, the boards given by size laid end to end in a row below the room, and a second level over the chosen
 * lower boards. Upper boards given by size stand in their own row over the same ground.
 */
export function generateBoards(input: LayoutInput): BoardLayout {
  const roles = levelRoles(input.secondLevel);
  const room = input.room === undefined ? undefined : roomSequence(input.room);
  const roomBottom =
    room === undefined ? -ROW_GAP_MM : Math.max(0, ...room.boards.map((b) => b.outline.y + b.outline.height));
  const rowY = roomBottom + ROW_GAP_MM;
  const lower = [room, explicitSequence(input.boards, 'lower', rowY)].filter((s) => s !== undefined);
  const upper = input.secondLevel === undefined ? [] : lower.map((s) => upperSequence(s, input.secondLevel!));
  const givenUpper = explicitSequence(input.boards, 'upper', rowY);
  const elevationMm = input.secondLevel?.heightAboveMm ?? 0;
  const explicitUpper = { ...givenUpper, boards: givenUpper.boards.map((b) => ({ ...b, elevationMm })) };

  const carried = new Map(upper.flatMap((s) => s.boards).map((b) => [b.carriedBy!, b.id]));
  const withRoles = (s: BoardSequence, role: LayoutBoard['role']): BoardSequence => ({
    ...s,
    boards: s.boards.map((b) => withCarries({ ...b, role }, carried.get(b.id))),
  });
  const sequences = [
    ...lower.map((s) => withRoles(s, roles.lower)),
    ...upper.map((s) => withRoles(s, roles.upper)),
    withRoles(explicitUpper, roles.upper),
  ];
  const layout: BoardLayout = { boards: [], joins: [], runs: [] };
  for (const sequence of sequences) {
    const { joins, runs } = linkSequence(sequence);
    layout.boards.push(...sequence.boards);
    layout.joins.push(...joins);
    layout.runs.push(...runs);
  }
  return layout;
}

function withCarries(board: LayoutBoard, carries: string | undefined): LayoutBoard {
  return carries === undefined ? board : { ...board, carries };
}
