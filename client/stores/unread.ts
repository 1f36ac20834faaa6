import { defineStore } from 'pinia';
import { ref } from 'vue';
import { unreadCount } from '@/api/conversations';

/** Calls closer together than this share one answer (a route change right after a poll, say). */
const MIN_GAP_MS = 5_000;

/** How many messages wait for the signed-in member, shown in the header on every page. */
export const useUnreadStore = defineStore('unread', () => {
  /** Unread messages across all of the member's threads. */
  const count = ref(0);
  let lastAsked = 0;
  let pending: Promise<void> | null = null;

  /** Ask the server again, unless it was asked moments ago (`force` skips that). Failures keep the last count. */
  function refresh(force = false): Promise<void> {
    if (pending) return pending;
    if (!force && Date.now() - lastAsked < MIN_GAP_MS) return Promise.resolve();
    lastAsked = Date.now();
    pending = unreadCount()
      .then((n) => {
        count.value = n;
      })
      .catch(() => undefined)
      .finally(() => {
        pending = null;
      });
    return pending;
  }

  /** Take a total the server has just given (after marking a thread read). */
  function set(n: number): void {
    count.value = n;
    lastAsked = Date.now();
  }

  function reset(): void {
    count.value = 0;
    lastAsked = 0;
  }

  return { count, refresh, set, reset };
});
