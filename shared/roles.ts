/** Roles a Benchwright account can hold. Every signed-in account can buy and sell (a member). */
export const ROLES = ['member', 'builder', 'moderator', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** Words shown to people for each role. */
export const ROLE_LABELS: Record<Role, string> = {
  member: 'Member',
  builder: 'Builder',
  moderator: 'Moderator',
  admin: 'Administrator',
};

/**
 * Whether an account holding `role` may do what `required` allows.
 * An administrator can also do everything a moderator can; a builder is a member
 * with an approved builder profile. Used by the server's checks and the client's menus.
 */
export function roleSatisfies(role: Role, required: Role): boolean {
  if (role === required) return true;
  if (required === 'member') return true;
  if (required === 'moderator') return role === 'admin';
  return false;
}

export function hasAnyRole(role: Role, required: readonly Role[]): boolean {
  return required.some((r) => roleSatisfies(role, r));
}
