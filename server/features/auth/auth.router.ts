import { Router } from 'express';
import type { Authenticator } from './passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AppContext } from '../../app-context';
import { AppError } from '../../http/errors';
import { clientIp, logIn, logOut, sessionView } from '../../http/request-helpers';
import { input, validate } from '../../http/middlewares/validate';
import {
  emailOnlySchema,
  passwordResetSchema,
  signInSchema,
  signUpSchema,
  tokenSchema,
  type EmailOnlyInput,
  type PasswordResetInput,
  type SignInInput,
  type SignUpInput,
  type TokenInput,
} from '../../../shared/schemas/auth';
import * as auth from './auth.service';

/** Sign-up, e-mail confirmation, sign-in and -out, password reset. */
export function authRouter(ctx: AppContext, passport: Authenticator): Router {
  passport.use(
    new LocalStrategy(
      { usernameField: 'email', passwordField: 'password', passReqToCallback: true },
      (req, _email, _password, done) => {
        const { email, password } = input<SignInInput>(req.res!);
        auth.authenticate(ctx, email, password, clientIp(req)).then((user) => done(null, user), done);
      },
    ),
  );

  const router = Router();

  router.get('/session', (req, res) => {
    res.json(sessionView(req));
  });

  router.post('/sign-up', validate(signUpSchema), async (req, res) => {
    res.status(202).json({ message: await auth.signUp(ctx, input<SignUpInput>(res), clientIp(req)) });
  });

  router.post('/verify-email', validate(tokenSchema), async (req, res) => {
    res.json({ message: await auth.verifyEmail(ctx, input<TokenInput>(res).token, clientIp(req)) });
  });

  router.post('/resend-verification', validate(emailOnlySchema), async (req, res) => {
    res
      .status(202)
      .json({ message: await auth.resendVerification(ctx, input<EmailOnlyInput>(res).email, clientIp(req)) });
  });

  router.post('/sign-in', validate(signInSchema), async (req, res) => {
    const user = await new Promise<Express.User>((resolve, reject) => {
      passport.authenticate('local', { session: false }, (error: unknown, found: Express.User | false) =>
        error
          ? reject(error)
          : found
            ? resolve(found)
            : reject(new AppError(401, 'invalid_credentials', 'The e-mail address or password is not right.')),
      )(req, res, reject);
    });
    await logIn(req, user);
    await auth.recordSignIn(ctx, user, clientIp(req));
    res.json(sessionView(req, true));
  });

  router.post('/sign-out', async (req, res) => {
    const userId = req.user?.id;
    await logOut(req);
    if (userId) ctx.logger.info({ event: 'sign_out', userId, ip: clientIp(req) }, 'signed out');
    res.json(sessionView(req, true));
  });

  router.post('/password-reset/request', validate(emailOnlySchema), async (req, res) => {
    res
      .status(202)
      .json({ message: await auth.requestPasswordReset(ctx, input<EmailOnlyInput>(res).email, clientIp(req)) });
  });

  router.post('/password-reset/confirm', validate(passwordResetSchema), async (req, res) => {
    const { token, password } = input<PasswordResetInput>(res);
    res.json({ message: await auth.confirmPasswordReset(ctx, token, password, clientIp(req)) });
  });

  return router;
}
