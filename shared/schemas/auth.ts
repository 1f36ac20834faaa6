import { z } from 'zod';
import { currentPasswordField, displayNameField, emailField, newPasswordField, tokenField } from './fields';

/** POST /api/auth/sign-up */
export const signUpSchema = z.strictObject({
  email: emailField,
  displayName: displayNameField,
  password: newPasswordField,
});
export type SignUpInput = z.infer<typeof signUpSchema>;

/** POST /api/auth/sign-in */
export const signInSchema = z.strictObject({
  email: emailField,
  password: currentPasswordField,
});
export type SignInInput = z.infer<typeof signInSchema>;

/** POST /api/auth/verify-email and POST /api/account/email/confirm */
export const tokenSchema = z.strictObject({ token: tokenField });
export type TokenInput = z.infer<typeof tokenSchema>;

/** POST /api/auth/resend-verification and POST /api/auth/password-reset/request */
export const emailOnlySchema = z.strictObject({ email: emailField });
export type EmailOnlyInput = z.infer<typeof emailOnlySchema>;

/** POST /api/auth/password-reset/confirm */
export const passwordResetSchema = z.strictObject({
  token: tokenField,
  password: newPasswordField,
});
export type PasswordResetInput = z.infer<typeof passwordResetSchema>;
