import { ref, shallowRef } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { isSessionLost, toApiError, type ApiError } from '@/api/errors';
import { useAuthStore } from '@/stores/auth';

/**
 * Run an API call with `loading` and `error` state. Only the latest call updates the state.
 * When the server says the session has ended, the person is sent to sign in and brought back here.
 */
export function useAsync<A extends unknown[], R>(action: (...args: A) => Promise<R>) {
  const loading = ref(false);
  const error = shallowRef<ApiError | null>(null);
  const router = useRouter();
  const route = useRoute();
  const auth = useAuthStore();
  let latest = 0;

  /** Call the action; resolves to its result, or `undefined` when it failed (see `error`). */
  async function run(...args: A): Promise<R | undefined> {
    const call = ++latest;
    loading.value = true;
    error.value = null;
    try {
      const result = await action(...args);
      return call === latest ? result : undefined;
    } catch (caught) {
      if (call !== latest) return undefined;
      if (caught instanceof DOMException && caught.name === 'AbortError') return undefined;
      if (isSessionLost(caught)) {
        auth.forgetUser();
        await router.push({ name: 'sign-in', query: { redirect: route.fullPath } });
      }
      error.value = toApiError(caught);
      return undefined;
    } finally {
      if (call === latest) loading.value = false;
    }
  }

  return { run, loading, error };
}
