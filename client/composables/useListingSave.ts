import { nextTick, ref, type Ref } from 'vue';
import { useRouter } from 'vue-router';
import type { ListingInput } from '@shared/schemas/listings';
import type { OwnListingView } from '@shared/types/listings';
import { toApiError } from '@/api/errors';
import { createListing, submitListing, updateListing } from '@/api/listings';

/** The part of a draft form that saving needs. */
interface SavingForm<O> {
  formError: string;
  submit(action: (data: O) => Promise<void>): Promise<boolean>;
}

/**
 * Saving a listing form: the first save creates the draft (and the address becomes its edit page, so a reload
 * keeps it), later saves replace its fields; "Send for review" saves and then asks a moderator to look.
 */
export function useListingSave<O extends ListingInput>(
  form: SavingForm<O>,
  current: Ref<OwnListingView | null>,
  onCreated?: (id: number) => void,
  /** Element to take the person to once the draft exists: the photos step, the next thing to do. */
  nextStepId = 'sell-photos-title',
) {
  const router = useRouter();
  const notice = ref('');

  async function save(): Promise<boolean> {
    notice.value = '';
    const before = current.value?.state;
    const ok = await form.submit(async (input) => {
      const id = current.value?.id;
      const saved = id ? await updateListing(id, input) : await createListing(input);
      current.value = saved;
      if (id) return;
      onCreated?.(saved.id);
      await router.replace({ name: 'listing-edit', params: { id: saved.id } });
      // After the router has settled its own scrolling for the new address.
      await nextTick();
      requestAnimationFrame(() => document.getElementById(nextStepId)?.focus());
    });
    if (!ok) return false;
    const backToReview = before === 'listed' && current.value?.state === 'awaiting_review';
    notice.value = backToReview
      ? 'Saved. The title, description or price changed, so a moderator checks the listing again before buyers see it.'
      : before
        ? 'Saved.'
        : 'Draft saved. Only you can see it. Add photos, then send it for review.';
    return true;
  }

  async function sendForReview(): Promise<void> {
    if (!(await save())) return;
    try {
      current.value = await submitListing(current.value!.id);
      notice.value = 'Sent for review. A moderator checks it and you are e-mailed the outcome.';
    } catch (error) {
      form.formError = toApiError(error).message;
    }
  }

  return { notice, save, sendForReview };
}
