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

/** What every signed-in member's menu holds, in order, before any role's own links. */
const MEMBER_MENU = [
  'Find modules',
  'Frame planner',
  'Sell a module',
  'Signed in as Ada Siding',
  'My listings',
  'Orders',
  'Quotes',
  'Balances',
  'My shortlist',
  'My plans',
];
const MODERATOR_MENU = ['Review desk', 'Order problems', 'Audit trail'];
const END = ['My account', 'Sign out'];

describe('the header menu', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('offers a visitor the search, the frame planner, sign in and join', () => {
    expect(labels(mountNavFor(null))).toEqual(['Find modules', 'Frame planner', 'Sign in', 'Join']);
  });

  it('offers a member selling, their listings, orders, quotes, balances, shortlist, plans, their account and signing out, and names them', () => {
    const wrapper = mountNavFor('member');

    expect(labels(wrapper)).toEqual([...MEMBER_MENU, ...END]);
    expect(wrapper.text()).toContain('Signed in as Ada Siding');
  });

  it('adds the review desk, order problems and the audit trail for a moderator', () => {
    expect(labels(mountNavFor('moderator'))).toEqual([...MEMBER_MENU, ...MODERATOR_MENU, ...END]);
  });

  it('adds people & roles and fees for an administrator', () => {
    expect(labels(mountNavFor('admin'))).toEqual([...MEMBER_MENU, ...MODERATOR_MENU, 'People & roles', 'Fees', ...END]);
  });
});
