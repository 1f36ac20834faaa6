import type { InjectionKey, Ref } from 'vue';

/** What the planner's fields read from the page: the current messages by dotted input path. */
export interface PlannerFormContext {
  errors: Readonly<Ref<Record<string, string>>>;
}

/** Provided by the planner inputs, read by each field. */
export const plannerFormKey: InjectionKey<PlannerFormContext> = Symbol('planner-form');

/** Element id of the field at a dotted input path: `room.walls.0.lengthMm` → `planner-room-walls-0-lengthMm`. */
export function plannerFieldId(path: string): string {
  return `planner-${path.replace(/\./g, '-') || 'plan'}`;
}

/** Whether any message is at `prefix` or inside it (`room` covers `room.walls.0.lengthMm`). */
export function hasErrorUnder(errors: Record<string, string>, prefixes: readonly string[]): boolean {
  return Object.keys(errors).some((path) => prefixes.some((p) => path === p || path.startsWith(`${p}.`)));
}
