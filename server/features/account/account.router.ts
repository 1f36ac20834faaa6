import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import { clientIp, sessionView } from '../../http/request-helpers';
import {
  changeEmailSchema,
  changePasswordSchema,
  profileSchema,
  type ChangeEmailInput,
  type ChangePasswordInput,
  type ProfileInput,
} from '../../../shared/schemas/account';
import { tokenSchema, type TokenInput } from '../../../shared/schemas/auth';
import { presentUser } from '../users/user.presenter';
import * as account from './account.service';

/** The signed-in person's own account. */
export function accountRouter(ctx: AppContext): Router {
  const router = Router();

  // Opened from an e-mail, possibly in a browser that is not signed in.
  router.post('/email/confirm', validate(tokenSchema), async (req, res) => {
    res.json({ message: await account.confirmEmailChange(ctx, input<TokenInput>(res).token, clientIp(req)) });
  });

  router.use(requireSignedIn);

  router.get('/', (req, res) => {
    res.json({ user: presentUser(req.user!) });
  });

  router.patch('/profile', validate(profileSchema), async (req, res) => {
    const user = await account.updateDisplayName(ctx, req.user!.id, input<ProfileInput>(res).displayName);
    res.json({ user: presentUser(user) });
  });

  router.post('/password', validate(changePasswordSchema), async (req, res) => {
    await account.changePassword(ctx, req, input<ChangePasswordInput>(res));
    res.json(sessionView(req, true));
  });

  router.post('/email', validate(changeEmailSchema), async (req, res) => {
    res.status(202).json({ message: await account.requestEmailChange(ctx, req, input<ChangeEmailInput>(res)) });
  });

  return router;
}
