import { singlePortableModule, tenByThirteenTwoLevel } from '@shared/planner';
import { draftFromInput } from './draft-from-input';
import type { PlannerDraft } from './draft-types';

/** Where a new plan starts. */
export type StartPoint = 'module' | 'room' | 'empty';

/** The starting points offered, in the order shown. */
export const START_POINTS: readonly { id: StartPoint; label: string }[] = [
  { id: 'module', label: 'One portable module' },
  { id: 'room', label: 'Round the walls of a room, on two levels' },
  { id: 'empty', label: 'An empty plan' },
];

/** The form state for a starting point. The examples always parse; a failure here is a planner bug. */
export function startDraft(start: StartPoint): PlannerDraft {
  const input = start === 'room' ? tenByThirteenTwoLevel : singlePortableModule;
  const draft = draftFromInput(input);
  if (draft === null) throw new Error(`The "${start}" starting point does not parse.`);
  if (start !== 'empty') return draft;
  return { ...draft, boards: [], on: { ...draft.on, pricing: false, schedule: false } };
}
