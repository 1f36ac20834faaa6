import type { Role } from '@shared/roles';
import type { SessionView, UserView } from '@shared/types/user';

/** A made-up signed-in person for client tests. */
export function buildUser(overrides: Partial<UserView> = {}): UserView {
  return {
    id: 7,
    email: 'ada.siding@example.org',
    displayName: 'Ada Siding',
    role: 'member',
    emailVerified: true,
    createdAt: '2026-03-07T14:05:00.000Z',
    ...overrides,
  };
}

/** A session answer for someone holding `role`, or for a visitor when `role` is null. */
export function buildSession(role: Role | null, csrfToken = 'token-from-session'): SessionView {
  return { user: role ? buildUser({ role }) : null, csrfToken };
}
