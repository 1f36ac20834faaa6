import { ref } from 'vue';
import { useRouter } from 'vue-router';
import { toApiError } from '@/api/errors';
import { useAuthStore } from '@/stores/auth';

/** Sign out from anywhere: end the session, go home, and say so if it failed. */
export function useSignOut() {
  const auth = useAuthStore();
  const router = useRouter();
  const signingOut = ref(false);

  async function signOut(): Promise<void> {
    if (signingOut.value) return;
    signingOut.value = true;
    try {
      await auth.signOut();
      await router.push({ name: 'home' });
      ElMessage.success({ message: 'You are signed out.', showClose: true });
    } catch (error) {
      ElMessage.error({ message: toApiError(error).message, showClose: true });
    } finally {
      signingOut.value = false;
    }
  }

  return { signOut, signingOut };
}
