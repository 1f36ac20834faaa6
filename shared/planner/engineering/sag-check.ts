import { type SectionSize, standardSections, thickerSheets } from './materials';
import { type RailSagInput, railSag, type SagFigures, type SheetSagInput, sheetSag } from './sag-deflection';
import { railSuggestions, type SagSuggestion, sheetSuggestions } from './sag-suggestions';

/** What to check: a frame rail between legs, or the top sheet between cross members. */
export type SagCheckInput =
  | ({ member: 'rail' } & RailSagInput & {
        /** Sections a deeper one is suggested from; default the UK standard sections. */
        candidateSections?: readonly SectionSize[];
      })
  | ({ member: 'sheet' } & SheetSagInput & {
        /** Thicknesses a thicker sheet is suggested from; default the plywood thicknesses made. */
        candidateThicknessesMm?: readonly number[];
      });

/** Sag against its limit and, when it fails, changes worked out to make it pass. */
export interface SagCheckResult extends SagFigures {
  /** Empty when the check passes. Each one, applied on its own, makes the check pass. */
  suggestions: SagSuggestion[];
}

/**
 * Checks the sag of the longest unsupported rail or of the top sheet against span / limitRatio (default L/300, the
 * lenient end of EN 1995-1-1 Table 7.2's L/300–L/500 for instantaneous deflection). Creep over the years is not
 * included. When it fails, the suggestions say how many legs to add, which deeper section, what cross-member spacing
 * or which thicker sheet would pass.
 */
export function sagCheck(input: SagCheckInput): SagCheckResult {
  if (input.member === 'rail') {
    const candidates = input.candidateSections ?? standardSections('UK');
    return { ...railSag(input), suggestions: railSuggestions(input, candidates) };
  }
  const thicknesses = input.candidateThicknessesMm ?? thickerSheets(input.thicknessMm);
  return { ...sheetSag(input), suggestions: sheetSuggestions(input, thicknesses) };
}
