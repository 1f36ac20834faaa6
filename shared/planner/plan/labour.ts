import type { BoardPart } from '../cutting/types';
import type { FrameLayout } from '../frame/types';
import type { LayoutBoard } from '../boards/types';

/** A builder's rates, minor units. */
export interface RateCard {
  perMetreFrameMinor: number;
  perSquareMetreTopMinor: number;
  perLegSetMinor: number;
  perSecondLevelMinor: number;
  deliveryPerKmMinor: number;
  deliveryKm: number;
  materialsMarkupBasisPoints: number;
}

/** One line of the labour bill. */
export interface LabourLine {
  what: string;
  quantity: number;
  unit: 'm' | 'm²' | 'set' | 'board' | 'km';
  rateMinor: number;
  /** quantity × rate, rounded to the nearest minor unit. */
  totalMinor: number;
}

/** The labour bill: each line rounded to a whole minor unit, then added up. */
export interface LabourCost {
  lines: LabourLine[];
  totalMinor: number;
}

/**
 * Labour by the rate card: metres of frame timber (every timber part but legs), square metres of sheet fitted
 * (tops, shelves, kickboards), one leg set per board on its own legs, each upper-level board, and delivery by km.
 */
export function labourCost(
  boards: readonly { board: LayoutBoard; frame: FrameLayout; parts: readonly BoardPart[] }[],
  rates: RateCard,
): LabourCost {
  const all = boards.flatMap((b) => b.parts);
  const frameM = all
    .filter((p) => p.material.type === 'timber' && p.kind !== 'leg')
    .reduce((sum, p) => sum + (p.lengthMm * p.quantity) / 1000, 0);
  const sheetM2 = all
    .filter((p) => p.material.type === 'sheet')
    .reduce((sum, p) => sum + (p.lengthMm * (p.widthMm ?? 0) * p.quantity) / 1e6, 0);
  const legSets = boards.filter((b) => b.frame.support === 'legs').length;
  const upper = boards.filter((b) => b.board.level === 'upper').length;
  const line = (what: string, quantity: number, unit: LabourLine['unit'], rateMinor: number): LabourLine => ({
    what,
    quantity,
    unit,
    rateMinor,
    totalMinor: Math.round(quantity * rateMinor),
  });
  const lines = [
    line('Frame timber', frameM, 'm', rates.perMetreFrameMinor),
    line('Tops, shelves and kickboards', sheetM2, 'm²', rates.perSquareMetreTopMinor),
    line('Leg sets', legSets, 'set', rates.perLegSetMinor),
    line('Second-level boards', upper, 'board', rates.perSecondLevelMinor),
    line('Delivery', rates.deliveryKm, 'km', rates.deliveryPerKmMinor),
  ].filter((l) => l.quantity > 0);
  return { lines, totalMinor: lines.reduce((sum, l) => sum + l.totalMinor, 0) };
}
