/**
 * The baseboard planner: from a plan input (boards, or shelves round a room, on one or two levels) to a complete
 * plan — boards and frames, cutting list, timber and sheet cutting plans, fixings, wiring, weight and handling, sag,
 * shipping, cost, schedule and safety — and CSV exports. Pure functions, for the browser and the server.
 */
export { computePlan, parsePlanInput, type PlanTextOptions } from './compute-plan';
export { imperialLengths, metricLengths, type LengthFormat, type LengthPrecision } from './text/lengths';
export type { Plan, PlannedBoard } from './plan-types';
export { PlanInputError } from './errors';
export * from './schema';
export { PLAN_LIMITS } from './limits';
export * from './defaults';
export { generateBoards, type LayoutInput } from './boards/generate-boards';
export type * from './boards/types';
export { cuttingList, materialKey, PART_NAMES } from './cutting-list';
export type * from './cutting/types';
export type * from './frame/types';
export { csvCell, toCsv } from './csv';
export { cuttingListCsv, shoppingListCsv } from './export-csv';
export { EXAMPLE_SUPPLIERS, singlePortableModule, tenByThirteenTwoLevel } from './examples';
export * from './plan/item-keys';
export type { CostPlan } from './plan/costing';
export type { MaterialsCost } from './plan/cost';
export type { CostLine } from './plan/supplier-choice';
export type { LabourCost, LabourLine, RateCard } from './plan/labour';
export type { FixingRow, FixingsPlan } from './plan/fixings';
export type { JoinFixingsPlan, JoinMethod } from './plan/board-joins';
export type { BoardSag, RailSag, SheetSag } from './plan/sag';
export type { SafetyPlan } from './plan/safety';
export type { SchedulePlan } from './plan/schedule';
export type { BoardShipping } from './plan/shipping';
export type { SheetStockPlan } from './plan/sheets';
export type { ShoppingItem } from './plan/shopping';
export type { StockSectionPlan } from './plan/stock';
export type { BoardWeight, WeightPlan } from './plan/weight';
export type { BoardWiring, FarEndDrop, WiringPlan } from './plan/wiring';
