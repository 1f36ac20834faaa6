import { computed, onBeforeUnmount, onMounted, ref, shallowRef } from 'vue';
import type { MessageView, ThreadView } from '@shared/types/conversations';
import {
  earlierMessages,
  getSubjectThread,
  getThread,
  laterMessages,
  markRead,
  sendMessage,
  type SubjectThread,
  type ThreadSubject,
} from '@/api/conversations';
import { useAsync } from '@/composables/useAsync';
import { useUnreadStore } from '@/stores/unread';

/** How often an open thread asks for replies while the tab is in view. */
const POLL_MS = 20_000;

/** A thread's state on its page: loading by id or by subject, earlier pages, replies, sending and read markers. */
export function useConversationThread(viewerId: () => number | null) {
  const thread = shallowRef<ThreadView | null>(null);
  const about = shallowRef<SubjectThread['about'] | null>(null);
  const messages = shallowRef<MessageView[]>([]);
  const hasEarlier = ref(false);
  const loadingEarlier = ref(false);
  const unread = useUnreadStore();
  const { run, loading, error } = useAsync(
    (target: number | ThreadSubject): Promise<SubjectThread | { thread: ThreadView; about: null }> =>
      typeof target === 'number'
        ? getThread(target).then((t) => ({ thread: t, about: null }))
        : getSubjectThread(target),
  );

  /** The newest of the viewer's messages the other member has read, for a "Seen" line. */
  const seenId = computed(() => {
    const upTo = thread.value?.otherReadUpTo ?? 0;
    const mine = messages.value.filter((m) => m.senderId === viewerId() && m.id <= upTo);
    return mine.at(-1)?.id ?? null;
  });

  async function load(target: number | ThreadSubject): Promise<void> {
    thread.value = null;
    about.value = null;
    messages.value = [];
    const found = await run(target);
    if (!found) return;
    about.value = found.about;
    if (found.thread) take(found.thread);
  }

  function take(view: ThreadView): void {
    thread.value = view;
    messages.value = view.messages;
    hasEarlier.value = view.hasEarlier;
    void markSeen();
  }

  /** Tell the server what the member has now seen, and take its new unread total for the header. */
  async function markSeen(): Promise<void> {
    const t = thread.value;
    const last = messages.value.at(-1);
    if (!t || !last || t.conversation.you === 'moderator') return;
    if (last.senderId === viewerId() && t.conversation.unreadCount === 0) return;
    try {
      unread.set(await markRead(t.conversation.id, last.id));
      thread.value = { ...t, conversation: { ...t.conversation, unreadCount: 0 } };
    } catch {
      // The count stays as it was; the next visit marks it.
    }
  }

  async function earlier(): Promise<void> {
    const t = thread.value;
    const first = messages.value[0];
    if (!t || !first) return;
    loadingEarlier.value = true;
    try {
      const page = await earlierMessages(t.conversation.id, first.id);
      messages.value = [...page.messages, ...messages.value];
      hasEarlier.value = page.hasEarlier;
    } finally {
      loadingEarlier.value = false;
    }
  }

  function append(more: MessageView[]): void {
    const known = new Set(messages.value.map((m) => m.id));
    const fresh = more.filter((m) => !known.has(m.id));
    if (!fresh.length) return;
    messages.value = [...messages.value, ...fresh];
    if (fresh.some((m) => m.senderId !== viewerId()) && thread.value)
      thread.value = { ...thread.value, conversation: { ...thread.value.conversation, unreadCount: 1 } };
    void markSeen();
  }

  async function checkReplies(): Promise<void> {
    const t = thread.value;
    const last = messages.value.at(-1);
    if (!t || !last || document.visibilityState === 'hidden') return;
    try {
      append((await laterMessages(t.conversation.id, last.id)).messages);
    } catch {
      // Try again at the next tick.
    }
  }

  /** Send; answers the thread id so a page opened by subject can move to the thread's own address. */
  async function send(target: number | ThreadSubject, body: string): Promise<number> {
    const sent = await sendMessage(target, body);
    if (thread.value) append([sent.message]);
    return sent.conversationId;
  }

  let timer: ReturnType<typeof setInterval> | undefined;
  onMounted(() => {
    timer = setInterval(() => void checkReplies(), POLL_MS);
  });
  onBeforeUnmount(() => clearInterval(timer));

  return { thread, about, messages, hasEarlier, loadingEarlier, loading, error, seenId, load, earlier, send };
}
