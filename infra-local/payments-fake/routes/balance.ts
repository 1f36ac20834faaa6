import { Router } from 'express';
import { balanceObject } from '../domain/balance';
import { apiRoute } from '../http/api-route';
import { Params } from '../params';
import type { Runtime } from '../runtime';

export function balanceRoutes(runtime: Runtime): Router {
  const router = Router();
  router.get(
    '/v1/balance',
    apiRoute(runtime, (ctx) => {
      new Params(ctx.raw, []);
      return balanceObject(ctx.store);
    }),
  );
  return router;
}
