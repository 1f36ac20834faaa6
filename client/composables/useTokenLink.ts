import { onMounted, ref } from 'vue';
import { useRoute } from 'vue-router';
import { tokenSchema } from '@shared/schemas/auth';
import type { MessageView } from '@shared/types/user';
import { useAsync } from './useAsync';

/** Where a page opened from an e-mailed link stands. */
export type TokenLinkStatus = 'working' | 'done' | 'failed';

/**
 * For pages opened from an e-mailed link with `?token=…`: checks the token's shape, sends it
 * to the API once on mount, and exposes the outcome and the sentence to show.
 */
export function useTokenLink(confirm: (input: { token: string }) => Promise<MessageView>) {
  const route = useRoute();
  const parsed = tokenSchema.safeParse({ token: route.query.token });
  const { run, error } = useAsync(confirm);
  const status = ref<TokenLinkStatus>(parsed.success ? 'working' : 'failed');
  const message = ref(parsed.success ? '' : (parsed.error.issues[0]?.message ?? 'This link is not valid.'));

  onMounted(async () => {
    if (!parsed.success) return;
    const answer = await run(parsed.data);
    if (answer) {
      message.value = answer.message;
      status.value = 'done';
    } else {
      message.value = error.value?.message ?? 'This link could not be used.';
      status.value = 'failed';
    }
  });

  return { status, message };
}
