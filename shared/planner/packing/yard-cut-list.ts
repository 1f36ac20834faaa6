import type { GuillotineCut, SheetCuttingPlan, SheetLayout } from './sheet-types';

/**
 * The plan as lines a timber yard can follow, one sheet after another, in mm. A rip runs along the sheet's long
 * side (with the face grain), a cross-cut across it; each is measured from the left or bottom edge of the piece
 * being cut and runs from edge to edge of that piece.
 */
export function yardCutList(plan: SheetCuttingPlan): string[] {
  const lines: string[] = [];
  plan.sheets.forEach((layout, i) => {
    const { width, height } = layout.sheet;
    lines.push(`Sheet ${i + 1} of ${plan.sheetCount} (${width} × ${height} mm):`);
    for (const cut of layout.cuts) lines.push(`  ${cut.order}. ${describeCut(cut, layout, plan.kerf)}`);
    if (layout.cuts.length === 0) lines.push('  No cuts: use the whole sheet.');
    lines.push(`  Gives: ${describePieces(layout)}.`);
    if (layout.offcuts.length > 0) {
      lines.push(`  Offcuts: ${layout.offcuts.map((o) => `${o.width} × ${o.height}`).join(', ')} mm.`);
    }
  });
  return lines;
}

function describeCut(cut: GuillotineCut, layout: SheetLayout, kerf: number): string {
  const { sheet } = layout;
  const { piece } = cut;
  const horizontal = cut.orientation === 'horizontal';
  const verb = horizontal === sheet.width >= sheet.height ? 'Rip' : 'Cross-cut';
  const offset = cut.position - (horizontal ? piece.y : piece.x);
  const length = cut.to - cut.from;
  const sizeOf = (across: number) => (horizontal ? `${piece.width} × ${across}` : `${across} × ${piece.height}`);
  const rest = (horizontal ? piece.height : piece.width) - offset - kerf;
  const gives = rest > 0 ? `${sizeOf(offset)} and ${sizeOf(rest)} mm` : `${sizeOf(offset)} mm; the rest goes to dust`;
  return `${verb} the ${pieceName(cut, layout)} at ${offset} mm (a full ${length} mm cut), giving ${gives}.`;
}

function pieceName(cut: GuillotineCut, layout: SheetLayout): string {
  const { piece } = cut;
  const { width, height } = layout.sheet;
  const size = `${piece.width} × ${piece.height} mm`;
  if (piece.width === width && piece.height === height) return `${size} sheet`;
  if (piece.width === width || piece.height === height) return `${size} strip`;
  return `${size} piece`;
}

function describePieces(layout: SheetLayout): string {
  const groups = new Map<string, { name: string; count: number }>();
  for (const p of layout.placements) {
    const name = `${p.label ?? p.partId} (${p.width} × ${p.height} mm${p.rotated ? ', turned' : ''})`;
    const group = groups.get(name) ?? { name, count: 0 };
    group.count++;
    groups.set(name, group);
  }
  return [...groups.values()].map((g) => (g.count > 1 ? `${g.count} × ${g.name}` : g.name)).join(', ');
}
