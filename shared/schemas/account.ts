import { z } from 'zod';
import { currentPasswordField, displayNameField, emailField, newPasswordField } from './fields';

/** PATCH /api/account/profile */
export const profileSchema = z.strictObject({ displayName: displayNameField });
export type ProfileInput = z.infer<typeof profileSchema>;

/** POST /api/account/password */
export const changePasswordSchema = z
  .strictObject({
    currentPassword: currentPasswordField,
    newPassword: newPasswordField,
  })
  .refine((v) => v.currentPassword !== v.newPassword, {
    error: 'Choose a new password that differs from the current one.',
    path: ['newPassword'],
  });
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** POST /api/account/email: a link goes to the new address; the change happens when it is opened. */
export const changeEmailSchema = z.strictObject({
  newEmail: emailField,
  currentPassword: currentPasswordField,
});
export type ChangeEmailInput = z.infer<typeof changeEmailSchema>;
