import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { AppError, validationFailed } from '../../http/errors';
import type { SignUpInput } from '../../../shared/schemas/auth';
import { recordAudit } from '../audit/audit.service';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import { User } from '../users/user.entity';
import { findUserByEmail, lockUser } from '../users/user.repository';
import { consumeToken, issueToken, retireTokens } from './one-time-tokens';
import { hashPassword, verifyAgainstNothing, verifyPassword } from './password-hash';
import { passwordProblem } from './password-policy';

const link = (ctx: AppContext, path: string, token: string) =>
  `${ctx.config.appOrigin}${path}?token=${encodeURIComponent(token)}`;

export const SIGN_UP_ANSWER = 'Check your inbox: we have sent a link to confirm your address. Open it, then sign in.';
export const RESET_ANSWER = 'If an account uses that address, we have sent it a link to choose a new password.';
export const RESEND_ANSWER = 'If that address belongs to an account waiting for confirmation, we have sent a new link.';

const isDuplicate = (error: unknown) => (error as { code?: string } | null)?.code === 'ER_DUP_ENTRY';

/** Refuse a common or personal password with a message on the named field. */
export function assertPasswordAcceptable(
  field: string,
  password: string,
  context: { email: string; displayName?: string },
) {
  const problem = passwordProblem(password, context);
  if (problem) throw validationFailed({ [field]: problem });
}

/**
 * Open an account and e-mail a confirmation link. An address that is already registered gets
 * a different e-mail, but the answer to the browser is the same, so nobody learns who has an account.
 */
export async function signUp(ctx: AppContext, input: SignUpInput, ip: string): Promise<string> {
  assertPasswordAcceptable('password', input.password, input);
  await ctx.rateLimits.consumeMailRequest(input.email, ip);
  const passwordHash = await hashPassword(input.password);
  try {
    await ctx.transaction(async (m) => {
      const existing = await findUserByEmail(m, input.email);
      if (existing) return tellExistingOwner(ctx, m, existing);
      const { identifiers } = await m.insert(User, {
        email: input.email,
        displayName: input.displayName,
        passwordHash,
        role: 'member',
      });
      const userId = Number(identifiers[0]?.id);
      const token = await issueToken(m, userId, 'verify_email');
      await enqueueEmail(
        m,
        input.email,
        mailTemplates.verifyEmail(input.displayName, link(ctx, '/verify-email', token)),
      );
      await recordAudit(m, { actorId: userId, action: 'account.created', targetType: 'user', targetId: userId, ip });
    });
  } catch (error) {
    if (!isDuplicate(error)) throw error;
    // Two sign-ups with one address at the same moment: the loser is told like any existing owner.
    await ctx.transaction(async (m) => {
      const existing = await findUserByEmail(m, input.email);
      if (existing) await tellExistingOwner(ctx, m, existing);
    });
  }
  return SIGN_UP_ANSWER;
}

async function tellExistingOwner(ctx: AppContext, m: EntityManager, owner: User): Promise<void> {
  const origin = ctx.config.appOrigin;
  await enqueueEmail(
    m,
    owner.email,
    mailTemplates.alreadyRegistered(owner.displayName, `${origin}/sign-in`, `${origin}/forgot-password`),
  );
}

export async function verifyEmail(ctx: AppContext, token: string, ip: string): Promise<string> {
  await ctx.transaction(async (m) => {
    const used = await consumeToken(m, token, 'verify_email');
    const user = await lockUser(m, used.userId);
    if (!user.emailVerifiedAt) {
      user.emailVerifiedAt = new Date();
      await m.save(user);
      await recordAudit(m, {
        actorId: user.id,
        action: 'account.email_verified',
        targetType: 'user',
        targetId: user.id,
        ip,
      });
    }
  });
  return 'Your e-mail address is confirmed. You can sign in now.';
}

export async function resendVerification(ctx: AppContext, email: string, ip: string): Promise<string> {
  await ctx.rateLimits.consumeMailRequest(email, ip);
  await ctx.transaction(async (m) => {
    const user = await findUserByEmail(m, email);
    if (!user || user.emailVerifiedAt) return;
    await retireTokens(m, user.id, 'verify_email');
    const token = await issueToken(m, user.id, 'verify_email');
    await enqueueEmail(m, user.email, mailTemplates.verifyEmail(user.displayName, link(ctx, '/verify-email', token)));
  });
  return RESEND_ANSWER;
}

/**
 * Check an e-mail and password. Unknown address and wrong password answer alike (and take as
 * long); only a correct password learns that the account is suspended or not yet confirmed.
 */
export async function authenticate(ctx: AppContext, email: string, password: string, ip: string): Promise<User> {
  await ctx.rateLimits.assertSignInAllowed(email, ip);
  const user = await findUserByEmail(ctx.dataSource.manager, email);
  const ok = user ? await verifyPassword(user.passwordHash, password) : (await verifyAgainstNothing(password), false);
  if (!user || !ok) {
    await ctx.rateLimits.recordSignInFailure(email, ip);
    ctx.logger.warn({ event: 'sign_in_failed', email, ip, known: Boolean(user) }, 'sign-in refused');
    throw new AppError(401, 'invalid_credentials', 'The e-mail address or password is not right.');
  }
  await ctx.rateLimits.clearSignInFailures(email);
  if (user.suspendedAt) {
    ctx.logger.warn({ event: 'sign_in_suspended', userId: user.id, ip }, 'suspended account tried to sign in');
    throw new AppError(
      403,
      'account_suspended',
      `Your account is suspended: ${user.suspendedReason ?? 'no reason recorded'}. Write to the moderators if you think this is a mistake.`,
    );
  }
  if (!user.emailVerifiedAt) {
    throw new AppError(
      403,
      'email_unverified',
      'Confirm your e-mail address first: open the link we sent you, or ask for a new one.',
    );
  }
  return user;
}

/** Record a completed sign-in. */
export async function recordSignIn(ctx: AppContext, user: User, ip: string): Promise<void> {
  await ctx.transaction(async (m) => {
    await m.update(User, { id: user.id }, { lastSignInAt: new Date() });
    await recordAudit(m, { actorId: user.id, action: 'account.signed_in', targetType: 'user', targetId: user.id, ip });
  });
  ctx.logger.info({ event: 'sign_in', userId: user.id, ip }, 'signed in');
}

export async function requestPasswordReset(ctx: AppContext, email: string, ip: string): Promise<string> {
  await ctx.rateLimits.consumeMailRequest(email, ip);
  await ctx.transaction(async (m) => {
    const user = await findUserByEmail(m, email);
    if (!user) return;
    await retireTokens(m, user.id, 'reset_password');
    const token = await issueToken(m, user.id, 'reset_password');
    await enqueueEmail(
      m,
      user.email,
      mailTemplates.passwordReset(user.displayName, link(ctx, '/reset-password', token)),
    );
  });
  return RESET_ANSWER;
}

/** Set a new password from an e-mailed link; ends every session of the account. */
export async function confirmPasswordReset(
  ctx: AppContext,
  token: string,
  password: string,
  ip: string,
): Promise<string> {
  const email = await ctx.transaction(async (m) => {
    const used = await consumeToken(m, token, 'reset_password');
    const user = await lockUser(m, used.userId);
    assertPasswordAcceptable('password', password, user);
    user.passwordHash = await hashPassword(password);
    user.sessionEpoch += 1;
    user.emailVerifiedAt ??= new Date(); // the link proves the address
    await m.save(user);
    await enqueueEmail(m, user.email, mailTemplates.passwordChanged(user.displayName));
    await recordAudit(m, {
      actorId: user.id,
      action: 'account.password_reset',
      targetType: 'user',
      targetId: user.id,
      ip,
    });
    return user.email;
  });
  await ctx.rateLimits.clearSignInFailures(email);
  return 'Your password has been changed. Sign in with the new one.';
}
