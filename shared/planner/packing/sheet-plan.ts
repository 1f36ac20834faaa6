import type { CutNode } from './cut-tree';
import { toSheetLayout } from './cut-tree-layout';
import type { SheetPiece, SheetProblem } from './sheet-input';
import type { SheetCuttingPlan, SheetStock } from './sheet-types';

/** Builds the plan and its totals from packed sheets. */
export function toSheetPlan(
  packed: readonly { root: CutNode; kind: SheetStock }[],
  problem: SheetProblem,
  algorithm: string,
): SheetCuttingPlan {
  const sheets = packed.map((s) => toSheetLayout(s.root, s.kind));
  const totalSheetArea = sheets.reduce((sum, s) => sum + s.sheet.width * s.sheet.height, 0);
  const usedArea = sheets.reduce((sum, s) => sum + s.usedArea, 0);
  const partsArea = problem.pieces.reduce((sum, p) => sum + p.width * p.height, 0);
  const largest = problem.kinds[0]!;
  const plan: SheetCuttingPlan = {
    sheets,
    sheetCount: sheets.length,
    totalSheetArea,
    usedArea,
    wasteArea: totalSheetArea - usedArea,
    wastePercent: totalSheetArea === 0 ? 0 : (100 * (totalSheetArea - usedArea)) / totalSheetArea,
    lowerBound: { sheets: Math.ceil(partsArea / (largest.width * largest.height)), area: partsArea },
    algorithm,
    kerf: problem.kerf,
  };
  if (problem.priced) plan.costMinor = sheets.reduce((sum, s) => sum + s.priceMinor!, 0);
  return plan;
}

/** The pieces placed in a cut tree. */
export function piecesIn(node: CutNode): SheetPiece[] {
  const { state } = node;
  if (state.kind === 'part') return [state.piece];
  if (state.kind === 'free') return [];
  return state.children.flatMap(piecesIn);
}

/**
 * Whether `a` beats `b`: lower cost when priced, then fewer sheets, then less sheet area, then fewer saw cuts
 * (yards often charge by the cut), then a larger best offcut (waste gathered in one reusable piece).
 */
export function isBetterSheetPlan(a: SheetCuttingPlan, b: SheetCuttingPlan): boolean {
  const keys = (p: SheetCuttingPlan) => [
    p.costMinor ?? 0,
    p.sheetCount,
    p.totalSheetArea,
    p.sheets.reduce((sum, s) => sum + s.cuts.length, 0),
    -largestOffcut(p),
  ];
  const keysA = keys(a);
  const keysB = keys(b);
  for (let i = 0; i < keysA.length; i++) if (keysA[i] !== keysB[i]) return keysA[i]! < keysB[i]!;
  return false;
}

function largestOffcut(plan: SheetCuttingPlan): number {
  let largest = 0;
  for (const sheet of plan.sheets) for (const o of sheet.offcuts) largest = Math.max(largest, o.width * o.height);
  return largest;
}
