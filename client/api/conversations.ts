import type {
  ConversationSummary,
  FlaggedThreadView,
  MessagePage,
  SentMessage,
  SubjectThread,
  ThreadView,
} from '@shared/types/conversations';
import type { Page } from '@shared/types/user';
import { http } from './http';

export type { SubjectThread };

/** What a thread is about, for the pages that open it by its subject. */
export type ThreadSubject = { kind: 'listing'; id: number } | { kind: 'order'; id: number };

const subjectPath = (s: ThreadSubject) => `/api/conversations/${s.kind === 'listing' ? 'listings' : 'orders'}/${s.id}`;

/** The member's threads, newest message first. */
export const listThreads = (page: number, signal?: AbortSignal) =>
  http.get<Page<ConversationSummary>>('/api/conversations', { page }, signal);

/** Messages waiting for the member across all threads (the header's badge). */
export async function unreadCount(signal?: AbortSignal): Promise<number> {
  return (await http.get<{ count: number }>('/api/conversations/unread-count', {}, signal)).count;
}

export const getThread = (id: number, signal?: AbortSignal) =>
  http.get<ThreadView>(`/api/conversations/${id}`, {}, signal);

/** The thread about a listing (the member's own questions) or an order, before or after it exists. */
export const getSubjectThread = (subject: ThreadSubject, signal?: AbortSignal) =>
  http.get<SubjectThread>(subjectPath(subject), {}, signal);

/** The page of messages before `id`, oldest first. */
export const earlierMessages = (threadId: number, before: number) =>
  http.get<MessagePage>(`/api/conversations/${threadId}/messages`, { before });

/** Messages after `id`, oldest first (checking for replies). */
export const laterMessages = (threadId: number, after: number, signal?: AbortSignal) =>
  http.get<MessagePage>(`/api/conversations/${threadId}/messages`, { after }, signal);

/** Reply in a thread, or write the first message about a listing or an order. */
export function sendMessage(target: number | ThreadSubject, body: string): Promise<SentMessage> {
  const path = typeof target === 'number' ? `/api/conversations/${target}` : subjectPath(target);
  return http.post<SentMessage>(`${path}/messages`, { body });
}

/** Mark the thread read up to `lastMessageId`; answers the member's new unread total. */
export async function markRead(threadId: number, lastMessageId: number): Promise<number> {
  return (await http.post<{ count: number }>(`/api/conversations/${threadId}/read`, { lastMessageId })).count;
}

/** Moderators: threads in which someone shared contact details. */
export const listFlaggedThreads = (page: number, signal?: AbortSignal) =>
  http.get<Page<FlaggedThreadView>>('/api/conversations/flagged', { page }, signal);
