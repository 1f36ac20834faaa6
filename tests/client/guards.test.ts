import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createMemoryHistory, createRouter, type Router } from 'vue-router';
import type { Role } from '@shared/roles';
import { accessGuard, pageTitle } from '@/router/guards';
import { routes } from '@/router/routes';
import { buildSession } from './support/users';
import { stubApi } from './support/fetch-stub';

/** A router with the real routes, to resolve locations for the guard. */
function makeRouter(): Router {
  return createRouter({ history: createMemoryHistory(), routes });
}

async function guardFor(path: string, role: Role | null) {
  const fetchStub = stubApi({ 'GET /api/auth/session': { body: buildSession(role) } });
  const to = makeRouter().resolve(path);
  const outcome = await accessGuard({ ...to, matched: to.matched } as never);
  return { outcome, fetchStub };
}

describe('the access guard', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('sends a visitor who opens My account to sign in, with the way back', async () => {
    const { outcome } = await guardFor('/account?tab=password', null);

    expect(outcome).toEqual({ name: 'sign-in', query: { redirect: '/account?tab=password' } });
  });

  it('sends a member who opens People & roles to the forbidden page', async () => {
    const { outcome } = await guardFor('/admin/people', 'member');

    expect(outcome).toEqual({ name: 'forbidden' });
  });

  it('lets an administrator into the audit trail, which asks for a moderator', async () => {
    const { outcome } = await guardFor('/audit', 'admin');

    expect(outcome).toBe(true);
  });

  it('keeps a builder out of the audit trail', async () => {
    const { outcome } = await guardFor('/audit', 'builder');

    expect(outcome).toEqual({ name: 'forbidden' });
  });

  it('sends a signed-in person away from the sign-in page to where they were heading', async () => {
    const { outcome } = await guardFor('/sign-in?redirect=/account', 'member');

    expect(outcome).toBe('/account');
  });

  it('refuses a redirect that would leave the site', async () => {
    const { outcome } = await guardFor('/sign-in?redirect=//elsewhere.example', 'member');

    expect(outcome).toBe('/');
  });

  it('reads the session from the server only once', async () => {
    const fetchStub = stubApi({ 'GET /api/auth/session': { body: buildSession('member') } });
    const router = makeRouter();

    await accessGuard(router.resolve('/account') as never);
    await accessGuard(router.resolve('/') as never);

    expect(fetchStub).toHaveBeenCalledTimes(1);
  });

  it('treats everyone as a visitor when the server cannot be reached', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('offline'))),
    );

    const outcome = await accessGuard(makeRouter().resolve('/') as never);

    expect(outcome).toBe(true);
  });

  it('names the page in the browser tab', () => {
    expect(pageTitle(makeRouter().resolve('/join') as never)).toBe('Join – Benchwright');
  });
});
