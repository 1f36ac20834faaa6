import { z } from 'zod';

/** The longest message a member can send, stated next to the message box. */
export const MESSAGE_MAX_LENGTH = 2000;
/** Messages shown per page of a thread, and threads per page of the Messages list. */
export const MESSAGES_PAGE_SIZE = 30;
export const THREADS_PAGE_SIZE = 20;
/** Sending allowance per member: this many messages in this many minutes (a brake on copy-and-paste spam). */
export const MESSAGE_BURST = { count: 20, minutes: 10 } as const;
/** New questions about listings a member may start in a day, so one account cannot write to every seller. */
export const NEW_THREADS_PER_DAY = 30;

const idField = (what: string) =>
  z.coerce
    .number({ error: `Unknown ${what}.` })
    .int({ error: `Unknown ${what}.` })
    .positive({ error: `Unknown ${what}.` })
    .max(4_294_967_295, { error: `Unknown ${what}.` });

/** Control characters other than line breaks and tabs never reach the database. */
// eslint-disable-next-line no-control-regex
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/g;

/** POST …/messages: the text of one message. Plain text; line breaks are kept. */
export const messageInputSchema = z.strictObject({
  body: z
    .string({ error: 'Write a message first.' })
    .transform((text) => text.replace(/\r\n?/g, '\n').replace(CONTROL, '').trim())
    .pipe(
      z
        .string()
        .min(1, { error: 'Write a message first.' })
        .max(MESSAGE_MAX_LENGTH, {
          error: `A message can be at most ${MESSAGE_MAX_LENGTH.toLocaleString('en-GB')} characters. Shorten it or send it in two parts.`,
        }),
    ),
});
export type MessageInput = z.input<typeof messageInputSchema>;
export type MessageParsed = z.infer<typeof messageInputSchema>;

/** POST /api/conversations/:id/read: everything up to and including this message has been seen. */
export const markReadSchema = z.strictObject({ lastMessageId: idField('message') });
export type MarkReadInput = z.infer<typeof markReadSchema>;

/** Route parameter `:id` of a thread, a listing or an order. */
export const conversationIdParamSchema = z.strictObject({ id: idField('conversation') });
export const listingIdParamSchema = z.strictObject({ id: idField('listing') });
export const orderIdParamSchema = z.strictObject({ id: idField('order') });

/** GET /api/conversations/:id/messages: the page before one message, or the messages after one. */
export const messagePageQuerySchema = z
  .strictObject({ before: idField('message').optional(), after: idField('message').optional() })
  .refine((q) => (q.before === undefined) !== (q.after === undefined), {
    error: 'Give either "before" or "after", the id of a message.',
    path: ['before'],
  });
export type MessagePageQuery = z.infer<typeof messagePageQuerySchema>;

/** GET /api/conversations and GET /api/conversations/flagged. */
export const threadListQuerySchema = z.strictObject({
  page: z.coerce
    .number({ error: 'Page must be a number.' })
    .int({ error: 'Page must be a whole number.' })
    .min(1, { error: 'Page must be 1 or more.' })
    .max(100_000, { error: 'Page is too large.' })
    .default(1),
});
export type ThreadListQuery = z.infer<typeof threadListQuerySchema>;
