import type { SheetPiece } from './sheet-input';
import type { CutOrientation, Rect } from './sheet-types';

/**
 * A sheet as a tree of guillotine cuts: every node is a piece of the sheet that is either still free (an offcut),
 * a part, or cut straight through, edge to edge, into one or two smaller pieces. Any layout built this way can be
 * cut on a panel saw by making each node's cut after its parent's.
 */
export interface CutNode {
  rect: Rect;
  state: NodeState;
}

/** What a node has become. */
export type NodeState =
  | { kind: 'free' }
  | { kind: 'part'; piece: SheetPiece; rotated: boolean }
  | { kind: 'split'; orientation: CutOrientation; position: number; children: CutNode[] };

/** A new, uncut sheet. */
export function sheetNode(width: number, height: number): CutNode {
  return { rect: { x: 0, y: 0, width, height }, state: { kind: 'free' } };
}

/**
 * Cuts a free node `offset` mm from its left (vertical) or bottom (horizontal) edge. The first child keeps
 * `offset` mm; the second starts one kerf further on and is left out when nothing wider than the blade remains.
 */
export function splitNode(node: CutNode, orientation: CutOrientation, offset: number, kerf: number): CutNode[] {
  const { x, y, width, height } = node.rect;
  const vertical = orientation === 'vertical';
  const rest = (vertical ? width : height) - offset - kerf;
  const first: CutNode = {
    rect: vertical ? { x, y, width: offset, height } : { x, y, width, height: offset },
    state: { kind: 'free' },
  };
  const children = [first];
  if (rest > 0) {
    const rect = vertical
      ? { x: x + offset + kerf, y, width: rest, height }
      : { x, y: y + offset + kerf, width, height: rest };
    children.push({ rect, state: { kind: 'free' } });
  }
  node.state = { kind: 'split', orientation, position: (vertical ? x : y) + offset, children };
  return children;
}

/**
 * Places a piece, `width` × `height` as laid, in the bottom-left corner of a free node: one cut through the whole
 * node (`firstCut`), then one through the strip holding the piece, each only when needed. Returns the new free
 * nodes left beside and above the piece.
 */
export function placeInNode(
  node: CutNode,
  piece: SheetPiece,
  rotated: boolean,
  firstCut: CutOrientation,
  kerf: number,
): CutNode[] {
  const width = rotated ? piece.height : piece.width;
  const height = rotated ? piece.width : piece.height;
  const free: CutNode[] = [];
  const along = (n: CutNode, orientation: CutOrientation, size: number): CutNode => {
    const full = orientation === 'vertical' ? n.rect.width : n.rect.height;
    if (size >= full) return n;
    const [strip, rest] = splitNode(n, orientation, size, kerf);
    if (rest) free.push(rest);
    return strip!;
  };
  const secondCut: CutOrientation = firstCut === 'vertical' ? 'horizontal' : 'vertical';
  const strip = along(node, firstCut, firstCut === 'vertical' ? width : height);
  const target = along(strip, secondCut, secondCut === 'vertical' ? width : height);
  target.state = { kind: 'part', piece, rotated };
  return free;
}
