import { Router } from 'express';
import { orderParamSchema, type OrderParam } from '../../../shared/schemas/checkout';
import { settleProblemSchema, type SettleProblemInput } from '../../../shared/schemas/order-aftercare';
import type { AppContext } from '../../app-context';
import { requireRole } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { listingActorOf } from '../listings/listing-actor';
import { settleProblem } from './order-moves.service';
import { openProblems } from './order-problems.service';
import { currentOrderView } from './order-view';

/** /api/order-problems: moderators see orders with a problem raised and settle them. */
export function orderProblemsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireRole('moderator'));

  router.get('/', async (_req, res) => {
    res.json({ problems: await openProblems(ctx.dataSource.manager) });
  });

  router.post('/:id/settle', validate(orderParamSchema, 'params'), validate(settleProblemSchema), async (req, res) => {
    const moderator = listingActorOf(req);
    const { id } = input<OrderParam>(res, 'params');
    await settleProblem(ctx, moderator, id, input<SettleProblemInput>(res));
    res.json({ order: await currentOrderView(ctx, moderator, id) });
  });

  return router;
}
