import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import AccountPage from '@/pages/account/AccountPage.vue';
import { routes } from '@/router/routes';
import { useAuthStore } from '@/stores/auth';
import { stubApi } from './support/fetch-stub';
import { buildSession } from './support/users';

describe('a page whose session has ended', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('sends the person to sign in and remembers where they were', async () => {
    stubApi({
      'GET /api/account': { status: 401, body: { error: { code: 'not_signed_in', message: 'Sign in first.' } } },
    });
    const pinia = createPinia();
    const router = createRouter({ history: createMemoryHistory(), routes });
    await router.push('/account');
    mount(AccountPage, { global: { plugins: [pinia, router] } });
    useAuthStore(pinia).setSession(buildSession('member'));

    await flushPromises();

    await vi.waitFor(() => expect(router.currentRoute.value.fullPath).toBe('/sign-in?redirect=/account'));
    expect(useAuthStore(pinia).isSignedIn).toBe(false);
  });
});
