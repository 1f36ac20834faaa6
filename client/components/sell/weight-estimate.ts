import { z } from 'zod';
import { estimateModuleWeight, estimateToKg, type ModuleWeightEstimate } from '@shared/planner/estimate-module-weight';
import { endProfileSchema, moduleListingSchema } from '@shared/schemas/listing-module';
import type { LengthUnit } from '@/utils/planner/draft-to-input';
import type { ModuleDraft } from '@/utils/listings/module-draft';
import { readModuleDraft } from '@/utils/listings/module-read';

const shape = moduleListingSchema.shape;

/** The fields the estimate needs, checked by the listing's own rules. */
const constructionFields = z.object({
  boardCount: shape.boardCount,
  lengthMm: shape.lengthMm,
  widthMm: shape.widthMm,
  levels: shape.levels,
  construction: shape.construction,
});

/** An end's rail-top height, when it has been given: it sets the legs' length. */
const railTop = z.object({
  railTopHeightMm: endProfileSchema.shape.railTopHeightMm,
  railTopFrom: endProfileSchema.shape.railTopFrom,
});

/** The boxes of step 2 by the first part of their path, as the seller sees them labelled. */
const FIELD_WORDS: Record<string, string> = {
  boardCount: 'number of boards',
  lengthMm: 'length',
  widthMm: 'width',
  levels: 'height between the decks',
  'construction.frameDepthMm': 'frame timber depth',
  'construction.frameThicknessMm': 'frame timber thickness',
  'construction.crossMemberSpacingMm': 'cross-member spacing',
  'construction.topMaterial': 'top',
  'construction.topThicknessMm': 'top thickness',
  'construction.supports': 'what holds it up',
};

function wordsFor(path: readonly PropertyKey[]): string {
  const [first, second] = path.map(String);
  return FIELD_WORDS[`${first}.${second}`] ?? FIELD_WORDS[first ?? ''] ?? 'size and construction';
}

/** What the estimate box can say: which boxes to fill in first, or the planner's estimate. */
export type DraftEstimate =
  { ready: false; missing: string[] } | { ready: true; estimate: ModuleWeightEstimate; kg: number | null };

/** The planner's estimate of one board's weight from the sell form as it stands. */
export function estimateFromDraft(draft: ModuleDraft, unit: LengthUnit): DraftEstimate {
  const { input } = readModuleDraft(draft, unit);
  const fields = constructionFields.safeParse(input);
  if (!fields.success) {
    return { ready: false, missing: [...new Set(fields.error.issues.map((i) => wordsFor(i.path)))] };
  }
  const ends = (input as { endProfiles: Record<'a' | 'b', unknown> }).endProfiles;
  const end = (value: unknown) => {
    const read = railTop.safeParse(value);
    return read.success ? read.data : undefined;
  };
  const estimate = estimateModuleWeight({ ...fields.data, endProfiles: { a: end(ends.a), b: end(ends.b) } });
  return { ready: true, estimate, kg: estimate.ok ? estimateToKg(estimate.boardG) : null };
}
