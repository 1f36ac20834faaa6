import { generateBoards } from './boards/generate-boards';
import type { BoardLayout } from './boards/types';
import { cuttingList } from './cutting-list';
import { PlanInputError } from './errors';
import { checkLayout } from './plan-checks';
import type { Plan } from './plan-types';
import { buildBoards, type BuiltBoard, planSections } from './plan/built-boards';
import { costPlan } from './plan/costing';
import { planFixings } from './plan/fixings';
import { labourCost } from './plan/labour';
import { type PriceBook, priceBook } from './plan/price-book';
import { planSafety } from './plan/safety';
import { planSag } from './plan/sag';
import { planSchedule } from './plan/schedule';
import { planShipping } from './plan/shipping';
import { planSheets } from './plan/sheets';
import { shoppingList } from './plan/shopping';
import { planStock } from './plan/stock';
import { boardWarnings, fixingWarnings, generalWarnings, sagWarnings } from './plan/warnings';
import { planWeight } from './plan/weight';
import { planWiring, type WiringPlan } from './plan/wiring';
import { type ParsedPlanInput, type PlanInput, planInputSchema } from './schema';
import { lengthFormatFor, type LengthFormat, withLengthFormat } from './text/lengths';

/** How the plan's messages are worded for the person reading them. */
export interface PlanTextOptions {
  /**
   * Puts each length quoted in a message (warnings, suggestions, field messages) into the reader's unit. Default:
   * feet and inches when the input's `units` is "imperial", millimetres otherwise.
   */
  formatLength?: LengthFormat;
}

function formatOf(input: PlanInput, options: PlanTextOptions): LengthFormat {
  const units = typeof input === 'object' && input !== null ? (input as { units?: unknown }).units : undefined;
  return options.formatLength ?? lengthFormatFor(units);
}

/** Parses a plan input, throwing a {@link PlanInputError} with a message per field at fault. */
export function parsePlanInput(input: PlanInput, options: PlanTextOptions = {}): ParsedPlanInput {
  return withLengthFormat(formatOf(input, options), () => {
    const result = planInputSchema.safeParse(input);
    if (!result.success) throw PlanInputError.fromZod(result.error);
    return result.data;
  });
}

/**
 * Works out a whole baseboard plan from its input: the boards, their frames and parts, cutting plans for timber and
 * sheet, fixings, wiring, weight and handling, sag, shipping, cost, schedule and safety cautions. Pure and
 * synchronous, for the browser as the user types and for the server alike. Throws {@link PlanInputError}, whose
 * `fields` are keyed by the dotted path of each field at fault. Lengths in its messages follow `options`.
 */
export function computePlan(input: PlanInput, options: PlanTextOptions = {}): Plan {
  return withLengthFormat(formatOf(input, options), () => planFrom(parsePlanInput(input, options)));
}

function planFrom(parsed: ParsedPlanInput): Plan {
  const layout = generateBoards(parsed);
  checkLayout(layout, parsed);
  const built = buildBoards(layout, parsed);
  const book = priceBook(parsed.pricing?.suppliers);
  const materials = planMaterials(parsed, layout, built, book);
  const checks = planChecks(parsed, layout, built);
  const { shopping, cost } = planCost(parsed, built, book, materials, checks.wiring);
  const names = new Map(layout.boards.map((b) => [b.id, b.name]));
  return {
    units: parsed.units,
    boards: built.map(({ board, frame }) => ({ ...board, frame })),
    joins: layout.joins,
    runs: layout.runs,
    ...materials,
    ...checks,
    shoppingList: shopping,
    cost,
    schedule: parsed.schedule === undefined ? null : planSchedule(parsed.schedule, layout.boards.length),
    safety: planSafety({ fixedToWall: parsed.construction.supports.kind === 'wall-battens' }),
    warnings: [
      ...sagWarnings(checks.sag, names),
      ...boardWarnings(checks.weight, checks.wiring, names),
      ...fixingWarnings(materials.fixings),
      ...generalWarnings(layout.boards, {
        floorFallMm: parsed.kickboards?.floorFallMm ?? 0,
        foamTop: parsed.construction.topSheet.material === 'extruded-foam',
        unpriced: cost?.materials?.unpriced ?? [],
      }),
    ],
  };
}

/** The cutting list, the timber and sheet cutting plans, and the fixings. */
function planMaterials(parsed: ParsedPlanInput, layout: BoardLayout, built: readonly BuiltBoard[], book: PriceBook) {
  const { construction } = parsed;
  const rows = cuttingList(built);
  const prices = { prices: book, mode: parsed.pricing?.mode ?? 'cheapest-per-item', kerfMm: construction.kerfMm };
  const joins = {
    method: parsed.joins,
    count: layout.joins.length,
    liftOuts: layout.boards.filter((b) => b.source === 'lift-out').length,
  };
  const sections = { ...planSections(parsed), topThicknessMm: construction.topSheet.thicknessMm };
  return {
    cuttingList: rows,
    stock: planStock(rows, { ...prices, stockLengthsMm: construction.stockLengthsMm }),
    sheets: planSheets(rows, { ...prices, sheetMm: construction.sheetSizeMm, yardCuts: construction.yardCutsSheets }),
    fixings: planFixings(built, sections, joins),
  };
}

/** The wiring, weight and handling, sag and shipping of every board. */
function planChecks(parsed: ParsedPlanInput, layout: BoardLayout, built: readonly BuiltBoard[]) {
  const { construction } = parsed;
  const weight = planWeight(built, construction.timberClass);
  const masses = new Map(weight.boards.map((w) => [w.boardId, w.totalKg]));
  return {
    wiring: planWiring(built, layout.runs, parsed.wiring),
    weight,
    sag: planSag(built, {
      frame: construction.frameSection,
      timberClass: construction.timberClass,
      top: construction.topSheet,
      loads: parsed.loads,
    }),
    shippingPerBoard: planShipping(
      built.map((b) => ({ ...b, massKg: masses.get(b.board.id)! })),
      construction.topSheet.thicknessMm,
    ),
  };
}

/** The shopping list, and its cost with labour when suppliers or a rate card are given. */
function planCost(
  parsed: ParsedPlanInput,
  built: readonly BuiltBoard[],
  book: PriceBook,
  materials: ReturnType<typeof planMaterials>,
  wiring: WiringPlan,
) {
  const { stock, sheets, fixings } = materials;
  const shopping = shoppingList(stock, sheets, fixings, wiring, parsed.construction.yardCutsSheets);
  const rates = parsed.labour;
  const labour = rates === undefined ? undefined : { rates, cost: labourCost(built, rates) };
  return { shopping, cost: costPlan(shopping, book, parsed.pricing, labour) };
}
