import type { PlanInputFields } from './object';
import { type ResolvedSection, resolveSection } from './sections';

/** A problem found across fields: where, and what to do about it. */
export interface FieldProblem {
  path: (string | number)[];
  message: string;
}

/** Sizes the checks across fields need, worked out once. */
export interface CheckContext {
  input: PlanInputFields;
  frame: ResolvedSection;
  /** The legs' section, when the boards stand on legs. */
  legs?: ResolvedSection;
  /** The sheet's long and short sides, mm. */
  sheetLongMm: number;
  sheetShortMm: number;
  /** Depth of a board from the top of its sheet to the bottom of its frame, mm. */
  boardDepthMm: number;
}

/** The sizes the checks need. */
export function checkContext(input: PlanInputFields): CheckContext {
  const { frameSection, sheetSizeMm, supports, topSheet } = input.construction;
  const frame = resolveSection(frameSection);
  return {
    input,
    frame,
    legs: supports.kind === 'legs' ? resolveSection(supports) : undefined,
    sheetLongMm: Math.max(sheetSizeMm.lengthMm, sheetSizeMm.widthMm),
    sheetShortMm: Math.min(sheetSizeMm.lengthMm, sheetSizeMm.widthMm),
    boardDepthMm: frame.widthMm + topSheet.thicknessMm,
  };
}
