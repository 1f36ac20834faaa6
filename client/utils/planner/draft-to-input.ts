import type { PlanInput } from '@shared/planner';
import type { PlannerDraft } from './draft-types';

/** How lengths are shown: millimetres, or feet and inches. */
export type LengthUnit = 'mm' | 'ft-in';

/**
 * The plan input for the form's state: only the parts switched on, boards or room as chosen, and the units shown.
 * Returned as plain JSON, so `NaN` (a number still being typed) arrives as null and is reported at its field.
 */
export function draftToInput(draft: PlannerDraft, unit: LengthUnit): PlanInput {
  const { on } = draft;
  const room = { ...draft.room, opening: on.opening ? draft.room.opening : undefined };
  const supports =
    draft.supportKind === 'legs'
      ? { kind: 'legs' as const, ...draft.legs }
      : { kind: 'wall-battens' as const, ...draft.battens };
  const input = {
    units: unit === 'ft-in' ? 'imperial' : 'metric',
    boards: draft.layout === 'boards' ? draft.boards : [],
    room: draft.layout === 'room' ? room : undefined,
    secondLevel: on.secondLevel ? draft.secondLevel : undefined,
    lowerShelf: on.lowerShelf && draft.supportKind === 'legs' ? draft.lowerShelf : undefined,
    kickboards: on.kickboards && draft.supportKind === 'legs' ? draft.kickboards : undefined,
    construction: { ...draft.construction, supports },
    joins: draft.joins,
    wiring: draft.wiring,
    loads: draft.loads,
    pricing: on.pricing ? draft.pricing : undefined,
    labour: on.labour ? draft.labour : undefined,
    schedule: on.schedule ? draft.schedule : undefined,
  };
  return JSON.parse(JSON.stringify(input)) as PlanInput;
}
