import type { z } from 'zod';
import { explicitBoardProblems, secondLevelProblems, sectionProblems, underBoardProblems } from './check-boards';
import { checkContext, type FieldProblem } from './check-context';
import { pricingProblems } from './check-pricing';
import { roomProblems } from './check-room';
import type { PlanInputFields } from './object';

/** Every problem across fields of a parsed input: sizes that do not fit together, references to nothing. */
export function crossFieldProblems(input: PlanInputFields): FieldProblem[] {
  const ctx = checkContext(input);
  return [
    ...sectionProblems(ctx),
    ...explicitBoardProblems(ctx),
    ...roomProblems(ctx),
    ...secondLevelProblems(ctx),
    ...underBoardProblems(ctx),
    ...pricingProblems(ctx),
  ];
}

/** Reports the problems across fields as issues at their fields' paths. */
export function checkPlanInput(input: PlanInputFields, ctx: z.RefinementCtx): void {
  for (const problem of crossFieldProblems(input)) {
    ctx.addIssue({ code: 'custom', path: problem.path, message: problem.message, input });
  }
}
