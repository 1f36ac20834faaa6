import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { AppError } from '../../http/errors';
import { clientIp } from '../../http/request-helpers';
import { computePlan, PlanInputError } from '../../../shared/planner';

/** The planner as a public tool: compute a plan from its JSON input, without signing in. */
export function plannerRouter(ctx: AppContext): Router {
  const router = Router();
  router.post('/plan', async (req, res) => {
    await ctx.rateLimits.consumePlannerRequest(clientIp(req));
    try {
      res.json({ plan: computePlan(req.body) });
    } catch (error) {
      // The public planner API's published contract: 400 naming each wrong field (the forms' API answers 422).
      if (error instanceof PlanInputError) throw new AppError(400, 'invalid_plan_input', error.message, error.fields);
      throw error;
    }
  });
  return router;
}
