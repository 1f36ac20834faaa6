import { Router } from 'express';
import { feeRatesSchema, type FeeRatesInput } from '../../../shared/schemas/order-aftercare';
import type { AppContext } from '../../app-context';
import { requireRole } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { clientIp } from '../../http/request-helpers';
import { currentFees, feeSchedule, setFees } from './fees.service';

/** GET /api/fees: the rates that apply now, public so a seller's price preview (and anyone) can show them. */
export function feesRouter(ctx: AppContext): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json({ fees: await currentFees(ctx.dataSource.manager) });
  });
  return router;
}

/** /api/admin/fees: administrators read and set the platform's rates. */
export function adminFeesRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/', async (_req, res) => {
    res.json(await feeSchedule(ctx.dataSource.manager));
  });

  router.put('/', validate(feeRatesSchema), async (req, res) => {
    const admin = { id: req.user!.id, ip: clientIp(req) };
    res.json(await ctx.transaction((m) => setFees(m, admin, input<FeeRatesInput>(res))));
  });

  return router;
}
