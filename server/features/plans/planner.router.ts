import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { validationFailed } from '../../http/errors';
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
      if (error instanceof PlanInputError) throw validationFailed(error.fields, error.message);
      throw error;
    }
  });
  return router;
}
