import type { RouteLocationNormalized, RouteLocationRaw, Router } from 'vue-router';
import { hasAnyRole } from '@shared/roles';
import { useAuthStore } from '@/stores/auth';
import { safeRedirect } from '@/utils/safe-redirect';

/** Name shown after every page title in the browser tab. */
export const SITE_NAME = 'Benchwright';

/**
 * The one global guard: reads the session once, sends visitors to sign in (and back afterwards),
 * accounts without the route's role to the forbidden page, and signed-in people away from
 * sign-in and join. For convenience only: the server checks every request itself.
 */
export async function accessGuard(to: RouteLocationNormalized): Promise<true | RouteLocationRaw> {
  const auth = useAuthStore();
  if (!auth.loaded) {
    try {
      await auth.load();
    } catch {
      // Server unreachable: carry on as a visitor; pages say so when they call the API.
    }
  }

  if (to.meta.guestOnly && auth.isSignedIn) return safeRedirect(to.query.redirect);

  const roles = to.meta.roles ?? [];
  if ((to.meta.requiresAuth || roles.length > 0) && !auth.isSignedIn) {
    return { name: 'sign-in', query: { redirect: to.fullPath } };
  }
  if (roles.length > 0 && (auth.role === null || !hasAnyRole(auth.role, roles))) {
    return { name: 'forbidden' };
  }
  return true;
}

/** Browser-tab text for a route: "Sign in – Benchwright". */
export function pageTitle(to: RouteLocationNormalized): string {
  return to.meta.title ? `${to.meta.title} – ${SITE_NAME}` : SITE_NAME;
}

/** Attach the access guard and the title update to a router. */
export function installGuards(router: Router): void {
  router.beforeEach(accessGuard);
  router.afterEach((to, _from, failure) => {
    if (!failure) document.title = pageTitle(to);
  });
}
