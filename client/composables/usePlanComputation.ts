import { computePlan, PlanInputError, type LengthFormat, type Plan, type PlanInput } from '@shared/planner';
import { onScopeDispose, ref, shallowRef, watch } from 'vue';
import { useLengthUnit } from './useLengthUnit';

/** Wait after the last keystroke before planning again, ms: quick enough to feel live, few enough to stay smooth. */
export const RECOMPUTE_DELAY_MS = 150;

/** Shown when the planner itself fails rather than the input. */
const UNEXPECTED = 'The plan could not be worked out just now. Change a value to try again, or reload the page.';

/**
 * Works the plan out in the browser as the input changes, a short while after the last change. A change that makes
 * the input invalid leaves the last good plan showing, with the messages per field (dotted input paths) beside it.
 * Lengths in the plan's messages are written by the app's own formatter, in the unit the person chose.
 */
export function usePlanComputation(source: () => PlanInput | null, delayMs = RECOMPUTE_DELAY_MS) {
  const { unit, formatLength } = useLengthUnit();
  const lengths: LengthFormat = (mm, precision) => formatLength(mm, { fine: precision === 'fine' });
  /** The last plan that worked out; null until one has. */
  const plan = shallowRef<Plan | null>(null);
  /** Messages by dotted input path for the current input; empty when it plans. */
  const fieldErrors = shallowRef<Record<string, string>>({});
  /** A sentence for the whole plan when the current input does not plan. */
  const problem = ref('');
  /** A change is waiting to be planned. */
  const pending = ref(false);
  let timer: ReturnType<typeof setTimeout> | undefined;

  /** Plan the current input now. */
  function recompute(): void {
    clearTimeout(timer);
    pending.value = false;
    const input = source();
    if (input === null) return;
    try {
      plan.value = computePlan(input, { formatLength: lengths });
      fieldErrors.value = {};
      problem.value = '';
    } catch (error) {
      if (error instanceof PlanInputError) {
        fieldErrors.value = error.fields;
        problem.value = error.message;
        return;
      }
      console.error(error);
      fieldErrors.value = {};
      problem.value = UNEXPECTED;
    }
  }

  /** Forget the last plan and plan afresh: for a new start, where the old plan would mislead. */
  function reset(): void {
    plan.value = null;
    recompute();
  }

  watch(
    () => [source(), unit.value],
    () => {
      pending.value = true;
      clearTimeout(timer);
      timer = setTimeout(recompute, delayMs);
    },
    { deep: true },
  );
  onScopeDispose(() => clearTimeout(timer));
  recompute();

  return { plan, fieldErrors, problem, pending, recompute, reset };
}
