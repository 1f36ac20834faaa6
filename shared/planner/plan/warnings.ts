import type { LayoutBoard } from '../boards/types';
import type { SupportKind } from '../frame/types';
import { lengthText } from '../text/lengths';
import type { FixingsPlan } from './fixings';
import type { BoardSag } from './sag';
import type { WeightPlan } from './weight';
import type { WiringPlan } from './wiring';

/** A message about one board, before boards with the same message are listed together. */
interface BoardNote {
  board: string;
  message: string;
}

/** Each distinct message once, after the names of the boards it applies to. */
function grouped(notes: readonly BoardNote[]): string[] {
  const byMessage = new Map<string, string[]>();
  for (const { message, board } of notes) byMessage.set(message, [...(byMessage.get(message) ?? []), board]);
  return [...byMessage.entries()].map(([message, boards]) => `${boards.join(', ')}: ${message}`);
}

/** A sag, to a tenth of a millimetre or 1/32 in. */
const sagText = (value: number) => lengthText(value, 'fine');

const SPAN_WORDS: Readonly<Record<SupportKind, string>> = {
  legs: 'between legs',
  carried: 'between legs',
  brackets: 'between brackets',
  ends: 'from end to end',
};

/** Rails and tops that sag more than allowed, with what would fix them. */
export function sagWarnings(sag: readonly BoardSag[], names: ReadonlyMap<string, string>): string[] {
  const notes = sag.flatMap(({ boardId, rail, sheet }): BoardNote[] => {
    const board = names.get(boardId)!;
    const found: BoardNote[] = [];
    if (!rail.passes) {
      const fixes = rail.suggestions.map((s) => s.message).join(' Or: ');
      const sags = `A side rail sags ${sagText(rail.deflectionMm)} over ${lengthText(rail.spanMm)} ${SPAN_WORDS[rail.supportedBy]}`;
      found.push({ board, message: `${sags}, more than the ${sagText(rail.limitMm)} allowed. ${fixes}` });
    }
    if (sheet !== null && !sheet.passes) {
      const fixes = sheet.suggestions.map((s) => s.message).join(' Or: ');
      const sags = `The top sags ${sagText(sheet.deflectionMm)} between cross members`;
      found.push({ board, message: `${sags}, more than the ${sagText(sheet.limitMm)} allowed. ${fixes}` });
    }
    return found;
  });
  return grouped(notes);
}

const LIFTERS = {
  'two-person': 'two people',
  'three-person': 'three people',
  'mechanical-or-dismantle': 'a lifting aid, or take it apart first',
} as const;

/** Boards too heavy for one person, and wiring that loses too much voltage or whose holes do not fit. */
export function boardWarnings(weight: WeightPlan, wiring: WiringPlan, names: ReadonlyMap<string, string>): string[] {
  const notes: BoardNote[] = [];
  for (const w of weight.boards) {
    if (w.handling.liftBy === 'one-person') continue;
    notes.push({
      board: w.name,
      message: `Over the one-person lifting guideline: lift with ${LIFTERS[w.handling.liftBy]}.`,
    });
  }
  for (const b of wiring.boards) {
    const board = names.get(b.boardId)!;
    for (const message of b.warnings) notes.push({ board, message });
    const far = b.farEnd;
    if (far.passes) continue;
    const better = far.passingConductor
      ? `use ${far.passingConductor.name} bus wire (${far.passingConductor.dropV.toFixed(2)} V)`
      : 'feed the bus at more points';
    const loses = `The bus loses ${far.dropV.toFixed(2)} V by the far end, more than the ${far.limitV} V allowed`;
    notes.push({ board, message: `${loses}: ${better}, or feed it nearer this board.` });
  }
  return grouped(notes);
}

/** Joints no stock screw suits. */
export function fixingWarnings(fixings: FixingsPlan): string[] {
  return fixings.screws.filter((r) => r.problem !== undefined).map((r) => `${r.description}: ${r.problem}`);
}

/** Warnings about the plan as a whole: the floor, a foam top, items nobody prices. */
export function generalWarnings(
  boards: readonly LayoutBoard[],
  options: { floorFallMm: number; foamTop: boolean; unpriced: readonly string[] },
): string[] {
  const warnings: string[] = [];
  if (options.floorFallMm > 0) {
    warnings.push(
      `The floor falls up to ${lengthText(options.floorFallMm)}: each kickboard is cut that much taller to scribe down to ` +
        'the floor; level each board by packing or trimming its legs.',
    );
  }
  if (options.foamTop) {
    warnings.push('Foam board is not for spanning between cross members: lay it on a sheet top, and check that sheet.');
  }
  if (options.unpriced.length > 0) {
    warnings.push(`No supplier prices ${options.unpriced.join(', ')}; the total leaves them out.`);
  }
  if (boards.length === 0) warnings.push('The plan has no boards.');
  return warnings;
}
