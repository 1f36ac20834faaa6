import { flushPromises, mount } from '@vue/test-utils';
import { createPinia, setActivePinia } from 'pinia';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { defineComponent, h } from 'vue';
import { createMemoryHistory, createRouter, type Router } from 'vue-router';
import { usePlannerDocument } from '@/composables/usePlannerDocument';
import { useAuthStore } from '@/stores/auth';
import { draftToInput } from '@/utils/planner/draft-to-input';
import { stashPlan, takeStashedPlan } from '@/utils/planner/plan-stash';
import { startDraft } from '@/utils/planner/start-points';
import { stubApi, type StubAnswer } from './support/fetch-stub';
import { buildUser } from './support/users';

/** A page that shows nothing: only the address matters here. */
const Blank = { render: () => null };

const savedPlan = (name: string) => ({
  plan: { id: 12, name, updatedAt: '2026-03-07T14:05:00.000Z', shareUrl: null, input: {} },
});

/** The planner's document at `path`, for someone signed in or not, with the API answering a new plan's save. */
async function openPlanner(path: string, options: { signedIn: boolean; save?: StubAnswer }) {
  const fetchStub = stubApi({ 'POST /api/plans': options.save ?? { status: 201, body: savedPlan('Loft layout') } });
  const pinia = createPinia();
  setActivePinia(pinia);
  if (options.signedIn) useAuthStore().setSession({ user: buildUser(), csrfToken: 'token' });
  const router: Router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/planner', name: 'planner', component: Blank },
      { path: '/planner/:id(\\d+)', name: 'planner-saved', component: Blank },
      { path: '/sign-in', name: 'sign-in', component: Blank },
    ],
  });
  await router.push(path);
  let doc!: ReturnType<typeof usePlannerDocument>;
  mount(
    defineComponent({
      setup() {
        doc = usePlannerDocument();
        return () => h('div');
      },
    }),
    { global: { plugins: [pinia, router] } },
  );
  await flushPromises();
  return { doc, router, fetchStub };
}

const moduleInput = () => draftToInput(startDraft('module'), 'mm');

describe('saving a plan across signing in', () => {
  beforeEach(() => {
    sessionStorage.clear();
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('saves the plan put aside under its name on return, and drops save=1 from the address', async () => {
    stashPlan({ input: moduleInput(), name: 'Loft layout' });

    const { doc, router, fetchStub } = await openPlanner('/planner?save=1', { signedIn: true });

    const [, init] = fetchStub.mock.calls.find(([url]) => String(url).endsWith('/api/plans'))!;
    expect(JSON.parse(String(init?.body))).toEqual({ name: 'Loft layout', input: moduleInput() });
    expect(router.currentRoute.value.fullPath).toBe('/planner/12');
    expect(doc.saved.value?.name).toBe('Loft layout');
    expect(doc.notice.value).toBe('Saved as “Loft layout”.');
    expect(doc.nameDialogOpen.value).toBe(false);
  });

  it('keeps the plan, drops save=1 and offers to save again when the save fails', async () => {
    stashPlan({ input: moduleInput(), name: 'Loft layout' });
    const failure = { status: 500, body: { error: { code: 'internal', message: 'Something went wrong.' } } };

    const { doc, router } = await openPlanner('/planner?save=1', { signedIn: true, save: failure });

    expect(router.currentRoute.value.fullPath).toBe('/planner');
    expect(doc.saved.value).toBeNull();
    expect(doc.changed.value).toBe(true);
    expect(doc.notice.value).toMatch(
      /^Your plan is as you left it, but it could not be saved \(.+\)\. Save it again\.$/,
    );
    expect(doc.nameDialogOpen.value).toBe(true);
    expect(doc.suggestedName.value).toBe('Loft layout');
  });

  it('drops save=1 when there is no plan put aside to save', async () => {
    const { router, fetchStub } = await openPlanner('/planner?save=1', { signedIn: true });

    expect(router.currentRoute.value.fullPath).toBe('/planner');
    expect(fetchStub.mock.calls.some(([url]) => String(url).endsWith('/api/plans'))).toBe(false);
  });

  it('puts a visitor’s named plan aside and sends them to sign in, coming back with save=1', async () => {
    const { doc, router } = await openPlanner('/planner', { signedIn: false });

    await doc.save();
    expect(doc.nameDialogOpen.value).toBe(true);
    await doc.saveNamed('Shed layout');

    expect(router.currentRoute.value.name).toBe('sign-in');
    expect(router.currentRoute.value.query).toEqual({ redirect: '/planner?save=1' });
    expect(takeStashedPlan()).toEqual({ input: moduleInput(), name: 'Shed layout' });
  });
});
