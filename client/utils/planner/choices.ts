import {
  PLYWOOD_THICKNESSES_MM,
  SHEET_MATERIALS,
  STANDARD_SECTIONS,
  standardSection,
} from '@shared/planner/engineering';

/** Timber sections offered, by region then depth: "UK 2x1 (44 × 18 mm)". */
export const SECTION_CHOICES = STANDARD_SECTIONS.map((s) => ({
  value: s.id,
  label: `${s.region} ${s.nominal} (${+s.widthMm.toFixed(1)} × ${+s.thicknessMm.toFixed(1)} mm)`,
}));

/** A standard section's planed size, to fill in when it is chosen (the person may then enter what they measured). */
export function standardSize(sectionId: string): { widthMm: number; thicknessMm: number } {
  const s = standardSection(sectionId);
  return { widthMm: s.widthMm, thicknessMm: s.thicknessMm };
}

/** Sheet materials for tops, in the planner's order. */
export const SHEET_CHOICES = Object.values(SHEET_MATERIALS).map((m) => ({ value: m.id, label: m.name }));

/** Plywood thicknesses made, as a hint under the thickness field. */
export const PLY_THICKNESS_HINT = `Plywood is made ${PLYWOOD_THICKNESSES_MM.join(', ')} mm thick.`;

export const TIMBER_CLASS_CHOICES = [
  { value: 'C16', label: 'C16 (general building timber)' },
  { value: 'C24', label: 'C24 (stronger, stiffer)' },
] as const;

export const JOIN_CHOICES = [
  { value: 'bolts', label: 'Coach bolts with wing nuts' },
  { value: 'dowels', label: 'Alignment dowels' },
  { value: 'pattern-makers-dowels', label: 'Pattern-makers’ dowels' },
  { value: 'clamps', label: 'Clamps' },
] as const;

export const SUPPORT_CHOICES = [
  { value: 'legs', label: 'Legs' },
  { value: 'wall-battens', label: 'A wall batten with brackets' },
] as const;
