/** Softwood stock lengths a UK merchant sells, mm: 1.8 m to 5.4 m in steps of 0.3 m (merchants' published lengths). */
export const UK_STOCK_LENGTHS_MM: readonly number[] = [1800, 2400, 3000, 3600, 4200, 4800, 5400];

/** Width of material a saw cut removes, mm. A common figure for a hand-held or panel saw blade; always editable. */
export const DEFAULT_KERF_MM = 3;

/** The standard 8 × 4 ft sheet, mm (published as 2440 × 1220). */
export const STANDARD_SHEET_MM = { width: 2440, height: 1220 } as const;

/** The larger birch plywood sheet, mm (published as 1525 × 3050), laid long side along x. */
export const BIRCH_LARGE_SHEET_MM = { width: 3050, height: 1525 } as const;

/**
 * Most pieces one plan may hold (parts × quantity). Keeps a plan made in the browser to a fraction of a second;
 * a baseboard set needs far fewer.
 */
export const MAX_PIECES_PER_PLAN = 2000;
