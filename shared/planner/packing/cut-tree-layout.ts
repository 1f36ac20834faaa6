import type { CutNode } from './cut-tree';
import type { CutOrientation, GuillotineCut, Placement, Rect, SheetLayout, SheetStock } from './sheet-types';

interface PendingCut {
  cut: Omit<GuillotineCut, 'order'>;
  stage: number;
  visit: number;
}

/**
 * Reads a finished cut tree into a sheet layout. Cuts are ordered by stage — every cut through the whole sheet
 * and its same-direction remainders first, then the cuts across the strips they make, and so on — and within a
 * stage in tree order, so each cut comes after the cut that freed its piece.
 */
export function toSheetLayout(root: CutNode, sheet: SheetStock): SheetLayout {
  const placements: Placement[] = [];
  const offcuts: Rect[] = [];
  const pending: PendingCut[] = [];
  const walk = (node: CutNode, parentOrientation: CutOrientation | undefined, stage: number): void => {
    const { state, rect } = node;
    if (state.kind === 'free') offcuts.push({ ...rect });
    else if (state.kind === 'part') {
      const placement: Placement = { partId: state.piece.partId, ...rect, rotated: state.rotated };
      if (state.piece.label !== undefined) placement.label = state.piece.label;
      placements.push(placement);
    } else {
      const here = parentOrientation === undefined || parentOrientation === state.orientation ? stage : stage + 1;
      const vertical = state.orientation === 'vertical';
      const from = vertical ? rect.y : rect.x;
      const to = vertical ? rect.y + rect.height : rect.x + rect.width;
      const cut = { orientation: state.orientation, position: state.position, from, to, piece: { ...rect } };
      pending.push({ cut, stage: here, visit: pending.length });
      for (const child of state.children) walk(child, state.orientation, here);
    }
  };
  walk(root, undefined, 0);
  pending.sort((a, b) => a.stage - b.stage || a.visit - b.visit);
  const usedArea = placements.reduce((sum, p) => sum + p.width * p.height, 0);
  const layout: SheetLayout = {
    sheet: { width: sheet.width, height: sheet.height },
    placements,
    cuts: pending.map((p, i) => ({ ...p.cut, order: i + 1 })),
    usedArea,
    wasteArea: sheet.width * sheet.height - usedArea,
    offcuts,
  };
  if (sheet.priceMinor !== undefined) layout.priceMinor = sheet.priceMinor;
  return layout;
}
