import type { LayoutBoard } from './boards/types';
import type { BoardPart, CuttingListRow, PartKind, PartMaterial } from './cutting/types';

/** What each kind of part is called, in the order the cutting list shows them. */
export const PART_NAMES: Readonly<Record<PartKind, string>> = {
  'side-rail': 'Side rail',
  'end-rail': 'End rail',
  'cross-member': 'Cross member',
  leg: 'Leg',
  'leg-brace': 'Leg brace',
  'diagonal-brace': 'Diagonal brace (cut ends to fit)',
  'wall-batten': 'Wall batten',
  'shelf-bearer': 'Shelf bearer',
  top: 'Top',
  'lower-shelf': 'Lower shelf (notch round the legs)',
  kickboard: 'Kickboard (scribe to the floor)',
};

const KIND_ORDER = Object.keys(PART_NAMES) as PartKind[];

/** The key that groups parts cut from one stock: a timber section at its sizes, or a sheet material and thickness. */
export function materialKey(material: PartMaterial): string {
  return material.type === 'timber'
    ? `timber:${material.sectionId}:${material.widthMm}x${material.thicknessMm}`
    : `sheet:${material.material}:${material.thicknessMm}`;
}

function rowId(part: BoardPart): string {
  const m = part.material;
  const stock = m.type === 'timber' ? m.sectionId : `${m.material}-${m.thicknessMm}`;
  const size = part.widthMm === undefined ? `${part.lengthMm}` : `${part.lengthMm}x${part.widthMm}`;
  return `${part.kind}:${stock}:${size}`;
}

/**
 * The cutting list: every part of every board, parts alike (same kind, stock and size) grouped into one row that
 * says how many each board takes. Timber first, then sheet; within each, by kind as listed in {@link PART_NAMES},
 * then longest first.
 */
export function cuttingList(boards: readonly { board: LayoutBoard; parts: readonly BoardPart[] }[]): CuttingListRow[] {
  const rows = new Map<string, CuttingListRow>();
  for (const { board, parts } of boards) {
    for (const part of parts) {
      const key = `${rowId(part)}|${materialKey(part.material)}`;
      let row = rows.get(key);
      if (row === undefined) {
        row = {
          id: uniqueId(rowId(part), rows),
          kind: part.kind,
          name: PART_NAMES[part.kind],
          material: part.material,
          materialKey: materialKey(part.material),
          lengthMm: part.lengthMm,
          ...(part.widthMm === undefined ? {} : { widthMm: part.widthMm, grain: part.grain ?? 'any' }),
          quantity: 0,
          boards: [],
        };
        rows.set(key, row);
      }
      row.quantity += part.quantity;
      row.boards.push({ boardId: board.id, boardName: board.name, quantity: part.quantity });
    }
  }
  return [...rows.values()].sort(compareRows);
}

/** Two sections of one id measured differently give two rows of one kind and size: number the second. */
function uniqueId(id: string, rows: ReadonlyMap<string, CuttingListRow>): string {
  const taken = new Set([...rows.values()].map((r) => r.id));
  let candidate = id;
  for (let n = 2; taken.has(candidate); n++) candidate = `${id}-${n}`;
  return candidate;
}

/** Plain code-unit order: the same everywhere, and without the cost of loading a locale's collation. */
const compareText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

function compareRows(a: CuttingListRow, b: CuttingListRow): number {
  const type = (r: CuttingListRow) => (r.material.type === 'timber' ? 0 : 1);
  return (
    type(a) - type(b) ||
    compareText(a.materialKey, b.materialKey) ||
    KIND_ORDER.indexOf(a.kind) - KIND_ORDER.indexOf(b.kind) ||
    b.lengthMm - a.lengthMm ||
    (b.widthMm ?? 0) - (a.widthMm ?? 0)
  );
}
