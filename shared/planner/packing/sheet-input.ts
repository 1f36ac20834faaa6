import { lengthText as len } from '../text/lengths';
import { PlannerInputError } from './errors';
import { requireInteger, requirePieceCount, requirePricesAllOrNone, requireUniqueIds } from './input-checks';
import type { SheetCuttingInput, SheetStock } from './sheet-types';
import { DEFAULT_KERF_MM, STANDARD_SHEET_MM } from './trade-defaults';

/** One piece to cut: a single unit of a part's quantity. */
export interface SheetPiece {
  partId: string;
  label?: string;
  width: number;
  height: number;
  canRotate: boolean;
}

/** Checked input in the form the packer uses. */
export interface SheetProblem {
  pieces: SheetPiece[];
  /** Sizes on sale, largest area first. */
  kinds: SheetStock[];
  kerf: number;
  priced: boolean;
}

/** Whether a piece fits a sheet size in some orientation it may take. */
export function fitsSheet(piece: SheetPiece, sheet: SheetStock): boolean {
  const straight = piece.width <= sheet.width && piece.height <= sheet.height;
  return straight || (piece.canRotate && piece.height <= sheet.width && piece.width <= sheet.height);
}

/** Checks the input and expands it into pieces; throws {@link PlannerInputError} naming what to fix. */
export function toSheetProblem(input: SheetCuttingInput): SheetProblem {
  const kerf = input.kerf ?? DEFAULT_KERF_MM;
  requireInteger(kerf, 'The saw kerf (mm)', 0);
  const kinds: SheetStock[] = (input.sheets ?? [STANDARD_SHEET_MM]).map((s) => ({ ...s }));
  if (kinds.length === 0) throw new PlannerInputError('invalid-input', 'Add at least one sheet size to cut from.');
  for (const kind of kinds) {
    requireInteger(kind.width, 'A sheet width (mm)', 1);
    requireInteger(kind.height, 'A sheet height (mm)', 1);
  }
  kinds.sort((a, b) => b.width * b.height - a.width * a.height);
  const priced = requirePricesAllOrNone(
    kinds.map((k) => k.priceMinor),
    'sheet size',
  );

  requireUniqueIds(input.parts.map((p) => p.id));
  const templates = input.parts.map((part) => {
    requireInteger(part.width, `The width of part "${part.id}" (mm)`, 1, part.id);
    requireInteger(part.height, `The height of part "${part.id}" (mm)`, 1, part.id);
    requireInteger(part.quantity, `The quantity of part "${part.id}"`, 0, part.id);
    const canRotate = input.allowRotation !== false && part.grain !== 'along';
    const piece: SheetPiece = { partId: part.id, width: part.width, height: part.height, canRotate };
    if (part.label !== undefined) piece.label = part.label;
    if (part.quantity > 0 && !kinds.some((k) => fitsSheet(piece, k))) throw tooLarge(piece, kinds);
    return piece;
  });
  requirePieceCount(input.parts.map((p) => p.quantity));
  const pieces = input.parts.flatMap((part, i) => Array.from({ length: part.quantity }, () => templates[i]!));
  return { pieces, kinds, kerf, priced };
}

function tooLarge(piece: SheetPiece, kinds: readonly SheetStock[]): PlannerInputError {
  const sizes = kinds.map((k) => `${len(k.width)} × ${len(k.height)}`).join(', ');
  const turn = piece.canRotate ? 'either way round' : 'with its grain along the sheet';
  return new PlannerInputError(
    'part-too-large',
    `The ${piece.label?.toLowerCase() ?? `part "${piece.partId}"`} (${len(piece.width)} × ${len(piece.height)}) does not fit a ` +
      `${sizes} sheet ${turn}; ` +
      'choose a larger sheet, allow turning it, or split the part.',
    piece.partId,
  );
}
