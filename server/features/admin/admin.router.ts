import { type Request, Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireRole } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { clientIp } from '../../http/request-helpers';
import {
  changeRoleSchema,
  suspendSchema,
  userIdParamSchema,
  userListQuerySchema,
  type ChangeRoleInput,
  type SuspendInput,
  type UserListQuery,
} from '../../../shared/schemas/admin';
import { presentUserForAdmin } from '../users/user.presenter';
import * as admin from './admin.service';

const actorOf = (req: Request): admin.Actor => ({ id: req.user!.id, ip: clientIp(req) });

/** People and roles: administrators only. */
export function adminRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireRole('admin'));

  router.get('/users', validate(userListQuerySchema, 'query'), async (_req, res) => {
    res.json(await admin.listUsers(ctx, input<UserListQuery>(res, 'query')));
  });

  router.patch(
    '/users/:id/role',
    validate(userIdParamSchema, 'params'),
    validate(changeRoleSchema),
    async (req, res) => {
      const { role, reason } = input<ChangeRoleInput>(res);
      const user = await admin.changeRole(ctx, actorOf(req), input<{ id: number }>(res, 'params').id, role, reason);
      res.json({ user: presentUserForAdmin(user) });
    },
  );

  router.post(
    '/users/:id/suspension',
    validate(userIdParamSchema, 'params'),
    validate(suspendSchema),
    async (req, res) => {
      const user = await admin.suspend(
        ctx,
        actorOf(req),
        input<{ id: number }>(res, 'params').id,
        input<SuspendInput>(res).reason,
      );
      res.json({ user: presentUserForAdmin(user) });
    },
  );

  router.delete('/users/:id/suspension', validate(userIdParamSchema, 'params'), async (req, res) => {
    const user = await admin.reinstate(ctx, actorOf(req), input<{ id: number }>(res, 'params').id);
    res.json({ user: presentUserForAdmin(user) });
  });

  return router;
}
