import { flushPromises, mount } from '@vue/test-utils';
import { createPinia } from 'pinia';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import SignUpPage from '@/pages/auth/SignUpPage.vue';
import { routes } from '@/router/routes';
import { CHECK_FIELDS_MESSAGE } from '@/composables/useForm';
import { stubApi } from './support/fetch-stub';

async function mountJoinPage() {
  const router = createRouter({ history: createMemoryHistory(), routes });
  await router.push('/join');
  const wrapper = mount(SignUpPage, { global: { plugins: [createPinia(), router] }, attachTo: document.body });
  await flushPromises(); // Element Plus gives inputs their ids once mounted
  return wrapper;
}

describe('the form helper on the join page', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('checks a field when the person leaves it and ties the error to the input', async () => {
    const wrapper = await mountJoinPage();
    const password = wrapper.find('#sign-up-password');

    await password.setValue('too-short');
    await password.trigger('focusout');

    const error = wrapper.find('#sign-up-password-error');
    expect(error.text()).toContain('Password must be at least 12 characters.');
    expect(password.attributes('aria-invalid')).toBe('true');
    expect(password.attributes('aria-describedby')).toContain('sign-up-password-error');
    expect(password.attributes('aria-describedby')).toContain('sign-up-password-hint');
  });

  it('clears the error as soon as the field is fixed', async () => {
    const wrapper = await mountJoinPage();
    const password = wrapper.find('#sign-up-password');
    await password.setValue('too-short');
    await password.trigger('focusout');

    await password.setValue('a much longer railway password');

    expect(wrapper.find('#sign-up-password-error').exists()).toBe(false);
    expect(password.attributes('aria-invalid')).toBeUndefined();
  });

  it('says nothing about a field the person only passed through', async () => {
    const wrapper = await mountJoinPage();

    await wrapper.find('#sign-up-email').trigger('focusout');

    expect(wrapper.find('#sign-up-email-error').exists()).toBe(false);
  });

  it('checks every field on submit without calling the server', async () => {
    const fetchStub = stubApi({});
    const wrapper = await mountJoinPage();

    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(wrapper.find('[role="alert"]').text()).toContain(CHECK_FIELDS_MESSAGE);
    expect(wrapper.find('#sign-up-displayName-error').exists()).toBe(true);
    expect(fetchStub).not.toHaveBeenCalled();
  });

  it('shows the server’s field errors next to their fields and keeps what was typed', async () => {
    stubApi({
      'POST /api/auth/sign-up': {
        status: 422,
        body: {
          error: {
            code: 'validation_failed',
            message: 'Some answers need changing.',
            fields: { password: 'That password is too common. Choose another.' },
          },
        },
      },
    });
    const wrapper = await mountJoinPage();
    await wrapper.find('#sign-up-displayName').setValue('Ada Siding');
    await wrapper.find('#sign-up-email').setValue('ada.siding@example.org');
    await wrapper.find('#sign-up-password').setValue('password1234');

    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(wrapper.find('#sign-up-password-error').text()).toContain('That password is too common.');
    expect((wrapper.find('#sign-up-email').element as HTMLInputElement).value).toBe('ada.siding@example.org');
    expect((wrapper.find('#sign-up-password').element as HTMLInputElement).value).toBe('password1234');
  });

  it('shows "check your inbox" with the address after joining', async () => {
    stubApi({
      'POST /api/auth/sign-up': { status: 202, body: { message: 'If the address can be used, a link is on its way.' } },
    });
    const wrapper = await mountJoinPage();
    await wrapper.find('#sign-up-displayName').setValue('Ada Siding');
    await wrapper.find('#sign-up-email').setValue('Ada.Siding@Example.org');
    await wrapper.find('#sign-up-password').setValue('a long enough railway password');

    await wrapper.find('form').trigger('submit');
    await flushPromises();

    expect(wrapper.text()).toContain('Check your inbox');
    expect(wrapper.text()).toContain('ada.siding@example.org');
  });
});

describe('the form summary', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
    document.body.innerHTML = '';
  });

  it('goes away once every flagged field is fixed', async () => {
    const wrapper = await mountJoinPage();
    await wrapper.find('form').trigger('submit');
    await flushPromises();

    await wrapper.find('#sign-up-displayName').setValue('Ada Siding');
    await wrapper.find('#sign-up-email').setValue('ada.siding@example.org');
    await wrapper.find('#sign-up-password').setValue('a long enough railway password');

    expect(wrapper.find('[role="alert"]').text()).toBe('');
  });
});
