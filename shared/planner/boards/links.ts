import type { BoardJoin, LayoutBoard } from './types';

/** Boards in the order a run goes, and whether each is fixed to the next (the last to the first, for a loop). */
export interface BoardSequence {
  boards: LayoutBoard[];
  /** `linked[i]`: board i is fixed to board i + 1; the last entry links the last board to the first. */
  linked: boolean[];
}

/** The join between two fixed neighbours: through a lift-out, round a corner, or end to end along a wall. */
function joinOf(a: LayoutBoard, b: LayoutBoard): BoardJoin {
  const kind =
    a.source === 'lift-out' || b.source === 'lift-out'
      ? 'lift-out'
      : a.wallIndex !== b.wallIndex
        ? 'corner'
        : 'end-to-end';
  return { boardIds: [a.id, b.id], kind, level: a.level };
}

/**
 * The joins of a sequence and its runs of joined boards. A run starts just after an unjoined pair (a gap, an
 * unjoined corner), so a loop broken only by a doorway is one run from one side of the door to the other.
 */
export function linkSequence(sequence: BoardSequence): { joins: BoardJoin[]; runs: string[][] } {
  const { boards, linked } = sequence;
  const n = boards.length;
  if (n === 0) return { joins: [], runs: [] };
  const joins: BoardJoin[] = [];
  boards.forEach((board, i) => {
    if (linked[i] && n > 1) joins.push(joinOf(board, boards[(i + 1) % n]!));
  });
  const firstBreak = linked.findIndex((l, i) => i < n && !l);
  const start = firstBreak < 0 ? 0 : (firstBreak + 1) % n;
  const runs: string[][] = [];
  let current: string[] = [];
  for (let step = 0; step < n; step++) {
    const i = (start + step) % n;
    current.push(boards[i]!.id);
    if (!linked[i] || step === n - 1) {
      runs.push(current);
      current = [];
    }
  }
  return { joins, runs };
}

/** A sequence where each board is fixed to the next and the last to none: boards laid end to end. */
export function endToEnd(boards: LayoutBoard[]): BoardSequence {
  return { boards, linked: boards.map((_, i) => i < boards.length - 1) };
}
