import type { PlanInput } from '@shared/planner';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { effectScope, nextTick, reactive } from 'vue';
import { LENGTH_UNIT_KEY, reloadLengthUnit, useLengthUnit } from '@/composables/useLengthUnit';
import { RECOMPUTE_DELAY_MS, usePlanComputation } from '@/composables/usePlanComputation';

/** One 1200 × 600 board on legs with someone leaning on its edge: its side rails sag too much. */
function leanedOn(): PlanInput {
  return { boards: [{ id: 'm', name: 'Module', lengthMm: 1200, widthMm: 600 }], loads: { pointLoadN: 500 } };
}

function plannerIn(unit: 'mm' | 'ft-in') {
  localStorage.setItem(LENGTH_UNIT_KEY, unit);
  reloadLengthUnit();
  const input = reactive(leanedOn());
  const scope = effectScope();
  const computation = scope.run(() => usePlanComputation(() => input as PlanInput))!;
  return { input, scope, ...computation };
}

describe('the planner’s messages in the unit the person chose', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
    localStorage.clear();
    reloadLengthUnit();
  });

  it('words a sagging rail in millimetres', () => {
    const { plan, scope } = plannerIn('mm');

    // Leg centres 40 mm in from each end of the 1200 mm board: 1120 mm of rail between legs; limit 1120 / 300.
    expect(plan.value!.warnings[0]).toMatch(/over 1120 mm between legs, more than the 3\.7 mm allowed/);
    scope.stop();
  });

  it('words it in feet and inches, and follows the toggle', async () => {
    const { plan, scope } = plannerIn('ft-in');

    // 1120 mm = 44.09 in → 3' 8 1/8" (nearest 1/16 in); 3.73 mm = 0.147 in → 5/32" (nearest 1/32 in).
    expect(plan.value!.warnings[0]).toMatch(/over 3' 8 1\/8" between legs, more than the 5\/32" allowed/);
    expect(plan.value!.warnings[0]).not.toMatch(/\d mm\b/);

    useLengthUnit().unit.value = 'mm';
    await nextTick();
    vi.advanceTimersByTime(RECOMPUTE_DELAY_MS);
    expect(plan.value!.warnings[0]).toMatch(/over 1120 mm between legs/);
    scope.stop();
  });

  it('gives field messages in the chosen unit', async () => {
    const { input, fieldErrors, scope } = plannerIn('ft-in');

    input.boards![0]!.lengthMm = 100;
    await nextTick();
    vi.advanceTimersByTime(RECOMPUTE_DELAY_MS);
    // 300 mm = 11.81 in → 11 13/16" (nearest 1/16 in; 1 in = 25.4 mm exactly)
    expect(fieldErrors.value['boards.0.lengthMm']).toBe('Board length must be at least 11 13/16".');
    scope.stop();
  });
});
