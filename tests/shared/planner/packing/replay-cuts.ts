import type { Rect, SheetLayout } from '../../../../shared/planner/packing/sheet-types';

/**
 * Makes a sheet's cuts, in their order, on a fresh sheet, the way a yard would: each cut must run straight
 * across exactly one piece, edge to edge, and leaves the piece before it and the piece one kerf beyond it.
 * Returns the pieces left at the end, or a message saying which cut could not be made.
 */
export function replayCuts(layout: SheetLayout, kerf: number): Rect[] | string {
  let pieces: Rect[] = [{ x: 0, y: 0, width: layout.sheet.width, height: layout.sheet.height }];
  const cuts = [...layout.cuts].sort((a, b) => a.order - b.order);
  for (const [i, cut] of cuts.entries()) {
    if (cut.order !== i + 1) return `cut orders are not 1..n (found ${cut.order} at ${i + 1})`;
    const vertical = cut.orientation === 'vertical';
    const piece = pieces.find((p) => {
      const [start, size, edgeStart, edgeSize] = vertical
        ? [p.x, p.width, p.y, p.height]
        : [p.y, p.height, p.x, p.width];
      return (
        cut.position > start && cut.position < start + size && cut.from >= edgeStart && cut.to <= edgeStart + edgeSize
      );
    });
    if (!piece) return `cut ${cut.order} does not lie inside any piece`;
    const [edgeStart, edgeSize] = vertical ? [piece.y, piece.height] : [piece.x, piece.width];
    if (cut.from !== edgeStart || cut.to !== edgeStart + edgeSize) return `cut ${cut.order} stops short of an edge`;
    pieces = pieces.filter((p) => p !== piece).concat(split(piece, vertical, cut.position, kerf));
  }
  return pieces;
}

function split(piece: Rect, vertical: boolean, position: number, kerf: number): Rect[] {
  const { x, y, width, height } = piece;
  if (vertical) {
    const rest = x + width - (position + kerf);
    const first = { x, y, width: position - x, height };
    return rest > 0 ? [first, { x: position + kerf, y, width: rest, height }] : [first];
  }
  const rest = y + height - (position + kerf);
  const first = { x, y, width, height: position - y };
  return rest > 0 ? [first, { x, y: position + kerf, width, height: rest }] : [first];
}

/** A sortable key for comparing sets of rectangles. */
export function rectKey(r: Rect): string {
  return `${r.x},${r.y},${r.width},${r.height}`;
}
