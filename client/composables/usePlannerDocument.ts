import type { PlanInput } from '@shared/planner';
import type { SavedPlanView } from '@shared/types/plans';
import { computed, ref, shallowRef, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { createPlan, getPlan, updatePlan } from '@/api/plans';
import { useAuthStore } from '@/stores/auth';
import { draftFromInput } from '@/utils/planner/draft-from-input';
import { draftToInput } from '@/utils/planner/draft-to-input';
import type { PlannerDraft } from '@/utils/planner/draft-types';
import { stashPlan, takeStashedPlan } from '@/utils/planner/plan-stash';
import { startDraft, type StartPoint } from '@/utils/planner/start-points';
import { useAsync } from './useAsync';
import { useLengthUnit } from './useLengthUnit';

/** Said when a saved input no longer parses (saved by an older planner). */
const UNREADABLE = 'This plan was saved by an earlier version of the planner and cannot be opened here.';

/**
 * The plan being edited on the planner page: a new one from a starting point, a saved one opened by its id, or one
 * put aside while its author signed in. Saves a new plan (then the address becomes the saved plan's) or the changes
 * to a saved one; a visitor who names a plan to save is sent to sign in, with the plan kept for this tab, and it is
 * saved under that name on return (the address losing its `save=1`).
 */
export function usePlannerDocument() {
  const route = useRoute();
  const router = useRouter();
  const auth = useAuthStore();
  const { unit } = useLengthUnit();

  const draft = ref<PlannerDraft>(startDraft('module'));
  const saved = shallowRef<SavedPlanView | null>(null);
  const notice = ref('');
  const nameDialogOpen = ref(false);
  const suggestedName = ref('My baseboard plan');
  const baseline = ref('');

  const input = (): PlanInput => draftToInput(draft.value, unit.value);
  /** The form as it stands, to tell whether it has changed since it was opened or saved (units aside). */
  const snapshot = () => JSON.stringify(draft.value);
  const changed = computed(() => snapshot() !== baseline.value);

  function adopt(next: PlannerDraft, unchanged = true): void {
    draft.value = next;
    baseline.value = unchanged ? snapshot() : '';
  }

  const loader = useAsync(getPlan);
  async function open(id: number): Promise<void> {
    const answer = await loader.run(id);
    if (!answer) return;
    const next = draftFromInput(answer.plan.input);
    if (next === null) {
      notice.value = UNREADABLE;
      return;
    }
    saved.value = answer.plan;
    adopt(next);
  }

  /** Start again from a starting point; leaves a saved plan's address, as the result is a new plan. */
  async function start(point: StartPoint): Promise<void> {
    saved.value = null;
    notice.value = '';
    adopt(startDraft(point));
    if (route.name !== 'planner') await router.push({ name: 'planner' });
  }

  /** Save as a new plan under `name` (the name dialog's action: it shows any failure). */
  async function saveNew(name: string): Promise<void> {
    const answer = await createPlan({ name, input: input() });
    saved.value = answer.plan;
    baseline.value = snapshot();
    notice.value = `Saved as “${answer.plan.name}”.`;
    await router.replace({ name: 'planner-saved', params: { id: answer.plan.id } });
  }

  const updater = useAsync(updatePlan);
  async function saveChanges(): Promise<void> {
    if (!saved.value) return;
    const answer = await updater.run(saved.value.id, { name: saved.value.name, input: input() });
    if (!answer) return;
    saved.value = answer.plan;
    baseline.value = snapshot();
    notice.value = 'Changes saved.';
  }

  /** The save button: changes to a saved plan, or a name for a new one. */
  async function save(): Promise<void> {
    if (saved.value) return saveChanges();
    nameDialogOpen.value = true;
  }

  /** The name dialog's action: save, or for a visitor put the plan aside under its name and go to sign in. */
  async function saveNamed(name: string): Promise<void> {
    if (auth.isSignedIn) return saveNew(name);
    stashPlan({ input: input(), name });
    await router.push({ name: 'sign-in', query: { redirect: '/planner?save=1' } });
  }

  /** Back from signing in to save: save at once; on failure keep the plan on screen and offer the dialog again. */
  async function saveOnReturn(name: string): Promise<void> {
    try {
      await saveNew(name);
    } catch (error) {
      const why = error instanceof Error ? error.message : 'the server did not answer';
      await router.replace({ name: 'planner' });
      notice.value = `Your plan is as you left it, but it could not be saved (${why}). Save it again.`;
      nameDialogOpen.value = true;
    }
  }

  function restoreStash(): void {
    const asked = route.query.save === '1';
    const stash = takeStashedPlan();
    const next = stash ? draftFromInput(stash.input) : null;
    if (stash && next) {
      adopt(next, false);
      if (stash.name) suggestedName.value = stash.name;
      if (asked && auth.isSignedIn) {
        void saveOnReturn(suggestedName.value);
        return;
      }
      notice.value = 'Your plan is as you left it.';
    }
    // Nothing to save (already saved, or the tab lost it): the address should not ask again on reload.
    if (asked) void router.replace({ name: 'planner' });
  }

  watch(
    () => [route.name, route.params.id] as const,
    ([name, id]) => {
      if (name === 'planner-saved' && Number(id) !== saved.value?.id) void open(Number(id));
      if (name === 'planner' && saved.value) void start('module');
    },
  );
  if (route.name === 'planner-saved') void open(Number(route.params.id));
  else {
    baseline.value = snapshot();
    restoreStash();
  }

  return {
    draft,
    saved,
    input,
    changed,
    notice,
    nameDialogOpen,
    suggestedName,
    loading: loader.loading,
    loadError: loader.error,
    saving: updater.loading,
    saveError: updater.error,
    start,
    save,
    saveNamed,
  };
}
