import type { ChangeEmailInput, ChangePasswordInput, ProfileInput } from '@shared/schemas/account';
import type { TokenInput } from '@shared/schemas/auth';
import type { MessageView, SessionView, UserView } from '@shared/types/user';
import { http } from './http';

/** The signed-in person's account. */
export interface AccountView {
  user: UserView;
}

/** Read the signed-in person's account. */
export function getAccount(): Promise<AccountView> {
  return http.get<AccountView>('/api/account');
}

/** Change the name other members see. */
export function updateProfile(input: ProfileInput): Promise<AccountView> {
  return http.patch<AccountView>('/api/account/profile', input);
}

/** Change the password; every other session is ended and this one gets a new CSRF token. */
export function changePassword(input: ChangePasswordInput): Promise<SessionView> {
  return http.post<SessionView>('/api/account/password', input);
}

/** Ask to move the account to a new address; a link goes to that address. */
export function requestEmailChange(input: ChangeEmailInput): Promise<MessageView> {
  return http.post<MessageView>('/api/account/email', input);
}

/** Confirm the new address with the token from the e-mailed link. */
export function confirmEmailChange(input: TokenInput): Promise<MessageView> {
  return http.post<MessageView>('/api/account/email/confirm', input);
}
