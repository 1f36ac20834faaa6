import { computed, onMounted } from 'vue';
import { useRoute } from 'vue-router';
import { tokenSchema } from '@shared/schemas/auth';
import type { MessageView } from '@shared/types/user';
import { useAsync } from './useAsync';

/**
 * For pages opened from an e-mailed link with `?token=…`: checks the token's shape,
 * sends it to the API once on mount, and exposes the outcome.
 */
export function useTokenLink(confirm: (input: { token: string }) => Promise<MessageView>) {
  const route = useRoute();
  const parsed = tokenSchema.safeParse({ token: route.query.token });
  const { run, loading, error } = useAsync(confirm);
  const result = computed(() => (parsed.success ? null : parsed.error.issues[0]?.message ?? ''));
  let answer: MessageView | undefined;

  const state = {
    loading,
    error,
    /** Message when the link itself is malformed, without asking the server. */
    malformed: result,
    done: computed(() => answer !== undefined && !loading.value),
  };

  onMounted(async () => {
    if (parsed.success) answer = await run(parsed.data);
  });

  return state;
}
