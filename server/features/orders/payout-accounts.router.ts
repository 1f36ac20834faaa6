import { Router } from 'express';
import type { BalancesView } from '../../../shared/types/order-aftercare';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { sellerBalances } from './balances.service';
import { listOrders } from './orders-list.service';
import { connectPayoutAccount, payoutAccountStatus } from './payout-accounts.service';

/** /api/payouts: a seller's payout account (onboarding at the provider) and their balances. */
export function payoutsRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  /** Start or continue onboarding; the client sends the person to the answered address. */
  router.post('/account', async (req, res) => {
    res.json(await connectPayoutAccount(ctx, req.user!.id));
  });

  router.get('/account', async (req, res) => {
    res.json({ account: await payoutAccountStatus(ctx, req.user!.id) });
  });

  router.get('/balances', async (req, res) => {
    const userId = req.user!.id;
    const account = await payoutAccountStatus(ctx, userId);
    const m = ctx.dataSource.manager;
    const body: BalancesView = {
      account,
      totals: await sellerBalances(m, userId),
      recent: (await listOrders(m, userId, 'selling', 1, 10)).items,
    };
    res.json(body);
  });

  return router;
}
