import type { EntityManager } from 'typeorm';
import type { AppContext } from '../../app-context';
import { conflict } from '../../http/errors';
import type { Role } from '../../../shared/roles';
import type { UserListQuery } from '../../../shared/schemas/admin';
import type { AdminUserView, Page } from '../../../shared/types/user';
import { recordAudit } from '../audit/audit.service';
import type { User } from '../users/user.entity';
import { presentUserForAdmin } from '../users/user.presenter';
import { lockUser, searchUsers } from '../users/user.repository';

export interface Actor {
  id: number;
  ip: string;
}

export async function listUsers(ctx: AppContext, query: UserListQuery): Promise<Page<AdminUserView>> {
  const [users, total] = await searchUsers(ctx.dataSource.manager, query);
  return { items: users.map(presentUserForAdmin), total, page: query.page, pageSize: query.pageSize };
}

/** Administrators act on other accounts only, so nobody locks themselves out by accident. */
function assertNotSelf(actor: Actor, targetId: number, what: string): void {
  if (actor.id === targetId)
    throw conflict('own_account', `You cannot ${what} your own account. Ask another administrator.`);
}

export async function changeRole(
  ctx: AppContext,
  actor: Actor,
  userId: number,
  role: Role,
  reason: string,
): Promise<User> {
  assertNotSelf(actor, userId, 'change the role of');
  return ctx.transaction(async (m) => {
    const user = await lockUser(m, userId);
    if (user.role === role) return user;
    const from = user.role;
    user.role = role;
    await m.save(user);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'user.role_changed',
      targetType: 'user',
      targetId: user.id,
      detail: { from, to: role, reason },
      ip: actor.ip,
    });
    return user;
  });
}

/** Suspend: the account's sessions end at once and it cannot sign in; it is told the reason. */
export async function suspend(ctx: AppContext, actor: Actor, userId: number, reason: string): Promise<User> {
  return ctx.transaction((m) => suspendAccount(m, actor, userId, reason));
}

/** Suspend inside the caller's transaction (also used by moderators acting on a listing), audit-logged. */
export async function suspendAccount(m: EntityManager, actor: Actor, userId: number, reason: string): Promise<User> {
  assertNotSelf(actor, userId, 'suspend');
  const user = await lockUser(m, userId);
  user.suspendedAt = new Date();
  user.suspendedReason = reason;
  user.sessionEpoch += 1;
  await m.save(user);
  await recordAudit(m, {
    actorId: actor.id,
    action: 'user.suspended',
    targetType: 'user',
    targetId: user.id,
    detail: { reason },
    ip: actor.ip,
  });
  return user;
}

export async function reinstate(ctx: AppContext, actor: Actor, userId: number): Promise<User> {
  return ctx.transaction(async (m) => {
    const user = await lockUser(m, userId);
    if (!user.suspendedAt) return user;
    user.suspendedAt = null;
    user.suspendedReason = null;
    await m.save(user);
    await recordAudit(m, {
      actorId: actor.id,
      action: 'user.reinstated',
      targetType: 'user',
      targetId: user.id,
      ip: actor.ip,
    });
    return user;
  });
}
