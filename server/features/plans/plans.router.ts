import { type Response, Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  planIdParamSchema,
  savePlanSchema,
  sharePlanSchema,
  shareTokenParamSchema,
  updatePlanSchema,
  type SharePlanInput,
} from '../../../shared/schemas/plans';
import * as plans from './plans.service';

type SaveBody = { name: string; input: unknown };
const planId = (res: Response) => input<{ id: number }>(res, 'params').id;

/** A member's saved frame plans. */
export function plansRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/', async (req, res) => {
    res.json({ items: await plans.listPlans(ctx, req.user!.id) });
  });

  router.post('/', validate(savePlanSchema), async (req, res) => {
    const body = input<SaveBody>(res);
    res.status(201).json({ plan: await plans.createPlan(ctx, req.user!.id, body.name, body.input) });
  });

  router.get('/:id', validate(planIdParamSchema, 'params'), async (req, res) => {
    res.json({ plan: await plans.getPlan(ctx, req.user!.id, planId(res)) });
  });

  router.put('/:id', validate(planIdParamSchema, 'params'), validate(updatePlanSchema), async (req, res) => {
    const body = input<SaveBody>(res);
    res.json({ plan: await plans.updatePlan(ctx, req.user!.id, planId(res), body.name, body.input) });
  });

  router.delete('/:id', validate(planIdParamSchema, 'params'), async (req, res) => {
    await plans.deletePlan(ctx, req.user!.id, planId(res));
    res.status(204).end();
  });

  router.post('/:id/share', validate(planIdParamSchema, 'params'), validate(sharePlanSchema), async (req, res) => {
    const { shared } = input<SharePlanInput>(res);
    res.json({ plan: await plans.setSharing(ctx, req.user!.id, planId(res), shared) });
  });

  return router;
}

/** Plans opened through a share link: read-only, no sign-in needed. */
export function sharedPlansRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/:token', validate(shareTokenParamSchema, 'params'), async (_req, res) => {
    res.json({ plan: await plans.getSharedPlan(ctx, input<{ token: string }>(res, 'params').token) });
  });
  return router;
}
