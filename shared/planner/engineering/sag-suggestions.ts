import { deeperSections, type SectionSize, thickerSheets } from './materials';
import { type RailSagInput, railSag, type SheetSagInput, sheetSag } from './sag-deflection';
import { lengthText } from '../text/lengths';

/** A change that makes a failing sag check pass, worked out for the board in hand. */
export type SagSuggestion =
  | { kind: 'more-legs'; extraLegs: number; spanMm: number; maxSpanMm: number; message: string }
  | { kind: 'deeper-section'; section: SectionSize; deflectionMm: number; message: string }
  | { kind: 'closer-cross-members'; spacingMm: number; message: string }
  | { kind: 'thicker-sheet'; thicknessMm: number; deflectionMm: number; message: string };

/** How many one-millimetre steps a rounded answer may be nudged to pass despite rounding in floating point. */
const NUDGE_STEPS = 5;

function largestPassing(passes: (mm: number) => boolean, startMm: number): number | undefined {
  for (let mm = Math.floor(startMm), steps = 0; mm >= 1 && steps <= NUDGE_STEPS; mm -= 1, steps += 1) {
    if (passes(mm)) return mm;
  }
  return undefined;
}

/** Longest rail span that passes, found by bisection (sag over span grows with span). */
function maxRailSpan(input: RailSagInput): number | undefined {
  let lo = 0;
  let hi = input.spanMm;
  for (let i = 0; i < 60; i += 1) {
    const mid = (lo + hi) / 2;
    if (railSag({ ...input, spanMm: mid }).passes) lo = mid;
    else hi = mid;
  }
  return largestPassing((mm) => railSag({ ...input, spanMm: mm }).passes, lo);
}

function moreLegs(input: RailSagInput): SagSuggestion | undefined {
  const maxSpanMm = maxRailSpan(input);
  if (maxSpanMm === undefined) return undefined;
  for (let bays = Math.ceil(input.spanMm / maxSpanMm); bays <= Math.ceil(input.spanMm); bays += 1) {
    const spanMm = input.spanMm / bays;
    if (!railSag({ ...input, spanMm }).passes) continue;
    const extraLegs = bays - 1;
    const legs = extraLegs === 1 ? 'leg' : 'legs';
    const spans = `${bays} equal spans of ${lengthText(spanMm)}`;
    return {
      kind: 'more-legs',
      extraLegs,
      spanMm,
      maxSpanMm,
      message:
        `Add ${extraLegs} more ${legs} (or other supports) under this rail, evenly spaced, to make ${spans}; ` +
        `it may span up to ${lengthText(maxSpanMm)}.`,
    };
  }
  return undefined;
}

function deeperSection(input: RailSagInput, candidates: readonly SectionSize[]): SagSuggestion | undefined {
  for (const section of deeperSections(input.section, candidates)) {
    const result = railSag({ ...input, section });
    if (!result.passes) continue;
    const size = `${lengthText(section.widthMm)} × ${lengthText(section.thicknessMm)}`;
    const named = 'nominal' in section ? `${String(section.nominal)} (${size})` : size;
    return {
      kind: 'deeper-section',
      section,
      deflectionMm: result.deflectionMm,
      message: `Use ${named} on edge for this rail: it sags ${lengthText(result.deflectionMm, 'fine')}.`,
    };
  }
  return undefined;
}

/** Changes that make a failing rail pass: more legs, a deeper standard section. Empty when it passes already. */
export function railSuggestions(input: RailSagInput, candidates: readonly SectionSize[]): SagSuggestion[] {
  if (railSag(input).passes) return [];
  return [moreLegs(input), deeperSection(input, candidates)].filter((s) => s !== undefined);
}

function closerCrossMembers(input: SheetSagInput): SagSuggestion | undefined {
  // Sag / span grows as span³ under a uniform load, so the passing span has a closed form.
  const { deflectionMm, limitMm } = sheetSag(input);
  const estimate = input.spacingMm * Math.cbrt(limitMm / deflectionMm);
  const spacingMm = largestPassing((mm) => sheetSag({ ...input, spacingMm: mm }).passes, estimate);
  if (spacingMm === undefined) return undefined;
  return {
    kind: 'closer-cross-members',
    spacingMm,
    message: `Put the cross members at ${lengthText(spacingMm)} centres or closer.`,
  };
}

function thickerSheet(input: SheetSagInput, thicknessesMm: readonly number[]): SagSuggestion | undefined {
  for (const thicknessMm of thicknessesMm.filter((t) => t > input.thicknessMm).sort((a, b) => a - b)) {
    const result = sheetSag({ ...input, thicknessMm });
    if (!result.passes) continue;
    return {
      kind: 'thicker-sheet',
      thicknessMm,
      deflectionMm: result.deflectionMm,
      message:
        `Use ${lengthText(thicknessMm)} sheet: between these cross members it sags ` +
        `${lengthText(result.deflectionMm, 'fine')}.`,
    };
  }
  return undefined;
}

/** Changes that make a failing top sheet pass: closer cross members, a thicker sheet. Empty when it passes already. */
export function sheetSuggestions(
  input: SheetSagInput,
  thicknessesMm: readonly number[] = thickerSheets(input.thicknessMm),
): SagSuggestion[] {
  if (sheetSag(input).passes) return [];
  return [closerCrossMembers(input), thickerSheet(input, thicknessesMm)].filter((s) => s !== undefined);
}
