import { z } from 'zod';
import { ADMIN_PAGE_SIZE_MAX, REASON_MAX_LENGTH } from '../limits';
import { ROLES } from '../roles';

const reasonField = z
  .string({ error: 'Give a reason.' })
  .trim()
  .min(3, { error: 'Give a reason of at least 3 characters.' })
  .max(REASON_MAX_LENGTH, { error: `Reason must be at most ${REASON_MAX_LENGTH} characters.` });

const pageField = z.coerce
  .number({ error: 'Page must be a number.' })
  .int({ error: 'Page must be a whole number.' })
  .min(1, { error: 'Page must be 1 or more.' })
  .max(100_000, { error: 'Page is too large.' })
  .default(1);

const pageSizeField = z.coerce
  .number({ error: 'Page size must be a number.' })
  .int({ error: 'Page size must be a whole number.' })
  .min(1, { error: 'Page size must be 1 or more.' })
  .max(ADMIN_PAGE_SIZE_MAX, { error: `Page size must be at most ${ADMIN_PAGE_SIZE_MAX}.` })
  .default(25);

/** GET /api/admin/users */
export const userListQuerySchema = z.strictObject({
  q: z.string().trim().max(254, { error: 'Search text must be at most 254 characters.' }).optional(),
  role: z.enum(ROLES, { error: 'Choose one of the roles.' }).optional(),
  page: pageField,
  pageSize: pageSizeField,
});
export type UserListQuery = z.infer<typeof userListQuerySchema>;

/** PATCH /api/admin/users/:id/role */
export const changeRoleSchema = z.strictObject({
  role: z.enum(ROLES, { error: 'Choose one of the roles.' }),
  reason: reasonField,
});
export type ChangeRoleInput = z.infer<typeof changeRoleSchema>;

/** POST /api/admin/users/:id/suspension */
export const suspendSchema = z.strictObject({ reason: reasonField });
export type SuspendInput = z.infer<typeof suspendSchema>;

/** GET /api/audit-events */
export const auditQuerySchema = z.strictObject({ page: pageField, pageSize: pageSizeField });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** Route parameter `:id` of a user. */
export const userIdParamSchema = z.strictObject({
  id: z.coerce.number({ error: 'Unknown user.' }).int({ error: 'Unknown user.' }).positive({ error: 'Unknown user.' }),
});
