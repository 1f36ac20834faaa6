import { mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { beforeEach, describe, expect, it } from 'vitest';
import { createMemoryHistory, createRouter } from 'vue-router';
import type { Role } from '@shared/roles';
import TheHeaderNav from '@/components/TheHeaderNav.vue';
import { routes } from '@/router/routes';
import { useAuthStore } from '@/stores/auth';
import { buildSession } from './support/users';

function mountNavFor(role: Role | null) {
  const pinia = createPinia();
  setActivePinia(pinia);
  useAuthStore().setSession(buildSession(role));
  const router = createRouter({ history: createMemoryHistory(), routes });
  return mount(TheHeaderNav, { props: { layout: 'row' }, global: { plugins: [pinia, router] } });
}

function labels(wrapper: ReturnType<typeof mountNavFor>): string[] {
  return wrapper.findAll('a, button').map((el) => el.text());
}

describe('the header menu', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('offers a visitor sign in and join', () => {
    expect(labels(mountNavFor(null))).toEqual(['Sign in', 'Join']);
  });

  it('offers a member their account and signing out, and names them', () => {
    const wrapper = mountNavFor('member');

    expect(labels(wrapper)).toEqual(['My account', 'Sign out']);
    expect(wrapper.text()).toContain('Signed in as Ada Siding');
  });

  it('adds the audit trail for a moderator', () => {
    expect(labels(mountNavFor('moderator'))).toEqual(['Audit trail', 'My account', 'Sign out']);
  });

  it('adds the audit trail and people & roles for an administrator', () => {
    expect(labels(mountNavFor('admin'))).toEqual(['Audit trail', 'People & roles', 'My account', 'Sign out']);
  });
});
