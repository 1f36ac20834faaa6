/** Cutting plans for baseboard frames: timber lengths (one-dimensional) and sheet tops (guillotine). */
export { PlannerInputError, type PlannerInputErrorCode } from './errors';
export { bestFitDecreasing, firstFitDecreasing, planStockCutting } from './stock-cutting';
export type * from './stock-types';
export { planSheetCutting } from './sheet-cutting';
export type * from './sheet-types';
export { yardCutList } from './yard-cut-list';
export {
  BIRCH_LARGE_SHEET_MM,
  DEFAULT_KERF_MM,
  MAX_PIECES_PER_PLAN,
  STANDARD_SHEET_MM,
  UK_STOCK_LENGTHS_MM,
} from './trade-defaults';
