import type { EmailOnlyInput, PasswordResetInput, SignInInput, SignUpInput, TokenInput } from '@shared/schemas/auth';
import type { MessageView, SessionView } from '@shared/types/user';
import { http } from './http';

/** Who is signed in, and the CSRF token for this session. */
export function getSession(): Promise<SessionView> {
  return http.get<SessionView>('/api/auth/session');
}

/** Create an account; the answer is the same whether or not the address is already registered. */
export function signUp(input: SignUpInput): Promise<MessageView> {
  return http.post<MessageView>('/api/auth/sign-up', input);
}

/** Confirm an e-mail address with the token from the e-mailed link. */
export function verifyEmail(input: TokenInput): Promise<MessageView> {
  return http.post<MessageView>('/api/auth/verify-email', input);
}

/** Send the confirmation link again. */
export function resendVerification(input: EmailOnlyInput): Promise<MessageView> {
  return http.post<MessageView>('/api/auth/resend-verification', input);
}

/** Sign in; the answer is a new session with a new CSRF token. */
export function signIn(input: SignInInput): Promise<SessionView> {
  return http.post<SessionView>('/api/auth/sign-in', input);
}

/** Sign out; the answer is an empty session with a fresh CSRF token. */
export function signOut(): Promise<SessionView> {
  return http.post<SessionView>('/api/auth/sign-out');
}

/** Ask for a password-reset link; the answer never says whether the address is known. */
export function requestPasswordReset(input: EmailOnlyInput): Promise<MessageView> {
  return http.post<MessageView>('/api/auth/password-reset/request', input);
}

/** Set a new password with the token from the reset link. */
export function confirmPasswordReset(input: PasswordResetInput): Promise<MessageView> {
  return http.post<MessageView>('/api/auth/password-reset/confirm', input);
}
