import type { LayoutBoard } from '../boards/types';
import type { BoardPart } from '../cutting/types';
import { handlingAdvice, type HandlingAdvice } from '../engineering/handling';
import { TIMBER_CLASSES, type TimberClassId } from '../engineering/timber-data';
import { SHEET_MATERIALS } from '../engineering/sheet-data';
import { boardMass } from '../engineering/weight';

/** One board's mass as carried, legs included, with who should lift it. */
export interface BoardWeight {
  boardId: string;
  name: string;
  timberKg: number;
  sheetKg: number;
  totalKg: number;
  handling: HandlingAdvice;
}

/** Every board's mass and the whole plan's. */
export interface WeightPlan {
  boards: BoardWeight[];
  totalKg: number;
  /** The heaviest board, kg. */
  heaviestKg: number;
}

/**
 * Weighs each board from its parts: timber by volume × the class's mean density (ρmean, EN 338), sheet by area ×
 * thickness × the material's density. Legs and braces count with their board, as it is lifted with them on;
 * a wall batten does not, as it stays on the wall.
 */
export function planWeight(
  boards: readonly { board: LayoutBoard; parts: readonly BoardPart[] }[],
  timberClass: TimberClassId,
): WeightPlan {
  const density = TIMBER_CLASSES[timberClass].densityMeanKgM3;
  const weights = boards.map(({ board, parts }): BoardWeight => {
    const mass = boardMass({
      name: board.name,
      timber: parts.flatMap((p) =>
        p.material.type === 'timber' && p.kind !== 'wall-batten'
          ? [
              {
                lengthMm: p.lengthMm,
                widthMm: p.material.widthMm,
                thicknessMm: p.material.thicknessMm,
                quantity: p.quantity,
                densityKgM3: density,
              },
            ]
          : [],
      ),
      sheets: parts.flatMap((p) =>
        p.material.type === 'sheet'
          ? [
              {
                lengthMm: p.lengthMm,
                widthMm: p.widthMm!,
                thicknessMm: p.material.thicknessMm,
                densityKgM3: SHEET_MATERIALS[p.material.material].densityKgM3,
                quantity: p.quantity,
              },
            ]
          : [],
      ),
    });
    return {
      boardId: board.id,
      name: board.name,
      timberKg: mass.timberKg,
      sheetKg: mass.sheetKg,
      totalKg: mass.totalKg,
      handling: handlingAdvice(mass.totalKg),
    };
  });
  return {
    boards: weights,
    totalKg: weights.reduce((sum, w) => sum + w.totalKg, 0),
    heaviestKg: Math.max(0, ...weights.map((w) => w.totalKg)),
  };
}
