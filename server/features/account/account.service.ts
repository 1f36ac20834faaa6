import type { Request } from 'express';
import type { AppContext } from '../../app-context';
import { conflict, validationFailed } from '../../http/errors';
import { clientIp, logIn } from '../../http/request-helpers';
import type { ChangeEmailInput, ChangePasswordInput } from '../../../shared/schemas/account';
import { recordAudit } from '../audit/audit.service';
import { assertPasswordAcceptable } from '../auth/auth.service';
import { consumeToken, issueToken, retireTokens } from '../auth/one-time-tokens';
import { hashPassword, verifyPassword } from '../auth/password-hash';
import { enqueueEmail } from '../mail/mail-outbox';
import { mailTemplates } from '../mail/mail-templates';
import type { User } from '../users/user.entity';
import { lockUser } from '../users/user.repository';

const isDuplicate = (error: unknown) => (error as { code?: string } | null)?.code === 'ER_DUP_ENTRY';

/** A wrong current password counts as a failed sign-in, so it cannot be guessed here instead. */
async function assertCurrentPassword(ctx: AppContext, user: User, password: string, ip: string): Promise<void> {
  await ctx.rateLimits.assertSignInAllowed(user.email, ip);
  if (!(await verifyPassword(user.passwordHash, password))) {
    await ctx.rateLimits.recordSignInFailure(user.email, ip);
    throw validationFailed({ currentPassword: 'Your current password is not right.' });
  }
}

export async function updateDisplayName(ctx: AppContext, userId: number, displayName: string): Promise<User> {
  return ctx.transaction(async (m) => {
    const user = await lockUser(m, userId);
    user.displayName = displayName;
    return m.save(user);
  });
}

/** Change the password, end every other session, and keep this one signed in. */
export async function changePassword(ctx: AppContext, req: Request, body: ChangePasswordInput): Promise<void> {
  const current = req.user!;
  const ip = clientIp(req);
  await assertCurrentPassword(ctx, current, body.currentPassword, ip);
  assertPasswordAcceptable('newPassword', body.newPassword, current);
  const passwordHash = await hashPassword(body.newPassword);
  const updated = await ctx.transaction(async (m) => {
    const user = await lockUser(m, current.id);
    user.passwordHash = passwordHash;
    user.sessionEpoch += 1;
    await m.save(user);
    await enqueueEmail(m, user.email, mailTemplates.passwordChanged(user.displayName));
    await recordAudit(m, {
      actorId: user.id,
      action: 'account.password_changed',
      targetType: 'user',
      targetId: user.id,
      ip,
    });
    return user;
  });
  await logIn(req, updated);
}

/** Send a confirmation link to the new address; the change happens when it is opened. */
export async function requestEmailChange(ctx: AppContext, req: Request, body: ChangeEmailInput): Promise<string> {
  const current = req.user!;
  const ip = clientIp(req);
  await assertCurrentPassword(ctx, current, body.currentPassword, ip);
  if (body.newEmail === current.email) throw validationFailed({ newEmail: 'This is already your address.' });
  await ctx.rateLimits.consumeMailRequest(current.email, ip);
  await ctx.transaction(async (m) => {
    await retireTokens(m, current.id, 'change_email');
    const token = await issueToken(m, current.id, 'change_email', body.newEmail);
    const url = `${ctx.config.appOrigin}/account/confirm-email?token=${encodeURIComponent(token)}`;
    await enqueueEmail(m, body.newEmail, mailTemplates.confirmNewEmail(current.displayName, url));
  });
  return `We have sent a link to ${body.newEmail}. Your address changes when you open it.`;
}

export async function confirmEmailChange(ctx: AppContext, token: string, ip: string): Promise<string> {
  try {
    await ctx.transaction(async (m) => {
      const used = await consumeToken(m, token, 'change_email');
      const user = await lockUser(m, used.userId);
      const oldEmail = user.email;
      user.email = used.newEmail!;
      user.emailVerifiedAt = new Date();
      await m.save(user);
      await enqueueEmail(m, oldEmail, mailTemplates.emailChanged(user.displayName, user.email));
      await recordAudit(m, {
        actorId: user.id,
        action: 'account.email_changed',
        targetType: 'user',
        targetId: user.id,
        detail: { from: oldEmail, to: user.email },
        ip,
      });
    });
  } catch (error) {
    if (isDuplicate(error))
      throw conflict('email_taken', 'Another account now uses that address. Choose a different one.');
    throw error;
  }
  return 'Your e-mail address has been changed.';
}
