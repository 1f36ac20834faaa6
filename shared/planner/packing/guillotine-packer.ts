import { placeInNode, sheetNode, type CutNode } from './cut-tree';
import { fitsSheet, type SheetPiece } from './sheet-input';
import type { CutOrientation, SheetStock } from './sheet-types';

/** Which free piece takes the next part: least area left over, or the closest fit on the shorter side. */
export type FreeRectRule = 'best-area' | 'best-short-side';

/**
 * Which cut to make first around a placed part: 'shorter-leftover' cuts so the larger leftover spans the full
 * piece; 'max-area' keeps the single largest offcut; 'rip-first' always cuts along the sheet's long side first,
 * giving strips the yard rips off and then cross-cuts.
 */
export type SplitRule = 'shorter-leftover' | 'max-area' | 'rip-first';

/** One packing run's settings. */
export interface GuillotineSettings {
  fit: FreeRectRule;
  split: SplitRule;
  kerf: number;
  /** Sheet sizes in the order a new sheet is taken: the first that holds the part. */
  kinds: readonly SheetStock[];
}

/** A sheet in use: its size, its cut tree and the free pieces left on it. */
export interface PackedSheet {
  kind: SheetStock;
  root: CutNode;
  free: CutNode[];
}

const BOTH_WAYS = [false, true] as const;
const STRAIGHT_ONLY = [false] as const;

interface Choice {
  sheet: PackedSheet;
  node: CutNode;
  rotated: boolean;
  score: [number, number];
}

/**
 * Guillotine packing: each piece, in the order given, goes to the best free piece on any open sheet (both ways
 * round when it may turn), split off by one or two edge-to-edge cuts; a new sheet is opened only when nothing has
 * room. Returns null when some piece fits no sheet size.
 */
export function packGuillotine(pieces: readonly SheetPiece[], settings: GuillotineSettings): PackedSheet[] | null {
  const sheets: PackedSheet[] = [];
  const useful = usefulNodeTest(pieces);
  for (const piece of pieces) {
    let choice = bestChoice(sheets, piece, settings.fit);
    if (!choice) {
      const kind = settings.kinds.find((k) => fitsSheet(piece, k));
      if (!kind) return null;
      const root = sheetNode(kind.width, kind.height);
      const sheet = { kind, root, free: [root] };
      sheets.push(sheet);
      choice = bestChoice([sheet], piece, settings.fit)!;
    }
    const { sheet, node, rotated } = choice;
    const firstCut = chooseFirstCut(node, piece, rotated, settings.split, sheet.kind);
    const left = placeInNode(node, piece, rotated, firstCut, settings.kerf).filter(useful);
    sheet.free.splice(sheet.free.indexOf(node), 1, ...left);
  }
  return sheets;
}

/** A test for free pieces too narrow or too short for any piece; they stay offcuts but are not searched again. */
function usefulNodeTest(pieces: readonly SheetPiece[]): (node: CutNode) => boolean {
  let minWidth = Infinity;
  let minHeight = Infinity;
  for (const p of pieces) {
    minWidth = Math.min(minWidth, p.canRotate ? Math.min(p.width, p.height) : p.width);
    minHeight = Math.min(minHeight, p.canRotate ? Math.min(p.width, p.height) : p.height);
  }
  return (node) => node.rect.width >= minWidth && node.rect.height >= minHeight;
}

function bestChoice(sheets: readonly PackedSheet[], piece: SheetPiece, fit: FreeRectRule): Choice | undefined {
  let best: Choice | undefined;
  for (const sheet of sheets) {
    for (const node of sheet.free) {
      for (const rotated of piece.canRotate && piece.width !== piece.height ? BOTH_WAYS : STRAIGHT_ONLY) {
        const w = rotated ? piece.height : piece.width;
        const h = rotated ? piece.width : piece.height;
        const { width, height } = node.rect;
        if (w > width || h > height) continue;
        const short = Math.min(width - w, height - h);
        const long = Math.max(width - w, height - h);
        const score: [number, number] = fit === 'best-area' ? [width * height - w * h, short] : [short, long];
        if (!best || score[0] < best.score[0] || (score[0] === best.score[0] && score[1] < best.score[1])) {
          best = { sheet, node, rotated, score };
        }
      }
    }
  }
  return best;
}

function chooseFirstCut(
  node: CutNode,
  piece: SheetPiece,
  rotated: boolean,
  rule: SplitRule,
  kind: SheetStock,
): CutOrientation {
  const { width, height } = node.rect;
  const w = rotated ? piece.height : piece.width;
  const h = rotated ? piece.width : piece.height;
  if (rule === 'rip-first') return kind.width >= kind.height ? 'horizontal' : 'vertical';
  if (rule === 'shorter-leftover') return width - w < height - h ? 'horizontal' : 'vertical';
  // A horizontal first cut leaves width × (height − h) above; a vertical one leaves (width − w) × height beside.
  return width * (height - h) >= (width - w) * height ? 'horizontal' : 'vertical';
}
