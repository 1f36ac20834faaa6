import { standardSection } from '../engineering/materials';

/** A timber section with the sizes to build with: the standard size, or the one measured on the user's stock. */
export interface ResolvedSection {
  /** Standard section id, e.g. "uk-2x1". */
  sectionId: string;
  /** The wider face, mm: upright when a rail stands on edge (44 for UK 2x1). */
  widthMm: number;
  /** The narrower face, mm (18 for UK 2x1). */
  thicknessMm: number;
}

/**
 * The section to build with: the standard one, with any measured size in place of its own. Only the input's own
 * keys are set, so a parsed input parses again to itself.
 */
export function resolveSection(choice: { sectionId: string; widthMm?: number; thicknessMm?: number }): ResolvedSection {
  const standard = standardSection(choice.sectionId);
  return {
    sectionId: standard.id,
    widthMm: choice.widthMm ?? standard.widthMm,
    thicknessMm: choice.thicknessMm ?? standard.thicknessMm,
  };
}
