import type { AdminUserView, UserView } from '../../../shared/types/user';
import type { User } from './user.entity';

/** What the account's owner sees of it. Never the hash, the epoch or moderation notes. */
export function presentUser(user: User): UserView {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    emailVerified: user.emailVerifiedAt !== null,
    createdAt: user.createdAt.toISOString(),
  };
}

/** What an administrator sees in the people list. */
export function presentUserForAdmin(user: User): AdminUserView {
  return {
    ...presentUser(user),
    suspendedAt: user.suspendedAt?.toISOString() ?? null,
    suspendedReason: user.suspendedReason,
    lastSignInAt: user.lastSignInAt?.toISOString() ?? null,
  };
}
