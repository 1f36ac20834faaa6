import type { BoardSequence } from './links';
import type { LayoutBoard, LevelRole } from './types';

/** The second level as the generator needs it. */
export interface SecondLevel {
  heightAboveMm: number;
  which: 'same-footprint' | 'selected';
  boardIds?: readonly string[];
  role: LevelRole;
}

/** The role of each level: the second level's own, and the other one below it. */
export function levelRoles(second: SecondLevel | undefined): { lower: LevelRole; upper: LevelRole } {
  if (second === undefined) return { lower: 'scenic', upper: 'scenic' };
  return { lower: second.role === 'scenic' ? 'storage' : 'scenic', upper: second.role };
}

/**
 * The upper level over a lower sequence: a copy of each chosen board at the same place, `heightAboveMm` above it,
 * carried on the lower board's legs run up through both levels. Copies are fixed together where their lower boards
 * are and both have a copy.
 */
export function upperSequence(lower: BoardSequence, second: SecondLevel): BoardSequence {
  const chosen = (b: LayoutBoard) => second.which === 'same-footprint' || (second.boardIds ?? []).includes(b.id);
  const n = lower.boards.length;
  const picked = lower.boards.map((b, i) => ({ b, i })).filter(({ b }) => chosen(b));
  const boards = picked.map(({ b }): LayoutBoard => ({
    ...b,
    id: `${b.id}-upper`,
    name: `${b.name} (upper)`,
    level: 'upper',
    role: second.role,
    elevationMm: second.heightAboveMm,
    carriedBy: b.id,
  }));
  const linked = picked.map(({ i }, k) => {
    const next = picked[(k + 1) % picked.length]!;
    return picked.length > 1 && lower.linked[i] === true && next.i === (i + 1) % n;
  });
  return { boards, linked };
}
