import type { SheetMaterialId } from '../engineering/sheet-data';

/** What a part is for. */
export type PartKind =
  | 'side-rail'
  | 'end-rail'
  | 'cross-member'
  | 'leg'
  | 'leg-brace'
  | 'diagonal-brace'
  | 'wall-batten'
  | 'shelf-bearer'
  | 'top'
  | 'lower-shelf'
  | 'kickboard';

/** A length of timber of a section, sizes as built. */
export interface TimberMaterial {
  type: 'timber';
  sectionId: string;
  /** The wider face, mm. */
  widthMm: number;
  /** The narrower face, mm. */
  thicknessMm: number;
}

/** A piece of sheet. */
export interface SheetMaterial {
  type: 'sheet';
  material: SheetMaterialId;
  thicknessMm: number;
}

/** What a part is cut from. */
export type PartMaterial = TimberMaterial | SheetMaterial;

/** A part of one board, before parts alike are grouped. */
export interface BoardPart {
  kind: PartKind;
  material: PartMaterial;
  /** Length, whole mm; for a sheet part, the side along the sheet's face grain when `grain` is "along". */
  lengthMm: number;
  /** For a sheet part, its other side, whole mm. */
  widthMm?: number;
  quantity: number;
  /** For a sheet part: "along" keeps its length along the sheet's face grain (tops: stiffer between cross members). */
  grain?: 'along' | 'any';
}

/** One row of the cutting list: parts alike across the plan, with how many each board takes. */
export interface CuttingListRow {
  /** Unique in the plan, e.g. "cross-member:uk-2x1:564"; the packers report cuts by it. */
  id: string;
  kind: PartKind;
  /** What the part is, for people: "Cross member". */
  name: string;
  material: PartMaterial;
  /** Groups the rows cut from one stock: "timber:uk-2x1:44x18" or "sheet:birch-ply:9". */
  materialKey: string;
  lengthMm: number;
  widthMm?: number;
  grain?: 'along' | 'any';
  quantity: number;
  boards: { boardId: string; boardName: string; quantity: number }[];
}
