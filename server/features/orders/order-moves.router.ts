import { Router, type Response } from 'express';
import { orderParamSchema, type OrderParam } from '../../../shared/schemas/checkout';
import {
  cancelOrderSchema,
  handOverSchema,
  raiseProblemSchema,
  type CancelOrderInput,
  type HandOverInput,
  type RaiseProblemInput,
} from '../../../shared/schemas/order-aftercare';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { listingActorOf } from '../listings/listing-actor';
import * as moves from './order-moves.service';
import { currentOrderView } from './order-view';

const idParam = validate(orderParamSchema, 'params');
const idOf = (res: Response) => input<OrderParam>(res, 'params').id;

/**
 * The buyer's and the seller's moves on a paid order, under /api/orders/:id. Each answers with the order as the
 * mover now sees it; a move the order's state does not allow is a 409, a move for the other side a 403, and an
 * order the person is not part of a 404.
 */
export function orderMovesRouter(ctx: AppContext): Router {
  const router = Router();
  // Signed-in checks per route: other routers share the /orders mount and some of their routes are public.
  const answer = async (req: Parameters<typeof listingActorOf>[0], res: Response) =>
    res.json({ order: await currentOrderView(ctx, listingActorOf(req), idOf(res)) });

  router.post('/:id/send', requireSignedIn, idParam, validate(handOverSchema), async (req, res) => {
    await moves.send(ctx, listingActorOf(req), idOf(res), input<HandOverInput>(res).note || null);
    await answer(req, res);
  });

  router.post('/:id/offer-collection', requireSignedIn, idParam, validate(handOverSchema), async (req, res) => {
    await moves.offerCollection(ctx, listingActorOf(req), idOf(res), input<HandOverInput>(res).note || null);
    await answer(req, res);
  });

  router.post('/:id/confirm-receipt', requireSignedIn, idParam, async (req, res) => {
    await moves.confirmReceipt(ctx, listingActorOf(req), idOf(res));
    await answer(req, res);
  });

  router.post('/:id/cancel', requireSignedIn, idParam, validate(cancelOrderSchema), async (req, res) => {
    await moves.cancel(ctx, listingActorOf(req), idOf(res), input<CancelOrderInput>(res).reason || null);
    await answer(req, res);
  });

  router.post('/:id/problem', requireSignedIn, idParam, validate(raiseProblemSchema), async (req, res) => {
    await moves.raiseProblem(ctx, listingActorOf(req), idOf(res), input<RaiseProblemInput>(res).reason);
    await answer(req, res);
  });

  return router;
}
