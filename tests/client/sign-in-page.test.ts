import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import SignInPage from '@/pages/auth/SignInPage.vue';
import { routes } from '@/router/routes';
import { stubApi, type StubAnswer } from './support/fetch-stub';
import { buildSession } from './support/users';

async function signInWith(answer: StubAnswer, path = '/sign-in') {
  const fetchStub = stubApi({
    'POST /api/auth/sign-in': answer,
    'POST /api/auth/resend-verification': { status: 202, body: { message: 'A new link is on its way.' } },
  });
  const router = createRouter({ history: createMemoryHistory(), routes });
  await router.push(path);
  const wrapper = mount(SignInPage, { global: { plugins: [createPinia(), router] }, attachTo: document.body });
  await flushPromises(); // Element Plus gives inputs their ids once mounted
  await wrapper.find('#sign-in-email').setValue('ada.siding@example.org');
  await wrapper.find('#sign-in-password').setValue('any password at all');
  await wrapper.find('form').trigger('submit');
  await flushPromises();
  return { wrapper, router, fetchStub };
}

function apiError(status: number, code: string, message: string, extra: object = {}): StubAnswer {
  return { status, body: { error: { code, message, ...extra } } };
}

describe('the sign-in page', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('goes back to where the person was heading after signing in', async () => {
    const { router } = await signInWith({ body: buildSession('member') }, '/sign-in?redirect=/account');

    await vi.waitFor(() => expect(router.currentRoute.value.fullPath).toBe('/account'));
  });

  it('shows a wrong password as a message for the whole form and keeps the address', async () => {
    const { wrapper } = await signInWith(
      apiError(401, 'invalid_credentials', 'That e-mail address and password do not match.'),
    );

    expect(wrapper.find('[role="alert"]').text()).toContain('do not match');
    expect((wrapper.find('#sign-in-email').element as HTMLInputElement).value).toBe('ada.siding@example.org');
  });

  it('offers to send the link again when the address is not confirmed', async () => {
    const { wrapper, fetchStub } = await signInWith(
      apiError(403, 'email_unverified', 'Confirm your e-mail address first.'),
    );

    const resend = wrapper.findAll('button').find((b) => b.text() === 'Send the link again');
    expect(resend).toBeDefined();
    await resend!.trigger('click');
    await flushPromises();

    expect(wrapper.text()).toContain('A new link is on its way.');
    expect(JSON.parse(String(fetchStub.mock.calls.at(-1)?.[1]?.body))).toEqual({ email: 'ada.siding@example.org' });
  });

  it('shows the reason given for a suspension', async () => {
    const { wrapper } = await signInWith(
      apiError(403, 'account_suspended', 'Your account is suspended: repeated listings of boards you do not own.'),
    );

    expect(wrapper.find('[role="alert"]').text()).toContain('repeated listings of boards you do not own');
  });

  it('says how long to wait after too many attempts', async () => {
    const { wrapper } = await signInWith(
      apiError(429, 'rate_limited', 'Too many sign-in attempts.', { retryAfterSeconds: 95 }),
    );

    expect(wrapper.find('[role="alert"]').text()).toContain('You can try again in 2 minutes.');
  });
});
