import { singlePortableModule } from '@shared/planner';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { effectScope, nextTick, reactive } from 'vue';
import { RECOMPUTE_DELAY_MS, usePlanComputation } from '@/composables/usePlanComputation';
import { draftFromInput } from '@/utils/planner/draft-from-input';
import { draftToInput } from '@/utils/planner/draft-to-input';

function planFromExample() {
  const draft = reactive(draftFromInput(singlePortableModule)!);
  const scope = effectScope();
  const computation = scope.run(() => usePlanComputation(() => draftToInput(draft, 'mm')))!;
  return { draft, scope, ...computation };
}

describe('working the plan out as the person types', () => {
  beforeEach(() => {
    vi.useFakeTimers();
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('plans at once, then again only once typing has paused', async () => {
    const { draft, plan, pending, scope } = planFromExample();
    const first = plan.value;
    expect(first?.boards[0]?.lengthMm).toBe(1200);

    draft.boards[0]!.lengthMm = 1000;
    await nextTick();
    draft.boards[0]!.lengthMm = 900;
    await nextTick();
    vi.advanceTimersByTime(RECOMPUTE_DELAY_MS - 1);
    expect(pending.value).toBe(true);
    expect(plan.value).toBe(first);

    vi.advanceTimersByTime(1);
    expect(pending.value).toBe(false);
    expect(plan.value?.boards[0]?.lengthMm).toBe(900);
    scope.stop();
  });

  it('keeps the last good plan while an input is invalid, with the message at its dotted path', async () => {
    const { draft, plan, fieldErrors, problem, scope } = planFromExample();
    const good = plan.value;

    draft.boards[0]!.lengthMm = 100; // shorter than PLAN_LIMITS.minBoardLengthMm (300)
    await nextTick();
    vi.advanceTimersByTime(RECOMPUTE_DELAY_MS);

    expect(plan.value).toBe(good);
    expect(fieldErrors.value['boards.0.lengthMm']).toMatch(/at least 300 mm/);
    expect(problem.value).not.toBe('');

    draft.boards[0]!.lengthMm = 1100;
    await nextTick();
    vi.advanceTimersByTime(RECOMPUTE_DELAY_MS);

    expect(fieldErrors.value).toEqual({});
    expect(problem.value).toBe('');
    expect(plan.value?.boards[0]?.lengthMm).toBe(1100);
    scope.stop();
  });

  it('treats a number still being typed (NaN) as invalid rather than planning with it', async () => {
    const { draft, plan, fieldErrors, scope } = planFromExample();
    const good = plan.value;

    draft.construction.crossMemberSpacingMm = Number.NaN;
    await nextTick();
    vi.advanceTimersByTime(RECOMPUTE_DELAY_MS);

    expect(plan.value).toBe(good);
    expect(Object.keys(fieldErrors.value)).toContain('construction.crossMemberSpacingMm');
    scope.stop();
  });
});
