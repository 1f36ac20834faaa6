import { defineStore } from 'pinia';
import { computed, ref } from 'vue';
import { roleSatisfies, type Role } from '@shared/roles';
import type { SignInInput } from '@shared/schemas/auth';
import type { SessionView, UserView } from '@shared/types/user';
import * as authApi from '@/api/auth';
import { isApiError } from '@/api/errors';
import { onSessionRefreshed, setCsrfToken } from '@/api/http';

/** The session: who is signed in and the CSRF token that goes with it. Nothing else lives here. */
export const useAuthStore = defineStore('auth', () => {
  /** The signed-in person, or null for a visitor. */
  const user = ref<UserView | null>(null);
  /** Token sent back in `X-CSRF-Token` on every change. */
  const csrfToken = ref<string | null>(null);
  /** Whether the session has been read from the server at least once. */
  const loaded = ref(false);
  let pending: Promise<void> | null = null;

  const role = computed<Role | null>(() => user.value?.role ?? null);
  const isSignedIn = computed(() => user.value !== null);

  /** Whether the signed-in person holds `required` or a role that includes it. For menus only: the server decides. */
  function can(required: Role): boolean {
    return role.value !== null && roleSatisfies(role.value, required);
  }

  /** Take a session answer from the server as the current one. */
  function setSession(session: SessionView): void {
    user.value = session.user;
    csrfToken.value = session.csrfToken;
    setCsrfToken(session.csrfToken);
    loaded.value = true;
  }

  /** Replace the signed-in person's details after they changed them. */
  function setUser(next: UserView): void {
    user.value = next;
  }

  /** Forget the signed-in person locally (the server said the session is gone). */
  function forgetUser(): void {
    user.value = null;
  }

  /** Read the session from the server, once unless `force`; concurrent callers share one request. */
  function load(force = false): Promise<void> {
    if (loaded.value && !force) return Promise.resolve();
    pending ??= authApi
      .getSession()
      .then(setSession)
      .finally(() => {
        pending = null;
      });
    return pending;
  }

  /** Sign in and take the new session (and its new CSRF token). */
  async function signIn(input: SignInInput): Promise<void> {
    setSession(await authApi.signIn(input));
  }

  /** Sign out; if the server says the session had already ended, just forget it here. */
  async function signOut(): Promise<void> {
    try {
      setSession(await authApi.signOut());
    } catch (error) {
      if (!isApiError(error, 'not_signed_in')) throw error;
      forgetUser();
    }
  }

  onSessionRefreshed(setSession);

  return { user, csrfToken, loaded, role, isSignedIn, can, setSession, setUser, forgetUser, load, signIn, signOut };
});
