import { Router } from 'express';
import { orderParamSchema, type OrderParam } from '../../../shared/schemas/checkout';
import { ordersListQuerySchema, type OrdersListQuery } from '../../../shared/schemas/order-aftercare';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { listingActorOf } from '../listings/listing-actor';
import { orderReceiptPdf } from './order-receipt-pdf';
import { currentOrderView } from './order-view';
import { listOrders } from './orders-list.service';

/** GET /api/orders (the signed-in person's purchases or sales) and each order's receipt as PDF. */
export function ordersListRouter(ctx: AppContext): Router {
  const router = Router();

  router.get('/', requireSignedIn, validate(ordersListQuerySchema, 'query'), async (req, res) => {
    const { side, page } = input<OrdersListQuery>(res, 'query');
    res.json(await listOrders(ctx.dataSource.manager, req.user!.id, side, page));
  });

  router.get('/:id/receipt.pdf', requireSignedIn, validate(orderParamSchema, 'params'), async (req, res) => {
    const { id } = input<OrderParam>(res, 'params');
    const pdf = await orderReceiptPdf(await currentOrderView(ctx, listingActorOf(req), id));
    res
      .type('application/pdf')
      .setHeader('Content-Disposition', `attachment; filename="benchwright-order-${id}-receipt.pdf"`)
      .send(Buffer.from(pdf));
  });

  return router;
}
