import { packGuillotine, type FreeRectRule, type PackedSheet, type SplitRule } from './guillotine-packer';
import { fitsSheet, toSheetProblem, type SheetPiece, type SheetProblem } from './sheet-input';
import { isBetterSheetPlan, piecesIn, toSheetPlan } from './sheet-plan';
import type { SheetCuttingInput, SheetCuttingPlan, SheetStock } from './sheet-types';

const FITS: readonly FreeRectRule[] = ['best-area', 'best-short-side'];
const SPLITS: readonly SplitRule[] = ['shorter-leftover', 'max-area', 'rip-first'];
const ORDERS: Readonly<Record<string, (a: SheetPiece, b: SheetPiece) => number>> = {
  'largest area': (a, b) => b.width * b.height - a.width * a.height || longSide(b) - longSide(a),
  'longest side': (a, b) => longSide(b) - longSide(a) || shortSide(b) - shortSide(a),
  widest: (a, b) => b.width - a.width || b.height - a.height,
  tallest: (a, b) => b.height - a.height || b.width - a.width,
};

/**
 * Plans guillotine cutting of rectangular parts from sheets, kerf between neighbouring pieces.
 *
 * Packs the parts with every combination of four sort orders, two free-piece rules and three split rules (and,
 * with several sheet sizes, each size as the one tried first), then swaps any sheet whose parts fit a cheaper
 * or smaller size. Keeps the plan that costs least, then uses fewest sheets, then least sheet area, then needs
 * fewest cuts, then leaves the largest offcut. Throws {@link PlannerInputError} naming a part that fits no sheet.
 */
export function planSheetCutting(input: SheetCuttingInput): SheetCuttingPlan {
  const problem = toSheetProblem(input);
  let best: SheetCuttingPlan | undefined;
  for (const first of problem.kinds) {
    const kinds = [first, ...problem.kinds.filter((k) => k !== first)];
    for (const [orderName, compare] of Object.entries(ORDERS)) {
      const pieces = [...problem.pieces].sort(compare);
      for (const fit of FITS) {
        for (const split of SPLITS) {
          const packed = packGuillotine(pieces, { fit, split, kerf: problem.kerf, kinds });
          if (!packed) continue;
          const swapped = swapToSmallerSheets(packed, problem);
          if (best && isWorseOnTotals(packed, best, problem)) continue;
          const name = `guillotine ${fit} fit, ${split} split, ${orderName} first`;
          const plan = toSheetPlan(packed, problem, swapped ? `${name}, smaller sheets swapped in` : name);
          if (!best || isBetterSheetPlan(plan, best)) best = plan;
        }
      }
    }
  }
  return best ?? toSheetPlan([], problem, 'no parts to cut');
}

/** Re-packs each sheet's parts onto a cheaper (or, unpriced, smaller) size when they all fit one; true if any moved. */
function swapToSmallerSheets(packed: PackedSheet[], problem: SheetProblem): boolean {
  if (problem.kinds.length < 2) return false;
  let swapped = false;
  packed.forEach((sheet, i) => {
    const pieces = piecesIn(sheet.root);
    const area = pieces.reduce((sum, p) => sum + p.width * p.height, 0);
    for (const kind of cheaperKinds(sheet.kind, problem)) {
      if (area > kind.width * kind.height || !pieces.every((p) => fitsSheet(p, kind))) continue;
      const single = packOnOne(pieces, kind, problem.kerf);
      if (single) {
        packed[i] = single;
        swapped = true;
        return;
      }
    }
  });
  return swapped;
}

/** A quick look at cost, sheet count and area, so plainly worse runs are not laid out in full. */
function isWorseOnTotals(packed: readonly PackedSheet[], best: SheetCuttingPlan, problem: SheetProblem): boolean {
  const cost = problem.priced ? packed.reduce((sum, s) => sum + s.kind.priceMinor!, 0) : 0;
  const area = packed.reduce((sum, s) => sum + s.kind.width * s.kind.height, 0);
  const mine = [cost, packed.length, area];
  const theirs = [best.costMinor ?? 0, best.sheetCount, best.totalSheetArea];
  for (let i = 0; i < mine.length; i++) if (mine[i] !== theirs[i]) return mine[i]! > theirs[i]!;
  return false;
}

function cheaperKinds(current: SheetStock, problem: SheetProblem): SheetStock[] {
  const cost = (k: SheetStock) => (problem.priced ? k.priceMinor! : k.width * k.height);
  return problem.kinds.filter((k) => cost(k) < cost(current)).sort((a, b) => cost(a) - cost(b));
}

function packOnOne(pieces: SheetPiece[], kind: SheetStock, kerf: number): PackedSheet | undefined {
  for (const compare of Object.values(ORDERS)) {
    const sorted = [...pieces].sort(compare);
    for (const fit of FITS) {
      for (const split of SPLITS) {
        const packed = packGuillotine(sorted, { fit, split, kerf, kinds: [kind] });
        if (packed && packed.length === 1) return packed[0];
      }
    }
  }
  return undefined;
}

function longSide(p: SheetPiece): number {
  return Math.max(p.width, p.height);
}

function shortSide(p: SheetPiece): number {
  return Math.min(p.width, p.height);
}
