import { type Response, Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { buildOrderParamSchema, buildStageSchema, type BuildStageInput } from '../../../shared/schemas/quotes';
import { listingActorOf } from '../listings/listing-actor';
import { getBuild, recordStage } from './build-stages.service';

const id = (res: Response) => input<{ id: number }>(res, 'params').id;
const orderParam = validate(buildOrderParamSchema, 'params');

/** A build order's progress: its buyer and builder read it; the builder records stages. */
export function buildStagesRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/:id', orderParam, async (req, res) => {
    res.json({ build: await getBuild(ctx, listingActorOf(req), id(res)) });
  });

  router.post('/:id/stages', orderParam, validate(buildStageSchema), async (req, res) => {
    res.json({ build: await recordStage(ctx, listingActorOf(req), id(res), input<BuildStageInput>(res)) });
  });

  return router;
}
