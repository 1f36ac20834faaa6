import type { CuttingListRow } from '@shared/planner';
import { SHEET_MATERIALS, standardSection } from '@shared/planner/engineering';

/** What a part is cut from, in words: "2x1 timber (44 × 18 mm)" or "Birch plywood, 9 mm". */
export function materialName(material: CuttingListRow['material']): string {
  if (material.type === 'timber') {
    const nominal = standardSection(material.sectionId).nominal;
    return `${nominal} timber (${+material.widthMm.toFixed(1)} × ${+material.thicknessMm.toFixed(1)} mm)`;
  }
  return `${SHEET_MATERIALS[material.material].name}, ${material.thicknessMm} mm`;
}

/** Which boards take a part: every name when few, else a count. */
export function boardsTaking(row: CuttingListRow): string {
  if (row.boards.length <= 4) return row.boards.map((b) => `${b.boardName} × ${b.quantity}`).join('; ');
  const each = new Set(row.boards.map((b) => b.quantity));
  return each.size === 1 ? `${row.boards.length} boards, ${[...each][0]} each` : `${row.boards.length} boards`;
}
