import { outlineOf } from './geometry';
import { type BoardSequence, endToEnd } from './links';
import type { Level, LayoutBoard } from './types';

/** A board given by its size, with its id and name filled in. */
export interface ExplicitBoard {
  id: string;
  name: string;
  lengthMm: number;
  widthMm: number;
  level: Level;
}

/**
 * Boards given by size on one level, laid end to end in the order given with their back edges in line, starting at
 * (0, `rowY`); each is fixed to the next, as portable modules bolted into a line.
 */
export function explicitSequence(boards: readonly ExplicitBoard[], level: Level, rowY: number): BoardSequence {
  let x = 0;
  const placed = boards
    .filter((b) => b.level === level)
    .map((b): LayoutBoard => {
      const placement = { x, y: rowY, rotationDeg: 0 };
      x += b.lengthMm;
      return {
        id: b.id,
        name: b.name,
        level,
        role: 'scenic',
        source: 'explicit',
        lengthMm: b.lengthMm,
        widthMm: b.widthMm,
        elevationMm: 0,
        placement,
        outline: outlineOf(placement, b.lengthMm, b.widthMm),
      };
    });
  return endToEnd(placed);
}
