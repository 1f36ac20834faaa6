import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter, type RouteRecordRaw } from 'vue-router';
import { installGuards } from '@/router/guards';
import { routes } from '@/router/routes';
import { stubApi } from './support/fetch-stub';
import { buildSession } from './support/users';

/** The real route table, each page drawn as nothing: these tests are about addresses and access, not pages. */
const table = routes.map((r) =>
  'component' in r ? { ...r, component: { render: () => null } } : r,
) as RouteRecordRaw[];

function routerAs(role: Parameters<typeof buildSession>[0]) {
  stubApi({ 'GET /api/auth/session': { body: buildSession(role) } });
  const router = createRouter({ history: createMemoryHistory(), routes: table });
  installGuards(router);
  return router;
}

describe('the listing pages’ addresses', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('opens the listing a server e-mail links to', async () => {
    const router = routerAs(null);
    await router.push('/listings/12');

    expect(router.currentRoute.value.name).toBe('listing');
    expect(router.currentRoute.value.params.id).toBe('12');
  });

  it('sends a builder’s “list a service” e-mail link to the service form', async () => {
    const router = routerAs('builder');
    await router.push('/listings/new?kind=service');

    expect(router.currentRoute.value.fullPath).toBe('/sell?kind=service');
  });

  it('asks a visitor to sign in before selling, and brings them back', async () => {
    const router = routerAs(null);
    await router.push('/sell');

    expect(router.currentRoute.value.name).toBe('sign-in');
    expect(router.currentRoute.value.query.redirect).toBe('/sell');
  });

  it('keeps the review desk for moderators', async () => {
    const member = routerAs('member');
    await member.push('/review');
    expect(member.currentRoute.value.name).toBe('forbidden');

    setActivePinia(createPinia());
    const moderator = routerAs('moderator');
    await moderator.push('/review');
    expect(moderator.currentRoute.value.name).toBe('review');
  });

  it('lets anyone search', async () => {
    const router = routerAs(null);
    await router.push('/modules?scale=oo');

    expect(router.currentRoute.value.name).toBe('search');
  });
});
