import type { BoardJoin, LayoutBoard } from './boards/types';
import type { CuttingListRow } from './cutting/types';
import type { FrameLayout } from './frame/types';
import type { CostPlan } from './plan/costing';
import type { FixingsPlan } from './plan/fixings';
import type { BoardSag } from './plan/sag';
import type { SafetyPlan } from './plan/safety';
import type { SchedulePlan } from './plan/schedule';
import type { BoardShipping } from './plan/shipping';
import type { SheetStockPlan } from './plan/sheets';
import type { ShoppingItem } from './plan/shopping';
import type { StockSectionPlan } from './plan/stock';
import type { WeightPlan } from './plan/weight';
import type { WiringPlan } from './plan/wiring';

/** A board of the plan with its frame: members, cross-member and leg positions, for drawing and for the wiring. */
export interface PlannedBoard extends LayoutBoard {
  frame: FrameLayout;
}

/**
 * A complete baseboard plan: plain data (JSON-serialisable), lengths in mm, masses in kg, money in integer minor
 * units. Worked out by `computePlan` from a plan input.
 */
export interface Plan {
  units: 'metric' | 'imperial';
  boards: PlannedBoard[];
  /** Boards fixed together, and how. */
  joins: BoardJoin[];
  /** Runs of joined boards, each in order: what one bus feed serves. */
  runs: string[][];
  /** Every part, alike parts grouped, with how many each board takes. */
  cuttingList: CuttingListRow[];
  /** Timber cutting plans, one per section, beside First-Fit Decreasing. */
  stock: StockSectionPlan[];
  /** Sheet layouts, one per material and thickness, with the yard cut list when the yard cuts. */
  sheets: SheetStockPlan[];
  fixings: FixingsPlan;
  wiring: WiringPlan;
  weight: WeightPlan;
  sag: BoardSag[];
  shippingPerBoard: BoardShipping[];
  shoppingList: ShoppingItem[];
  /** Null unless suppliers or a rate card are given. */
  cost: CostPlan | null;
  /** Null unless a schedule is given. */
  schedule: SchedulePlan | null;
  safety: SafetyPlan;
  /** Problems to fix or take care over, in plain words. */
  warnings: string[];
}
