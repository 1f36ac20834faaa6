import type { AuditQuery, ChangeRoleInput, SuspendInput, UserListQuery } from '@shared/schemas/admin';
import type { AdminUserView, AuditEventView, Page } from '@shared/types/user';
import { http } from './http';

/** One person as an administrator's change answers it. */
export interface AdminUserResult {
  user: AdminUserView;
}

/** Search the people list (administrators). */
export function listUsers(query: Partial<UserListQuery>, signal?: AbortSignal): Promise<Page<AdminUserView>> {
  return http.get<Page<AdminUserView>>('/api/admin/users', { ...query }, signal);
}

/** Give a person another role, with the reason recorded in the audit trail. */
export function changeUserRole(userId: number, input: ChangeRoleInput): Promise<AdminUserResult> {
  return http.patch<AdminUserResult>(`/api/admin/users/${userId}/role`, input);
}

/** Suspend a person; the reason is shown to them when they try to sign in. */
export function suspendUser(userId: number, input: SuspendInput): Promise<AdminUserResult> {
  return http.post<AdminUserResult>(`/api/admin/users/${userId}/suspension`, input);
}

/** Lift a suspension. */
export function reinstateUser(userId: number): Promise<AdminUserResult> {
  return http.delete<AdminUserResult>(`/api/admin/users/${userId}/suspension`);
}

/** Read the audit trail, newest first (moderators and administrators). */
export function listAuditEvents(query: Partial<AuditQuery>, signal?: AbortSignal): Promise<Page<AuditEventView>> {
  return http.get<Page<AuditEventView>>('/api/audit-events', { ...query }, signal);
}
