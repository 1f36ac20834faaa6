import type { PlanInput } from '@shared/planner';

/** Where an unsaved plan waits while its author signs in (this tab only, gone when it closes). */
const STASH_KEY = 'bw-planner-unsaved';

/** A plan put aside, with the name it was to be saved under. */
export interface StashedPlan {
  input: PlanInput;
  name?: string;
}

/** Put the plan aside before going to sign in. */
export function stashPlan(plan: StashedPlan): void {
  try {
    sessionStorage.setItem(STASH_KEY, JSON.stringify(plan));
  } catch {
    // Storage full or blocked: the plan is lost on sign-in, which the person can see and redo.
  }
}

/** Take back the plan put aside, once: it is removed as it is read. */
export function takeStashedPlan(): StashedPlan | null {
  try {
    const text = sessionStorage.getItem(STASH_KEY);
    sessionStorage.removeItem(STASH_KEY);
    if (!text) return null;
    const value = JSON.parse(text) as unknown;
    return typeof value === 'object' && value !== null && 'input' in value ? (value as StashedPlan) : null;
  } catch {
    return null;
  }
}
