import { Router, type Request, type Response } from 'express';
import {
  authenticatePaymentSchema,
  checkoutQuerySchema,
  createOrderSchema,
  orderParamSchema,
  payOrderSchema,
  type AuthenticatePaymentInput,
  type CheckoutQuery,
  type CreateOrderInput,
  type OrderParam,
  type PayOrderInput,
} from '../../../shared/schemas/checkout';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { listingActorOf } from '../listings/listing-actor';
import { createOrder, giveUp, previewCheckout, readOrder } from './checkout.service';
import { authenticatePayment, requestPayment } from './order-payments.service';

const orderIdOf = (res: Response) => input<OrderParam>(res, 'params').id;
const viewer = (req: Request) => listingActorOf(req);

/** Buying a module: the priced choices, the order that reserves it, paying, and reading the order. */
export function checkoutRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/checkout', validate(checkoutQuerySchema, 'query'), async (req, res) => {
    res.json(await previewCheckout(ctx, viewer(req), input<CheckoutQuery>(res, 'query').listing));
  });

  router.post('/', validate(createOrderSchema), async (req, res) => {
    const { order, created } = await createOrder(ctx, viewer(req), input<CreateOrderInput>(res));
    res.status(created ? 201 : 200).json(order);
  });

  router.get('/:id', validate(orderParamSchema, 'params'), async (req, res) => {
    res.json(await readOrder(ctx, viewer(req), orderIdOf(res)));
  });

  router.post('/:id/payments', validate(orderParamSchema, 'params'), validate(payOrderSchema), async (req, res) => {
    res.json(await requestPayment(ctx, viewer(req), orderIdOf(res), input<PayOrderInput>(res)));
  });

  router.post(
    '/:id/payments/authenticate',
    validate(orderParamSchema, 'params'),
    validate(authenticatePaymentSchema),
    async (req, res) => {
      res.json(await authenticatePayment(ctx, viewer(req), orderIdOf(res), input<AuthenticatePaymentInput>(res)));
    },
  );

  router.post('/:id/give-up', validate(orderParamSchema, 'params'), async (req, res) => {
    res.json(await giveUp(ctx, viewer(req), orderIdOf(res)));
  });

  return router;
}
