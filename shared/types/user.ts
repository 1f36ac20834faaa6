import type { Role } from '../roles';

/** The signed-in person as the client sees them. */
export interface UserView {
  id: number;
  email: string;
  displayName: string;
  role: Role;
  emailVerified: boolean;
  /** ISO 8601 */
  createdAt: string;
}

/** The session as the client sees it: who is signed in and the CSRF token to send back. */
export interface SessionView {
  user: UserView | null;
  csrfToken: string;
}

/** A user as an administrator sees them in the people list. */
export interface AdminUserView extends UserView {
  suspendedAt: string | null;
  suspendedReason: string | null;
  lastSignInAt: string | null;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** One recorded decision or security event. */
export interface AuditEventView {
  id: number;
  at: string;
  actor: { id: number; displayName: string } | null;
  action: string;
  targetType: string | null;
  targetId: string | null;
  detail: Record<string, unknown> | null;
  ip: string | null;
}

export interface MessageView {
  message: string;
}
